// Shared set-up for `npm start` and `npm test`: dependencies, system packages, database, migrations, seed.
import { execFileSync, spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDatabase } from './db.mjs';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
// No telemetry from builds or servers: this machine reaches only the package registries.
process.env.NEXT_TELEMETRY_DISABLED = '1';

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export function log(msg) {
  process.stderr.write(`[setup] ${msg}\n`);
}

/** Runs a command in the project folder, streaming its output; throws on a non-zero exit. */
export function run(cmd, args, env = {}) {
  const res = spawnSync(cmd, args, {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, ...env },
  });
  if (res.status !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} exited with ${res.status ?? res.signal}`);
  }
}

/** npm ci when node_modules is missing or older than the lock file. */
export function ensureNodeModules() {
  const marker = path.join(root, 'node_modules', '.package-lock.json');
  const lock = path.join(root, 'package-lock.json');
  const stale =
    !fs.existsSync(marker) || fs.statSync(marker).mtimeMs < fs.statSync(lock).mtimeMs - 1000;
  if (!stale) return;
  log('installing npm dependencies (npm ci)');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}

/** Installs Debian packages that are missing (root only: CI and the dev machines run as root). */
export function ensureAptPackages(pkgs) {
  const missing = pkgs.filter(({ check }) => !fs.existsSync(check)).map(({ name }) => name);
  if (missing.length === 0) return;
  if (!isRoot)
    throw new Error(`missing system packages: ${missing.join(' ')} (apt-get install them)`);
  log(`apt-get install ${missing.join(' ')}`);
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', '-qq', ...missing], {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}

/** A signing secret kept in the git-ignored data folder, unless the environment gives one. */
export function authSecret() {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(root, '.data', 'auth-secret');
  if (!fs.existsSync(file)) {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, crypto.randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

/** Starts PostgreSQL, creates (or recreates) the database, migrates and seeds it. Returns its URL. */
export function prepareDatabase(name, { fresh = false } = {}) {
  const url =
    process.env.DATABASE_URL && !fresh ? process.env.DATABASE_URL : ensureDatabase(name, { fresh });
  log(`migrating ${name}`);
  run('npx', ['sequelize-cli', 'db:migrate'], { DATABASE_URL: url });
  log(`seeding ${name}`);
  run('npx', ['sequelize-cli', 'db:seed:all'], { DATABASE_URL: url });
  return url;
}
