// `npm test`: the same set-up as `npm start` on a fresh test database, then every suite:
// format, lint, types, unit, integration (real PostgreSQL), build, end-to-end (Debian chromium).
import fs from 'node:fs';
import path from 'node:path';
import {
  authSecret,
  ensureAptPackages,
  ensureNodeModules,
  log,
  prepareDatabase,
  root,
  run,
} from './setup.mjs';

const reports = path.join(root, '.tmp', 'reports');
fs.rmSync(reports, { recursive: true, force: true });
fs.mkdirSync(reports, { recursive: true });

ensureNodeModules();
ensureAptPackages([
  { name: 'chromium', check: '/usr/bin/chromium' },
  { name: 'poppler-utils', check: '/usr/bin/pdftoppm' },
]);
const dbName = process.env.JW_TEST_DB_NAME || 'joistwright_test';
const databaseUrl = prepareDatabase(dbName, { fresh: true });
const env = {
  DATABASE_URL: databaseUrl,
  NEXTAUTH_SECRET: authSecret(),
  NODE_ENV: 'test',
};

const step = (name, fn) => {
  const t0 = Date.now();
  log(`── ${name}`);
  fn();
  log(`── ${name} ok (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
};

step('format', () => run('npx', ['prettier', '--check', '--log-level', 'warn', '.']));
step('lint', () => run('npx', ['eslint', '.', '--max-warnings=0']));
step('types', () => run('npx', ['tsc', '--noEmit']));
step('unit', () =>
  run(
    'npx',
    [
      'vitest',
      'run',
      '--project',
      'unit',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${reports}/unit.json`,
    ],
    env,
  ),
);
step('integration', () =>
  run(
    'npx',
    [
      'vitest',
      'run',
      '--project',
      'integration',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${reports}/integration.json`,
    ],
    env,
  ),
);
// The default build folder: next build rewrites tsconfig.json's include list for any other.
const distDir = process.env.NEXT_DIST_DIR || '.next';
step('build', () =>
  run('npx', ['next', 'build'], { ...env, NODE_ENV: 'production', NEXT_DIST_DIR: distDir }),
);
// The end-to-end run gets its own freshly seeded database so the integration suite leaves no trace in it.
const e2eUrl = prepareDatabase(`${dbName}_e2e`, { fresh: true });
step('e2e', () =>
  run('npx', ['playwright', 'test'], {
    ...env,
    NODE_ENV: 'production',
    DATABASE_URL: e2eUrl,
    NEXT_DIST_DIR: distDir,
    PLAYWRIGHT_JSON_OUTPUT_NAME: `${reports}/e2e.json`,
  }),
);

// One plain closing line that any CI log reader understands.
let passed = 0;
let failed = 0;
for (const f of ['unit.json', 'integration.json']) {
  const r = JSON.parse(fs.readFileSync(path.join(reports, f), 'utf8'));
  passed += r.numPassedTests;
  failed += r.numFailedTests;
}
const e2e = JSON.parse(fs.readFileSync(path.join(reports, 'e2e.json'), 'utf8'));
passed += e2e.stats.expected;
failed += e2e.stats.unexpected;
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
