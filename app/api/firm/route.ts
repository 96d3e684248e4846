// GET /api/firm: the signed-in user's firm and team.
import { requireUser } from '@/lib/auth';
import { handle } from '@/lib/server/errors';
import { getFirm } from '@/lib/server/firm';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await getFirm(user));
});
