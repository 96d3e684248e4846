// GET the job's build stages; POST { stage, doneOn?, note?, fileIds? } marks one done (crew may);
// DELETE ?stage=frame clears one.
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { listStages, markStage, unmarkStage } from '@/lib/server/stages';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await listStages(user, id));
});

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await markStage(user, id, await readJson(req)));
});

export const DELETE = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(
    await unmarkStage(user, id, new URL(req.url).searchParams.get('stage') ?? ''),
  );
});
