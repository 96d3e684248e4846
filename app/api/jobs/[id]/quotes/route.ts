// GET (list) and POST (create from the design's take-off) /api/jobs/[id]/quotes.
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { createQuote, listJobQuotes } from '@/lib/server/quotes';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await listJobQuotes(user, id));
});

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await createQuote(user, id, await readJson(req)), { status: 201 });
});
