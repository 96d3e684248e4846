// GET /api/jobs (list: q, status, sort, dir, page, pageSize) and POST /api/jobs (create).
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { createJob, listJobs } from '@/lib/server/jobs';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  const query = Object.fromEntries(new URL(req.url).searchParams);
  return Response.json(await listJobs(user, query));
});

export const POST = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await createJob(user, await readJson(req)), { status: 201 });
});
