// GET /api/jobs/progress?ids=a,b,c: build stage and quote state per job, for the job list.
import { requireUser } from '@/lib/auth';
import { handle } from '@/lib/server/errors';
import { jobProgress } from '@/lib/server/jobProgress';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  const ids = (new URL(req.url).searchParams.get('ids') ?? '').split(',').filter(Boolean);
  return Response.json(await jobProgress(user, ids));
});
