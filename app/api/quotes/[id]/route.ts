// GET and PUT (save a new revision; stale revision: 409) /api/quotes/[id].
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { getQuote, updateQuote } from '@/lib/server/quotes';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await getQuote(user, id));
});

export const PUT = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await updateQuote(user, id, await readJson(req)));
});
