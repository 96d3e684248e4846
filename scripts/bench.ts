// Benchmark runner (`npm run bench [-- name...]`): imports every scripts/bench/*.ts that exports
// run() and runs them in name order. Speed is only ever measured here, never in a test.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

async function main(): Promise<void> {
  const dir = join(__dirname, 'bench');
  const only = process.argv.slice(2);
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts'))
    .sort();
  for (const file of files) {
    const name = file.replace(/\.ts$/, '');
    if (only.length > 0 && !only.includes(name)) continue;
    const mod = (await import(pathToFileURL(join(dir, file)).href)) as { run?: () => unknown };
    if (typeof mod.run !== 'function') continue;
    console.log(`\n== ${name} ==`);
    await mod.run();
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
