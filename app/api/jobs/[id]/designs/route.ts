// POST /api/jobs/[id]/designs: add a design to a job.
import { requireUser } from '@/lib/auth';
import { createDesign } from '@/lib/server/designs';
import { handle, readJson } from '@/lib/server/errors';

type Ctx = { params: Promise<{ id: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await createDesign(user, id, await readJson(req)), { status: 201 });
});
