// `npm start`: install what is missing, start PostgreSQL on loopback, migrate, seed the demo firm,
// build and serve the app at http://localhost:3000.
import {
  authSecret,
  ensureAptPackages,
  ensureNodeModules,
  log,
  prepareDatabase,
  run,
} from './setup.mjs';

const port = process.env.PORT || '3000';
const host = process.env.HOST || '127.0.0.1';

ensureNodeModules();
ensureAptPackages([]);
const databaseUrl = prepareDatabase(process.env.JW_DB_NAME || 'joistwright');
const env = {
  DATABASE_URL: databaseUrl,
  NEXTAUTH_SECRET: authSecret(),
  NEXTAUTH_URL: process.env.NEXTAUTH_URL || `http://localhost:${port}`,
};
if (process.env.JW_SKIP_BUILD !== '1') {
  log('building the app (next build)');
  run('npx', ['next', 'build'], env);
}
log(
  `serving at http://localhost:${port} (sign in as designer@larchfield-decks.example / see README)`,
);
run('npx', ['next', 'start', '-H', host, '-p', port], env);
