// The one Sequelize connection per process, created lazily on first use (never at import time,
// so `next build` and unit tests do not need a database).
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { initModels } from '@/models';

type Db = { sequelize: Sequelize; models: ReturnType<typeof initModels> };

// The pool is kept on globalThis so module re-evaluation (dev reloads, test isolation) does not
// open a new one. WARNING: Next bundles pages and route handlers in separate layers, each with its
// own copy of the model classes; each copy registers itself on the same shared connection (below)
// instead of replacing it, or one layer would close the pool under the other's queries.
const globalForDb = globalThis as unknown as { __joistwrightSequelize?: Sequelize };
/** This module instance's models and the connection they are registered on. */
let local: Db | undefined;

/** Returns the shared connection and models, connecting on first call. */
export function db(): Db {
  let sequelize = globalForDb.__joistwrightSequelize;
  if (!sequelize) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error('DATABASE_URL is not set');
    // WARNING: pass the driver in; Next's bundling hides `pg` from Sequelize's own require().
    sequelize = new Sequelize(url, {
      dialect: 'postgres',
      dialectModule: pg,
      logging: false,
      pool: { max: 5, min: 0, idle: 10_000 },
    });
    globalForDb.__joistwrightSequelize = sequelize;
  }
  if (local?.sequelize !== sequelize) local = { sequelize, models: initModels(sequelize) };
  return local;
}

/** Closes the pool (tests and scripts call this so the process can exit). */
export async function closeDb(): Promise<void> {
  const current = globalForDb.__joistwrightSequelize;
  globalForDb.__joistwrightSequelize = undefined;
  local = undefined;
  if (current) await current.close();
}
