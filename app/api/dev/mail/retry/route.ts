// POST /api/dev/mail/retry: { id } sends one waiting or failed message again now (owner); with no
// id, sends every message whose retry time has come (owner, or a scheduler with MAIL_CRON_SECRET).
import crypto from 'node:crypto';
import { requireUser } from '@/lib/auth';
import { assertCanDo } from '@/lib/server/businessAccess';
import { handle, readJson } from '@/lib/server/errors';
import { retryDue, retryNow } from '@/lib/server/mail';

function schedulerCall(req: Request): boolean {
  const secret = process.env.MAIL_CRON_SECRET;
  const given = req.headers.get('x-cron-secret');
  if (!secret || !given) return false;
  const a = Buffer.from(secret);
  const b = Buffer.from(given);
  return a.length === b.length && crypto.timingSafeEqual(a, b);
}

export const POST = handle(async (req) => {
  if (schedulerCall(req)) return Response.json(await retryDue());
  const user = await requireUser(req);
  assertCanDo(user, 'mail:read');
  const body = (await readJson(req)) as { id?: unknown };
  if (typeof body.id === 'string') {
    const m = await retryNow(user.firmId, body.id);
    return Response.json({
      id: m.id,
      status: m.status,
      attempts: m.attempts,
      lastError: m.lastError,
    });
  }
  return Response.json(await retryDue());
});
