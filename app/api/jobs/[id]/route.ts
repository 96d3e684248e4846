// GET, PATCH and DELETE /api/jobs/[id].
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { deleteJob, getJob, updateJob } from '@/lib/server/jobs';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await getJob(user, id));
});

export const PATCH = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await updateJob(user, id, await readJson(req)));
});

export const DELETE = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  await deleteJob(user, id);
  return new Response(null, { status: 204 });
});
