// GET /api/designs/[id]/revisions: the saved versions, newest first.
import { requireUser } from '@/lib/auth';
import { listRevisions } from '@/lib/server/designs';
import { handle } from '@/lib/server/errors';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await listRevisions(user, id));
});
