// GET /api/health: is the server up and can it reach the database?
import { databaseIsUp } from '@/lib/server/health';

export const dynamic = 'force-dynamic';

export async function GET() {
  const db = await databaseIsUp();
  return Response.json({ ok: db, db }, { status: db ? 200 : 503 });
}
