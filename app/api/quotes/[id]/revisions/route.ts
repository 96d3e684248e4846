// GET /api/quotes/[id]/revisions: every saved revision, newest first.
import { requireUser } from '@/lib/auth';
import { handle } from '@/lib/server/errors';
import { listQuoteRevisions } from '@/lib/server/quotes';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await listQuoteRevisions(user, id));
});
