// The one Sequelize connection per process, created lazily on first use (never at import time,
// so `next build` and unit tests do not need a database).
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { Firm, initModels } from '@/models';

type Db = { sequelize: Sequelize; models: ReturnType<typeof initModels> };

// Kept on globalThis so module re-evaluation (dev reloads, test isolation) does not open a new pool.
const globalForDb = globalThis as unknown as { __joistwrightDb?: Db };

/** Returns the shared connection and models, connecting on first call. */
export function db(): Db {
  const cached = globalForDb.__joistwrightDb;
  // Reuse only if it was built with this module instance's model classes.
  if (cached && cached.models.Firm === Firm) return cached;
  if (cached) void cached.sequelize.close().catch(() => undefined);
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  // WARNING: pass the driver in; Next's bundling hides `pg` from Sequelize's own require().
  const sequelize = new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: 5, min: 0, idle: 10_000 },
  });
  const models = initModels(sequelize);
  globalForDb.__joistwrightDb = { sequelize, models };
  return globalForDb.__joistwrightDb;
}

/** Closes the pool (tests and scripts call this so the process can exit). */
export async function closeDb(): Promise<void> {
  const current = globalForDb.__joistwrightDb;
  globalForDb.__joistwrightDb = undefined;
  if (current) await current.sequelize.close();
}
