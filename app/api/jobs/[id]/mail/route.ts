// POST /api/jobs/[id]/mail: { kind: "plan", designId, to? } sends the framing plan and cut list to
// the crew; { kind: "order", designId, to: [supplier] } sends the materials order (CSV).
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { sendJobPaperwork } from '@/lib/server/jobMail';

type Ctx = { params: Promise<{ id: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await sendJobPaperwork(user, id, await readJson(req)));
});
