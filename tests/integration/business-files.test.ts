// Site photos and build stages against the real database and the local S3 fake: type sniffing,
// size limit, thumbnails, firm isolation, and the crew's rights (upload and mark stages, not delete).
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as getJob } from '@/app/api/jobs/[id]/route';
import { GET as listFiles, POST as upload } from '@/app/api/jobs/[id]/files/route';
import { DELETE as deleteFile, GET as getFile } from '@/app/api/jobs/[id]/files/[fileId]/route';
import { GET as listStages, POST as markStage } from '@/app/api/jobs/[id]/stages/route';
import { GET as progress } from '@/app/api/jobs/progress/route';
import type { JobFileView } from '@/lib/server/files';
import type { StageView } from '@/lib/server/stages';
import { json, params, sessionCookie, type Who } from './helpers';
import { freshJob, startBusinessFakes } from './business-setup';

let env: Awaited<ReturnType<typeof startBusinessFakes>>;
let jobId: string;
let png: Buffer;

const fileParams = (id: string, fileId: string) => ({ params: Promise.resolve({ id, fileId }) });

async function send(who: Who, name: string, bytes: Uint8Array, type = 'application/octet-stream') {
  const form = new FormData();
  form.set('file', new File([new Uint8Array(bytes)], name, { type }));
  const req = new Request(`http://localhost/api/jobs/${jobId}/files`, {
    method: 'POST',
    headers: { cookie: await sessionCookie(who) },
    body: form,
  });
  return upload(req, params(jobId));
}

beforeAll(async () => {
  env = await startBusinessFakes();
  ({ jobId } = await freshJob('designer'));
  png = await sharp({
    create: { width: 1200, height: 800, channels: 3, background: { r: 120, g: 90, b: 60 } },
  })
    .png()
    .toBuffer();
});
afterAll(async () => {
  delete process.env.FILE_MAX_BYTES;
  await env?.stop();
});

describe('site photos', () => {
  let photo: JobFileView;

  it('crew upload a photo; it is stored with a thumbnail and served back', async () => {
    const res = await send('crew', 'frame-north.png', png, 'image/png');
    expect(res.status).toBe(201);
    photo = await json<JobFileView>(res);
    expect(photo).toMatchObject({ kind: 'photo', mime: 'image/png', width: 1200, height: 800 });
    expect(photo.uploadedBy).toBe('Priya Nandi');
    const full = await getFile(
      new Request(`http://localhost${photo.url}`, {
        headers: { cookie: await sessionCookie('owner') },
      }),
      fileParams(jobId, photo.id),
    );
    expect(full.status).toBe(200);
    expect(Buffer.from(await full.arrayBuffer()).equals(png)).toBe(true);
    const thumb = await getFile(
      new Request(`http://localhost${photo.thumbUrl}`, {
        headers: { cookie: await sessionCookie('crew') },
      }),
      fileParams(jobId, photo.id),
    );
    expect(thumb.headers.get('content-type')).toBe('image/webp');
    const meta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(Math.max(meta.width!, meta.height!)).toBeLessThanOrEqual(480);
  });

  it('refuses a PNG named .pdf, executables, and anything over the size limit', async () => {
    const renamed = await send('crew', 'plan.pdf', png, 'application/pdf');
    expect(renamed.status).toBe(400);
    expect((await json<{ error: string }>(renamed)).error).toMatch(/named \.pdf/);
    const elf = new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...new Array(64).fill(0)]);
    expect((await send('crew', 'photo.jpg', elf, 'image/jpeg')).status).toBe(400);
    const exe = new Uint8Array([0x4d, 0x5a, 0x90, 0, 3, 0, 0, 0, ...new Array(64).fill(0)]);
    expect((await send('designer', 'setup.exe', exe)).status).toBe(400);
    process.env.FILE_MAX_BYTES = String(png.length - 1);
    expect((await send('crew', 'big.png', png, 'image/png')).status).toBe(413);
    delete process.env.FILE_MAX_BYTES;
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
    const ok = await send('designer', 'survey.pdf', pdf, 'application/pdf');
    expect(ok.status).toBe(201);
    expect(await json(ok)).toMatchObject({ kind: 'document', thumbUrl: null });
    const list = await json<JobFileView[]>(
      await listFiles(
        new Request(`http://localhost/api/jobs/${jobId}/files`, {
          headers: { cookie: await sessionCookie('crew') },
        }),
        params(jobId),
      ),
    );
    expect(list.map((f) => f.name).sort()).toEqual(['frame-north.png', 'survey.pdf']);
  });

  it('another firm cannot list or read the files; crew cannot delete them', async () => {
    const other = await getFile(
      new Request(`http://localhost${photo.url}`, {
        headers: { cookie: await sessionCookie('otherOwner') },
      }),
      fileParams(jobId, photo.id),
    );
    expect(other.status).toBe(404);
    const otherList = await listFiles(
      new Request(`http://localhost/x`, { headers: { cookie: await sessionCookie('otherOwner') } }),
      params(jobId),
    );
    expect(otherList.status).toBe(404);
    const crewDelete = await deleteFile(
      new Request(`http://localhost${photo.url}`, {
        method: 'DELETE',
        headers: { cookie: await sessionCookie('crew') },
      }),
      fileParams(jobId, photo.id),
    );
    expect(crewDelete.status).toBe(403);
  });

  it('crew mark the frame stage with the photo; the job moves to building', async () => {
    const res = await markStage(
      new Request(`http://localhost/api/jobs/${jobId}/stages`, {
        method: 'POST',
        headers: { cookie: await sessionCookie('crew'), 'content-type': 'application/json' },
        body: JSON.stringify({ stage: 'frame', doneOn: '2026-12-01', fileIds: [photo.id] }),
      }),
      params(jobId),
    );
    expect(res.status).toBe(200);
    const stages = await json<StageView[]>(res);
    expect(stages.map((s) => s.stage)).toEqual([
      'set_out',
      'footings',
      'frame',
      'boards',
      'finished',
    ]);
    const frame = stages.find((s) => s.stage === 'frame')!;
    expect(frame.done).toMatchObject({ doneOn: '2026-12-01', markedBy: 'Priya Nandi' });
    expect(frame.done!.photos.map((p) => p.id)).toEqual([photo.id]);
    const job = await json<{ status: string }>(
      await getJob(
        new Request(`http://localhost/api/jobs/${jobId}`, {
          headers: { cookie: await sessionCookie('owner') },
        }),
        params(jobId),
      ),
    );
    expect(job.status).toBe('building');
    const bad = await markStage(
      new Request(`http://localhost/x`, {
        method: 'POST',
        headers: { cookie: await sessionCookie('crew'), 'content-type': 'application/json' },
        body: JSON.stringify({ stage: 'roofing' }),
      }),
      params(jobId),
    );
    expect(bad.status).toBe(400);
    const other = await listStages(
      new Request(`http://localhost/x`, { headers: { cookie: await sessionCookie('otherOwner') } }),
      params(jobId),
    );
    expect(other.status).toBe(404);
  });

  it('the job list learns the furthest stage; another firm learns nothing', async () => {
    const mine = await json<Record<string, { stage: { label: string } | null }>>(
      await progress(
        new Request(`http://localhost/api/jobs/progress?ids=${jobId}`, {
          headers: { cookie: await sessionCookie('crew') },
        }),
      ),
    );
    expect(mine[jobId].stage?.label).toBe('Frame');
    const theirs = await json(
      await progress(
        new Request(`http://localhost/api/jobs/progress?ids=${jobId}`, {
          headers: { cookie: await sessionCookie('otherOwner') },
        }),
      ),
    );
    expect(theirs).toEqual({});
  });
});
