// GET /api/dev/mail (owner): the firm's outbox and, in development, what the local sink received.
import { requireUser } from '@/lib/auth';
import { assertCanDo } from '@/lib/server/businessAccess';
import { handle } from '@/lib/server/errors';
import { devInbox, listOutbox } from '@/lib/server/mail';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  assertCanDo(user, 'mail:read');
  const [outbox, inbox] = await Promise.all([
    listOutbox(user.firmId),
    devInbox(user.firmId).catch((err: Error) => ({ enabled: true, items: [], error: err.message })),
  ]);
  return Response.json({ outbox, inbox });
});
