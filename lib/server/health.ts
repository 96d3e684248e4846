// Liveness check used by /api/health (and by Playwright to know the server is up).
import { db } from './db';

/** True when the database answers a trivial query within the pool's limits. */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await db().sequelize.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
