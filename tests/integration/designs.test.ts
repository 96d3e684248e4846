// Designs API: the starter document, versioned saves in one transaction, stale saves refused (409),
// revisions, roles and firm isolation (PRODUCT.md section 6, server quality bar).
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as getDesign, PUT as putDesign } from '@/app/api/designs/[id]/route';
import { GET as getRevisions } from '@/app/api/designs/[id]/revisions/route';
import { GET as getJob } from '@/app/api/jobs/[id]/route';
import { POST as postDesign } from '@/app/api/jobs/[id]/designs/route';
import { POST as postJob } from '@/app/api/jobs/route';
import { exampleDesign, type DesignDocument } from '@/engine/schema';
import {
  designRevisionSchema,
  designSchema,
  staleDesignSchema,
  type DesignDto,
} from '@/lib/validation/design';
import { jobSchema } from '@/lib/validation/job';
import { Design, DesignRevision } from '@/models';
import { json, params, request, type Who } from './helpers';

const OTHER_FIRM_JOB = '1a4c0000-0000-4000-8003-000000000011';
const OTHER_FIRM_DESIGN = '1a4c0000-0000-4000-8004-000000000011';
const tag = `zd${crypto.randomUUID().slice(0, 8)}`;

let jobId: string;
beforeAll(async () => {
  const res = await postJob(
    await request('POST', '/api/jobs', {
      as: 'designer',
      body: { title: `${tag} job`, siteAddress: '2 Test Lane' },
    }),
  );
  jobId = jobSchema.parse(await json(res)).id;
});

async function newDesign(body: unknown = { name: `${tag} design` }, as: Who = 'designer') {
  return postDesign(await request('POST', '/x', { as, body }), params(jobId));
}
async function save(id: string, body: unknown, as: Who = 'designer') {
  return putDesign(await request('PUT', '/x', { as, body }), params(id));
}
async function made(): Promise<DesignDto> {
  const res = await newDesign();
  expect(res.status).toBe(201);
  return designSchema.parse(await json(res));
}
const wider = (doc: DesignDocument, x: number): DesignDocument => ({
  ...doc,
  outline: [
    [0, 0],
    [x, 0],
    [x, 4000],
    [0, 4000],
  ],
});
const revisionCount = (designId: string) => DesignRevision.count({ where: { designId } });

describe('create', () => {
  it('starts from the 6 m x 4 m example at version 1, with a first revision', async () => {
    const d = await made();
    expect(d).toMatchObject({ jobId, version: 1, updatedBy: { name: 'Tom Ashby' } });
    expect(d.document).toEqual(exampleDesign());
    expect(await revisionCount(d.id)).toBe(1);
    const job = jobSchema.parse(
      await json(await getJob(await request('GET', '/x', { as: 'crew' }), params(jobId))),
    );
    expect(job.designs.map((x) => x.id)).toContain(d.id);
  });

  it('keeps a given document, with defaults filled in', async () => {
    const { codeBasis, products, ...bare } = exampleDesign();
    void codeBasis;
    void products;
    const res = await newDesign({ name: `${tag} given`, document: { ...bare, heightMm: 800 } });
    expect(res.status).toBe(201);
    const d = designSchema.parse(await json(res));
    expect(d.document.heightMm).toBe(800);
    expect(d.document.codeBasis).toBe('uk');
  });

  it('crew may not add a design', async () => {
    const before = await Design.count({ where: { jobId } });
    expect((await newDesign({ name: 'crew' }, 'crew')).status).toBe(403);
    expect(await Design.count({ where: { jobId } })).toBe(before);
  });

  it("another firm's job is 404, and gets no design", async () => {
    const before = await Design.count({ where: { jobId: OTHER_FIRM_JOB } });
    const res = await postDesign(
      await request('POST', '/x', { as: 'owner', body: { name: 'sneaky' } }),
      params(OTHER_FIRM_JOB),
    );
    expect(res.status).toBe(404);
    expect(await Design.count({ where: { jobId: OTHER_FIRM_JOB } })).toBe(before);
  });

  it('a bad document is a 400 naming the field', async () => {
    const before = await Design.count({ where: { jobId } });
    const res = await newDesign({
      name: `${tag} bad`,
      document: { ...exampleDesign(), joistCentresMm: 40 },
    });
    expect(res.status).toBe(400);
    const body = (await json(res)) as { error: string; fields: Record<string, string[]> };
    expect(body.fields['document.joistCentresMm']).toEqual([
      'Joist centres below 100 mm are not buildable',
    ]);
    expect(await Design.count({ where: { jobId } })).toBe(before);
  });
});

describe('save', () => {
  it('bumps the version, stores the document and writes a revision', async () => {
    const d = await made();
    const res = await save(d.id, { version: 1, document: wider(d.document, 7000), name: 'Wider' });
    expect(res.status).toBe(200);
    const saved = designSchema.parse(await json(res));
    expect(saved).toMatchObject({ version: 2, name: 'Wider', updatedBy: { name: 'Tom Ashby' } });
    expect(saved.document.outline[1]).toEqual([7000, 0]);

    const row = await Design.findByPk(d.id);
    expect(row!.version).toBe(2);
    const revs = await DesignRevision.findAll({
      where: { designId: d.id },
      order: [['version', 'ASC']],
    });
    expect(revs.map((r) => r.version)).toEqual([1, 2]);
    expect(revs[0].document.outline[1]).toEqual([6000, 0]);
    expect(revs[1].document.outline[1]).toEqual([7000, 0]);

    const again = await save(d.id, { version: 2, document: wider(d.document, 7500) }, 'owner');
    expect(designSchema.parse(await json(again))).toMatchObject({
      version: 3,
      updatedBy: { name: 'Harriet Vane' },
    });
  });

  it('refuses a stale save with 409 and who saved last, and changes nothing', async () => {
    const d = await made();
    expect(
      (await save(d.id, { version: 1, document: wider(d.document, 6500) }, 'owner')).status,
    ).toBe(200);
    const before = (await Design.findByPk(d.id))!.toJSON();

    // The designer still holds version 1.
    const res = await save(d.id, { version: 1, document: wider(d.document, 9000) });
    expect(res.status).toBe(409);
    const body = staleDesignSchema.parse(await json(res));
    expect(body.current).toEqual({
      version: 2,
      updatedAt: before.updatedAt.toISOString(),
      updatedBy: { id: before.updatedById, name: 'Harriet Vane' },
    });
    expect((await Design.findByPk(d.id))!.toJSON()).toEqual(before);
    expect(await revisionCount(d.id)).toBe(2);
  });

  it('a version from the future is stale too', async () => {
    const d = await made();
    expect((await save(d.id, { version: 5, document: d.document })).status).toBe(409);
    expect((await Design.findByPk(d.id))!.version).toBe(1);
  });

  it('of two saves from the same version at the same moment, exactly one wins', async () => {
    const d = await made();
    const results = await Promise.all([
      save(d.id, { version: 1, document: wider(d.document, 6100) }, 'owner'),
      save(d.id, { version: 1, document: wider(d.document, 6200) }, 'designer'),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await Design.findByPk(d.id))!.version).toBe(2);
    expect(await revisionCount(d.id)).toBe(2);
  });

  it('a bad document or version is a 400 and changes nothing', async () => {
    const d = await made();
    const before = (await Design.findByPk(d.id))!.toJSON();
    const cases: [unknown, string][] = [
      [{ version: 1, document: { ...d.document, outline: [[0, 0]] } }, 'document.outline'],
      [{ version: 1, document: { ...d.document, version: 2 } }, 'document.version'],
      [{ version: 'one', document: d.document }, 'version'],
      [{ document: d.document }, 'version'],
      [{ version: 1 }, 'document'],
    ];
    for (const [body, field] of cases) {
      const res = await save(d.id, body);
      expect(res.status).toBe(400);
      expect(Object.keys(((await json(res)) as { fields: object }).fields)).toContain(field);
    }
    expect((await Design.findByPk(d.id))!.toJSON()).toEqual(before);
    expect(await revisionCount(d.id)).toBe(1);
  });

  it('crew may read but not save', async () => {
    const d = await made();
    const read = await getDesign(await request('GET', '/x', { as: 'crew' }), params(d.id));
    expect(read.status).toBe(200);
    const res = await save(d.id, { version: 1, document: wider(d.document, 6600) }, 'crew');
    expect(res.status).toBe(403);
    expect((await Design.findByPk(d.id))!.version).toBe(1);
  });
});

describe('load', () => {
  it('fills defaults into a document stored before later optional fields existed', async () => {
    const d = await made();
    const bare = { ...exampleDesign() } as Record<string, unknown>;
    for (const key of ['codeBasis', 'stairCentresMm', 'nogginRule', 'products', 'kerfMm']) {
      delete bare[key];
    }
    await Design.update({ document: bare as never }, { where: { id: d.id } });
    const res = await getDesign(await request('GET', '/x', { as: 'crew' }), params(d.id));
    const loaded = designSchema.parse(await json(res));
    expect(loaded.document).toEqual(exampleDesign());
  });

  it('tells the same person when their own other window saved first', async () => {
    const d = await made();
    await save(d.id, { version: 1, document: wider(d.document, 6300) });
    const res = await save(d.id, { version: 1, document: wider(d.document, 6400) });
    expect(res.status).toBe(409);
    expect(((await json(res)) as { error: string }).error).toMatch(/saved by you/);
  });
});

describe('revisions', () => {
  it('lists every saved version, newest first, with who saved it', async () => {
    const d = await made();
    await save(d.id, { version: 1, document: wider(d.document, 6100) }, 'owner');
    await save(d.id, { version: 2, document: wider(d.document, 6200) });
    const res = await getRevisions(await request('GET', '/x', { as: 'crew' }), params(d.id));
    expect(res.status).toBe(200);
    const revs = designRevisionSchema.array().parse(await json(res));
    expect(revs.map((r) => [r.version, r.savedBy?.name])).toEqual([
      [3, 'Tom Ashby'],
      [2, 'Harriet Vane'],
      [1, 'Tom Ashby'],
    ]);
  });
});

describe('firm isolation', () => {
  it("another firm's design is 404 to read, save and list, and stays unchanged", async () => {
    const before = (await Design.findByPk(OTHER_FIRM_DESIGN))!.toJSON();
    const revsBefore = await revisionCount(OTHER_FIRM_DESIGN);
    for (const who of ['owner', 'designer', 'crew'] as const) {
      const get = await getDesign(
        await request('GET', '/x', { as: who }),
        params(OTHER_FIRM_DESIGN),
      );
      expect(get.status).toBe(404);
      const revs = await getRevisions(
        await request('GET', '/x', { as: who }),
        params(OTHER_FIRM_DESIGN),
      );
      expect(revs.status).toBe(404);
    }
    const put = await save(
      OTHER_FIRM_DESIGN,
      { version: before.version, document: exampleDesign() },
      'owner',
    );
    expect(put.status).toBe(404);
    expect((await Design.findByPk(OTHER_FIRM_DESIGN))!.toJSON()).toEqual(before);
    expect(await revisionCount(OTHER_FIRM_DESIGN)).toBe(revsBefore);
  });

  it('the other firm reads its own design', async () => {
    const res = await getDesign(
      await request('GET', '/x', { as: 'otherOwner' }),
      params(OTHER_FIRM_DESIGN),
    );
    expect(res.status).toBe(200);
  });
});
