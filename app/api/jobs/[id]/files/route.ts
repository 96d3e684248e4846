// GET the job's photos and documents; POST multipart `file` (+ `caption`) to add one (crew may).
import { requireUser } from '@/lib/auth';
import { BadRequest, handle, HttpError } from '@/lib/server/errors';
import { listJobFiles, maxFileBytes, uploadJobFile } from '@/lib/server/files';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await listJobFiles(user, id));
});

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  const declared = Number(req.headers.get('content-length') || 0);
  if (declared > maxFileBytes() + 64 * 1024)
    throw new HttpError(
      413,
      `The file is too large (limit ${Math.round(maxFileBytes() / 1024 / 1024)} MB)`,
    );
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new BadRequest('Send the file as multipart/form-data in a field named "file"');
  }
  const file = form.get('file');
  if (!file || typeof file === 'string') throw new BadRequest('Choose a file to upload');
  if (file.size > maxFileBytes())
    throw new HttpError(
      413,
      `The file is too large (limit ${Math.round(maxFileBytes() / 1024 / 1024)} MB)`,
    );
  const caption = form.get('caption');
  const view = await uploadJobFile(user, id, {
    name: file.name,
    bytes: new Uint8Array(await file.arrayBuffer()),
    caption: typeof caption === 'string' ? caption.slice(0, 300) : undefined,
  });
  return Response.json(view, { status: 201 });
});
