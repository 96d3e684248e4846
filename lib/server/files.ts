// Site photos and documents on a job: type sniffed from the bytes and limited to images and PDF,
// size limited, stored through the S3 SDK, photos given a thumbnail (sharp). Crew may upload.
import crypto from 'node:crypto';
import sharp from 'sharp';
import type { SessionUser } from '@/lib/validation/access';
import {
  ALLOWED_FILE_TYPES,
  DEFAULT_MAX_FILE_BYTES,
  type AllowedMime,
} from '@/lib/validation/jobFiles';
import type { JobFile } from '@/models/business';
import { assertCanDo } from './businessAccess';
import { bdb } from './businessDb';
import { BadRequest, HttpError, NotFound } from './errors';
import { deleteObject, getObject, putObject } from './storage';

/** The type the bytes say they are (magic numbers), or undefined for anything we do not take. */
export function sniffType(bytes: Uint8Array): AllowedMime | undefined {
  const b = bytes;
  const at = (i: number, ...xs: number[]) => xs.every((x, k) => b[i + k] === x);
  if (b.length >= 3 && at(0, 0xff, 0xd8, 0xff)) return 'image/jpeg';
  if (b.length >= 8 && at(0, 0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a)) return 'image/png';
  if (b.length >= 12 && at(0, 0x52, 0x49, 0x46, 0x46) && at(8, 0x57, 0x45, 0x42, 0x50))
    return 'image/webp';
  if (b.length >= 5 && at(0, 0x25, 0x50, 0x44, 0x46, 0x2d)) return 'application/pdf';
  return undefined;
}

export function maxFileBytes(): number {
  return Number(process.env.FILE_MAX_BYTES) || DEFAULT_MAX_FILE_BYTES;
}

export interface JobFileView {
  id: string;
  kind: 'photo' | 'document';
  mime: string;
  name: string;
  caption: string;
  sizeBytes: number;
  width: number | null;
  height: number | null;
  stageId: string | null;
  uploadedBy: string | null;
  createdAt: string;
  url: string;
  thumbUrl: string | null;
}

async function findJob(actor: SessionUser, jobId: string) {
  const { models } = bdb();
  if (!/^[0-9a-f-]{36}$/i.test(jobId)) throw new NotFound('No such job');
  const job = await models.Job.findOne({ where: { id: jobId, firmId: actor.firmId } });
  if (!job) throw new NotFound('No such job');
  return job;
}

function toView(f: JobFile, names: Map<string, string>): JobFileView {
  const base = `/api/jobs/${f.jobId}/files/${f.id}`;
  return {
    id: f.id,
    kind: f.kind,
    mime: f.mime,
    name: f.originalName,
    caption: f.caption,
    sizeBytes: f.sizeBytes,
    width: f.width ?? null,
    height: f.height ?? null,
    stageId: f.stageId ?? null,
    uploadedBy: f.uploadedById ? (names.get(f.uploadedById) ?? null) : null,
    createdAt: f.createdAt.toISOString(),
    url: base,
    thumbUrl: f.thumbKey ? `${base}?thumb=1` : null,
  };
}

async function userNames(ids: (string | null)[]): Promise<Map<string, string>> {
  const { models } = bdb();
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  if (wanted.length === 0) return new Map();
  const users = await models.User.findAll({ where: { id: wanted }, attributes: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u.name]));
}

/**
 * Stores one upload. Refused (400/413) when the bytes are not JPEG, PNG, WebP or PDF, when the
 * name's extension claims another type than the bytes, or when it is too large.
 */
export async function uploadJobFile(
  actor: SessionUser,
  jobId: string,
  file: { name: string; bytes: Uint8Array; caption?: string; stageId?: string | null },
): Promise<JobFileView> {
  assertCanDo(actor, 'file:upload');
  await findJob(actor, jobId);
  if (file.bytes.length === 0) throw new BadRequest('The file is empty');
  if (file.bytes.length > maxFileBytes())
    throw new HttpError(
      413,
      `The file is too large (limit ${Math.round(maxFileBytes() / 1024 / 1024)} MB)`,
    );
  const mime = sniffType(file.bytes);
  if (!mime) throw new BadRequest('Only photos (JPEG, PNG, WebP) and PDF documents can be added');
  const name = file.name.replace(/[\\/\0]/g, '_').slice(0, 200) || 'upload';
  const ext = /\.([A-Za-z0-9]{1,8})$/.exec(name)?.[1]?.toLowerCase();
  const allowed = ALLOWED_FILE_TYPES[mime];
  if (ext && !(allowed.ext as readonly string[]).includes(ext))
    throw new BadRequest(
      `The file is named .${ext} but its contents are ${mime}; rename it or choose another file`,
    );

  const id = crypto.randomUUID();
  const key = `firms/${actor.firmId}/jobs/${jobId}/${id}.${allowed.ext[0]}`;
  let thumbKey: string | null = null;
  let width: number | null = null;
  let height: number | null = null;
  const body = Buffer.from(file.bytes);
  if (allowed.kind === 'photo') {
    try {
      const img = sharp(body, { limitInputPixels: 80_000_000 }).rotate();
      const meta = await img.metadata();
      const upright = (meta.orientation ?? 1) >= 5;
      width = (upright ? meta.height : meta.width) ?? null;
      height = (upright ? meta.width : meta.height) ?? null;
      const thumb = await img
        .resize({ width: 480, height: 480, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 72 })
        .toBuffer();
      thumbKey = `firms/${actor.firmId}/jobs/${jobId}/${id}.thumb.webp`;
      await putObject(thumbKey, thumb, 'image/webp');
    } catch {
      throw new BadRequest('The image could not be read; it may be damaged');
    }
  }
  await putObject(key, body, mime);
  const { models } = bdb();
  const row = await models.JobFile.create({
    id,
    firmId: actor.firmId,
    jobId,
    stageId: file.stageId ?? null,
    kind: allowed.kind,
    storageKey: key,
    thumbKey,
    mime,
    sizeBytes: body.length,
    originalName: name,
    width,
    height,
    caption: file.caption ?? '',
    uploadedById: actor.id,
  });
  return toView(row, await userNames([actor.id]));
}

export async function listJobFiles(actor: SessionUser, jobId: string): Promise<JobFileView[]> {
  assertCanDo(actor, 'file:read');
  await findJob(actor, jobId);
  const { models } = bdb();
  const rows = await models.JobFile.findAll({
    where: { firmId: actor.firmId, jobId },
    order: [['createdAt', 'DESC']],
  });
  const names = await userNames(rows.map((r) => r.uploadedById));
  return rows.map((r) => toView(r, names));
}

async function findFile(actor: SessionUser, jobId: string, fileId: string) {
  const { models } = bdb();
  if (!/^[0-9a-f-]{36}$/i.test(fileId) || !/^[0-9a-f-]{36}$/i.test(jobId))
    throw new NotFound('No such file');
  const f = await models.JobFile.findOne({ where: { id: fileId, jobId, firmId: actor.firmId } });
  if (!f) throw new NotFound('No such file');
  return f;
}

/** The bytes of a file (or its thumbnail) for someone in the firm. */
export async function readJobFile(
  actor: SessionUser,
  jobId: string,
  fileId: string,
  thumb: boolean,
): Promise<{ body: Buffer; contentType: string; name: string }> {
  assertCanDo(actor, 'file:read');
  const f = await findFile(actor, jobId, fileId);
  const key = thumb && f.thumbKey ? f.thumbKey : f.storageKey;
  const obj = await getObject(key);
  if (!obj) throw new NotFound('The file is missing from storage');
  return {
    body: obj.body,
    contentType: thumb && f.thumbKey ? 'image/webp' : f.mime,
    name: f.originalName,
  };
}

export async function deleteJobFile(actor: SessionUser, jobId: string, fileId: string) {
  assertCanDo(actor, 'file:delete');
  const f = await findFile(actor, jobId, fileId);
  await f.destroy();
  await deleteObject(f.storageKey);
  if (f.thumbKey) await deleteObject(f.thumbKey);
}
