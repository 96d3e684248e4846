// `npm start`: install what is missing, start PostgreSQL on loopback, migrate, seed the demo firm,
// start the local fakes of the hosted services (mail, payments, storage), build and serve the app at
// http://localhost:3000. Set JW_FAKES=0 when SMTP_URL, STRIPE_* and S3_* point at the real services.
import { spawn } from 'node:child_process';
import { authSecret, ensureNodeModules, log, prepareDatabase, root, run } from './setup.mjs';

const port = process.env.PORT || '3000';
const host = process.env.HOST || '127.0.0.1';

ensureNodeModules();
const databaseUrl = prepareDatabase(process.env.JW_DB_NAME || 'joistwright');
const env = {
  DATABASE_URL: databaseUrl,
  NEXTAUTH_SECRET: authSecret(),
  NEXTAUTH_URL: process.env.NEXTAUTH_URL || `http://localhost:${port}`,
};

const children = [];
if (process.env.JW_FAKES !== '0') {
  log('starting the local fakes of SMTP, Stripe and S3 on loopback');
  const fakes = spawn(process.execPath, ['scripts/fakes/index.mjs'], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, ...env },
  });
  children.push(fakes);
}
const stopChildren = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('exit', stopChildren);
for (const sig of ['SIGINT', 'SIGTERM']) {
  process.on(sig, () => {
    stopChildren();
    process.exit(0);
  });
}

if (process.env.JW_SKIP_BUILD !== '1') {
  log('building the app (next build)');
  run('npx', ['next', 'build'], env);
}
log(`serving at http://localhost:${port} (demo sign-ins in README.md)`);
const server = spawn('npx', ['next', 'start', '-H', host, '-p', port], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, ...env },
});
children.push(server);
server.on('exit', (code) => {
  stopChildren();
  process.exit(code ?? 0);
});
