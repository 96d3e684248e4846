// GET /api/dev/mail/[id] (owner): one message as the local sink received it.
import { requireUser } from '@/lib/auth';
import { assertCanDo } from '@/lib/server/businessAccess';
import { handle } from '@/lib/server/errors';
import { devInboxMessage } from '@/lib/server/mail';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  assertCanDo(user, 'mail:read');
  const { id } = await params;
  return Response.json(await devInboxMessage(user.firmId, id));
});
