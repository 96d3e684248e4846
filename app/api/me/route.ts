// GET /api/me (the signed-in user) and PATCH /api/me (their display units).
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { updateMe } from '@/lib/server/users';

export const GET = handle(async (req) => {
  return Response.json(await requireUser(req));
});

export const PATCH = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await updateMe(user, await readJson(req)));
});
