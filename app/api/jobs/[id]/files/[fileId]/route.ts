// GET one of the job's files (?thumb=1 for a photo's thumbnail); DELETE it (owner, designer).
import { requireUser } from '@/lib/auth';
import { handle } from '@/lib/server/errors';
import { deleteJobFile, readJobFile } from '@/lib/server/files';

type Ctx = { params: Promise<{ id: string; fileId: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id, fileId } = await params;
  const thumb = new URL(req.url).searchParams.get('thumb') === '1';
  const f = await readJobFile(user, id, fileId, thumb);
  return new Response(new Uint8Array(f.body), {
    headers: {
      'content-type': f.contentType,
      'content-disposition': `inline; filename="${f.name.replace(/["\r\n]/g, '_')}"`,
      'cache-control': 'private, max-age=3600',
      'x-content-type-options': 'nosniff',
    },
  });
});

export const DELETE = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id, fileId } = await params;
  await deleteJobFile(user, id, fileId);
  return new Response(null, { status: 204 });
});
