// GET /api/designs/[id] and PUT (save with the version last read; 409 when stale).
import { requireUser } from '@/lib/auth';
import { getDesign, saveDesign } from '@/lib/server/designs';
import { handle, readJson } from '@/lib/server/errors';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await getDesign(user, id));
});

export const PUT = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await saveDesign(user, id, await readJson(req)));
});
