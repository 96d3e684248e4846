// Jobs API against the real database: roles, firm isolation, validation, search/sort/paging.
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as postClient } from '@/app/api/clients/route';
import { DELETE as deleteJob, GET as getJob, PATCH as patchJob } from '@/app/api/jobs/[id]/route';
import { GET as listJobs, POST as createJob } from '@/app/api/jobs/route';
import { jobListSchema, jobSchema, type JobDto, type JobList } from '@/lib/validation/job';
import { Client, Job } from '@/models';
import { demoUser, json, params, request, type Who } from './helpers';

const OTHER_FIRM_JOB = '1a4c0000-0000-4000-8003-000000000011';
const OTHER_FIRM_CLIENT = '1a4c0000-0000-4000-8002-000000000011';
// A token unique to this run so searches see only the jobs this file made.
const tag = `zx${crypto.randomUUID().slice(0, 8)}`;

async function create(as: Who, body: unknown) {
  return createJob(await request('POST', '/api/jobs', { as, body }));
}
async function list(as: Who, query: string): Promise<JobList> {
  const res = await listJobs(await request('GET', `/api/jobs?${query}`, { as }));
  expect(res.status).toBe(200);
  return jobListSchema.parse(await json(res));
}
async function newJob(title: string, extra: Record<string, unknown> = {}): Promise<JobDto> {
  const res = await create('designer', {
    title,
    siteAddress: '1 Test Lane, Kestrelford',
    ...extra,
  });
  expect(res.status).toBe(201);
  return jobSchema.parse(await json(res));
}
const countJobs = async (firmId: string) => Job.count({ where: { firmId } });

describe('create', () => {
  it('a designer creates a job with a new client in one go', async () => {
    const res = await create('designer', {
      title: `${tag} create`,
      siteAddress: '8 Kiln Row, Kestrelford',
      status: 'surveyed',
      client: { name: `${tag} Client`, email: 'New.Client@Example.com' },
    });
    expect(res.status).toBe(201);
    const job = jobSchema.parse(await json(res));
    expect(job).toMatchObject({
      title: `${tag} create`,
      status: 'surveyed',
      designCount: 0,
      designs: [],
      client: { name: `${tag} Client`, email: 'new.client@example.com' },
    });
    const row = await Job.findByPk(job.id);
    expect(row!.firmId).toBe((await demoUser('designer')).firmId);
    expect(row!.createdById).toBe((await demoUser('designer')).id);
  });

  it('links an existing client of the firm', async () => {
    const c = await postClient(
      await request('POST', '/api/clients', { as: 'owner', body: { name: `${tag} Existing` } }),
    );
    const client = (await json(c)) as { id: string };
    const job = await newJob(`${tag} linked`, { clientId: client.id });
    expect(job.client?.id).toBe(client.id);
  });

  it('crew may not create a job, and nothing is written', async () => {
    const firmId = (await demoUser('crew')).firmId;
    const before = await countJobs(firmId);
    const res = await create('crew', { title: `${tag} crew`, siteAddress: 'x' });
    expect(res.status).toBe(403);
    expect(await json(res)).toEqual({ error: expect.stringMatching(/owners and designers/) });
    expect(await countJobs(firmId)).toBe(before);
  });

  it('bad input answers 400 with a message per field, and nothing is written', async () => {
    const firmId = (await demoUser('designer')).firmId;
    const before = await countJobs(firmId);
    const clientsBefore = await Client.count({ where: { firmId } });
    const res = await create('designer', {
      title: ' ',
      status: 'paid',
      client: { name: 'Half Made', email: 'nope' },
    });
    expect(res.status).toBe(400);
    const body = (await json(res)) as { error: string; fields: Record<string, string[]> };
    expect(body.error).toBe('Title is required');
    expect(Object.keys(body.fields).sort()).toEqual([
      'client.email',
      'siteAddress',
      'status',
      'title',
    ]);
    expect(body.fields.title).toEqual(['Title is required']);
    expect(await countJobs(firmId)).toBe(before);
    expect(await Client.count({ where: { firmId } })).toBe(clientsBefore);
  });

  it('a body that is not JSON is a 400', async () => {
    const res = await createJob(
      await request('POST', '/api/jobs', { as: 'designer', rawBody: '{"title":' }),
    );
    expect(res.status).toBe(400);
  });

  it("another firm's client id is refused as a bad field", async () => {
    const firmId = (await demoUser('designer')).firmId;
    const before = await countJobs(firmId);
    const res = await create('designer', {
      title: `${tag} poach`,
      siteAddress: 'x',
      clientId: OTHER_FIRM_CLIENT,
    });
    expect(res.status).toBe(400);
    expect(((await json(res)) as { fields: object }).fields).toHaveProperty('clientId');
    expect(await countJobs(firmId)).toBe(before);
  });
});

describe('read, change, delete: the role matrix', () => {
  let job: JobDto;
  beforeAll(async () => {
    job = await newJob(`${tag} matrix`);
  });

  it.each(['owner', 'designer', 'crew'] as const)('%s can read a job', async (who) => {
    const res = await getJob(await request('GET', '/x', { as: who }), params(job.id));
    expect(res.status).toBe(200);
    expect(jobSchema.parse(await json(res)).id).toBe(job.id);
  });

  it('crew may not change a job, and it stays as it was', async () => {
    const res = await patchJob(
      await request('PATCH', '/x', { as: 'crew', body: { status: 'building' } }),
      params(job.id),
    );
    expect(res.status).toBe(403);
    expect((await Job.findByPk(job.id))!.status).toBe('enquiry');
  });

  it.each(['designer', 'owner'] as const)('%s can change a job', async (who) => {
    const res = await patchJob(
      await request('PATCH', '/x', {
        as: who,
        body: { status: 'quoted', notes: `noted by ${who}` },
      }),
      params(job.id),
    );
    expect(res.status).toBe(200);
    const body = jobSchema.parse(await json(res));
    expect(body).toMatchObject({ status: 'quoted', notes: `noted by ${who}` });
    expect(new Date(body.updatedAt).getTime()).toBeGreaterThanOrEqual(
      new Date(job.updatedAt).getTime(),
    );
  });

  it('a bad change answers 400 and changes nothing', async () => {
    const before = (await Job.findByPk(job.id))!.toJSON();
    const res = await patchJob(
      await request('PATCH', '/x', { as: 'designer', body: { title: '', status: 'sold' } }),
      params(job.id),
    );
    expect(res.status).toBe(400);
    const body = (await json(res)) as { fields: Record<string, string[]> };
    expect(Object.keys(body.fields).sort()).toEqual(['status', 'title']);
    expect((await Job.findByPk(job.id))!.toJSON()).toEqual(before);
  });

  it('an empty change is a 400', async () => {
    const res = await patchJob(
      await request('PATCH', '/x', { as: 'designer', body: {} }),
      params(job.id),
    );
    expect(res.status).toBe(400);
  });

  it('a client can be unlinked', async () => {
    const linked = await newJob(`${tag} unlink`, { client: { name: `${tag} Unlinked` } });
    expect(linked.client).not.toBeNull();
    const res = await patchJob(
      await request('PATCH', '/x', { as: 'designer', body: { clientId: null } }),
      params(linked.id),
    );
    expect(jobSchema.parse(await json(res)).client).toBeNull();
  });

  it('only the owner may delete: crew and designer get 403, the owner 204, then 404', async () => {
    const doomed = await newJob(`${tag} doomed`, { client: { name: `${tag} Doomed` } });
    for (const who of ['crew', 'designer'] as const) {
      const res = await deleteJob(await request('DELETE', '/x', { as: who }), params(doomed.id));
      expect(res.status).toBe(403);
      expect(await Job.findByPk(doomed.id)).not.toBeNull();
    }
    const res = await deleteJob(await request('DELETE', '/x', { as: 'owner' }), params(doomed.id));
    expect(res.status).toBe(204);
    expect(await Job.findByPk(doomed.id)).toBeNull();
    // Deleting a job keeps its client.
    expect(await Client.findByPk(doomed.client!.id)).not.toBeNull();
    const again = await getJob(await request('GET', '/x', { as: 'owner' }), params(doomed.id));
    expect(again.status).toBe(404);
  });
});

describe('firm isolation', () => {
  it("another firm's job is 404 to read, change and delete, and stays unchanged", async () => {
    const before = (await Job.findByPk(OTHER_FIRM_JOB))!.toJSON();
    const get = await getJob(await request('GET', '/x', { as: 'owner' }), params(OTHER_FIRM_JOB));
    expect(get.status).toBe(404);
    const patch = await patchJob(
      await request('PATCH', '/x', { as: 'owner', body: { title: 'Taken over' } }),
      params(OTHER_FIRM_JOB),
    );
    expect(patch.status).toBe(404);
    const del = await deleteJob(
      await request('DELETE', '/x', { as: 'owner' }),
      params(OTHER_FIRM_JOB),
    );
    expect(del.status).toBe(404);
    expect((await Job.findByPk(OTHER_FIRM_JOB))!.toJSON()).toEqual(before);
  });

  it('a malformed id is simply not found', async () => {
    const res = await getJob(await request('GET', '/x', { as: 'owner' }), params('not-a-uuid'));
    expect(res.status).toBe(404);
  });

  it("the list never shows another firm's jobs", async () => {
    const mine = await list('owner', 'pageSize=100');
    expect(mine.items.map((j) => j.id)).not.toContain(OTHER_FIRM_JOB);
    const theirs = await list('otherOwner', 'pageSize=100');
    expect(theirs.items.map((j) => j.id)).toContain(OTHER_FIRM_JOB);
    const rows = await Job.findAll({ where: { id: theirs.items.map((j) => j.id) } });
    expect(new Set(rows.map((j) => j.firmId))).toEqual(
      new Set([(await demoUser('otherOwner')).firmId]),
    );
    expect(theirs.total).toBe(await countJobs((await demoUser('otherOwner')).firmId));
  });
});

describe('list: search, filter, sort, paging', () => {
  const s = `${tag}s`;
  beforeAll(async () => {
    // Made oldest first, so "newest first" is the reverse of this order.
    await newJob(`${s} Charlie deck`, { status: 'quoted', client: { name: `${s} Zed Client` } });
    await newJob(`${s} alpha deck`, { status: 'enquiry' });
    await newJob(`Bravo deck ${s}`, { status: 'building', client: { name: `${s} Amy Client` } });
    await newJob(`Delta deck`, {
      siteAddress: `${s} Ferry Road`,
      status: 'quoted',
    });
    await newJob(`${s} 100% recycled`, { status: 'lost' });
    await newJob(`${s} 1000 mm step`, { status: 'complete' });
  });

  it('q matches title, site address and client name, case-insensitively', async () => {
    const all = await list('crew', `q=${s.toUpperCase()}`);
    expect(all.total).toBe(6);
    const byClient = await list('crew', `q=${encodeURIComponent(`${s} amy`)}`);
    expect(byClient.items.map((j) => j.title)).toEqual([`Bravo deck ${s}`]);
    const byAddress = await list('crew', `q=${encodeURIComponent(`${s} ferry`)}`);
    expect(byAddress.items.map((j) => j.title)).toEqual(['Delta deck']);
  });

  it('treats % and _ in q as plain text', async () => {
    const r = await list('crew', `q=${encodeURIComponent(`${s} 100%`)}`);
    expect(r.items.map((j) => j.title)).toEqual([`${s} 100% recycled`]);
    const u = await list('crew', `q=${encodeURIComponent(`${s}_`)}`);
    expect(u.total).toBe(0);
  });

  it('filters by one status or several', async () => {
    const quoted = await list('crew', `q=${s}&status=quoted`);
    expect(quoted.items.map((j) => j.title).sort()).toEqual(['Delta deck', `${s} Charlie deck`]);
    const two = await list('crew', `q=${s}&status=quoted,lost`);
    expect(two.total).toBe(3);
  });

  it('sorts newest first by default', async () => {
    const r = await list('crew', `q=${s}`);
    expect(r.items.map((j) => j.title)).toEqual([
      `${s} 1000 mm step`,
      `${s} 100% recycled`,
      'Delta deck',
      `Bravo deck ${s}`,
      `${s} alpha deck`,
      `${s} Charlie deck`,
    ]);
  });

  it('sorts by title ignoring case, either way', async () => {
    const asc = await list('crew', `q=${s}&sort=title`);
    const titles = asc.items.map((j) => j.title);
    expect(titles.slice(0, 2)).toEqual(['Bravo deck ' + s, 'Delta deck']);
    expect(titles.slice(2)).toEqual(
      [`${s} 1000 mm step`, `${s} 100% recycled`, `${s} alpha deck`, `${s} Charlie deck`].sort(
        (a, b) => (a.toLowerCase() < b.toLowerCase() ? -1 : 1),
      ),
    );
    const desc = await list('crew', `q=${s}&sort=title&dir=desc`);
    expect(desc.items.map((j) => j.title)).toEqual([...titles].reverse());
  });

  it('sorts by status in the order a job moves through them', async () => {
    const r = await list('crew', `q=${s}&sort=status`);
    expect(r.items.map((j) => j.status)).toEqual([
      'enquiry',
      'quoted',
      'quoted',
      'building',
      'complete',
      'lost',
    ]);
  });

  it('sorts by client name with jobs without a client last', async () => {
    const r = await list('crew', `q=${s}&sort=client`);
    expect(r.items.slice(0, 2).map((j) => j.client?.name)).toEqual([
      `${s} Amy Client`,
      `${s} Zed Client`,
    ]);
    expect(r.items.slice(2).every((j) => j.client === null)).toBe(true);
  });

  it('pages through the results without repeats', async () => {
    const pages = await Promise.all(
      [1, 2, 3, 4].map((page) => list('crew', `q=${s}&sort=title&pageSize=2&page=${page}`)),
    );
    expect(pages.map((p) => p.items.length)).toEqual([2, 2, 2, 0]);
    expect(pages.every((p) => p.total === 6 && p.pageSize === 2)).toBe(true);
    const ids = pages.flatMap((p) => p.items.map((j) => j.id));
    expect(new Set(ids).size).toBe(6);
    const whole = await list('crew', `q=${s}&sort=title`);
    expect(ids).toEqual(whole.items.map((j) => j.id));
  });

  it('counts each job’s designs', async () => {
    const seeded = await list('crew', 'q=Patio deck off the kitchen');
    expect(seeded.items[0].designCount).toBe(1);
  });

  it('a bad query is a 400 naming the parameter', async () => {
    const res = await listJobs(
      await request('GET', '/api/jobs?pageSize=1000&sort=price', { as: 'crew' }),
    );
    expect(res.status).toBe(400);
    const body = (await json(res)) as { fields: Record<string, string[]> };
    expect(Object.keys(body.fields).sort()).toEqual(['pageSize', 'sort']);
  });
});
