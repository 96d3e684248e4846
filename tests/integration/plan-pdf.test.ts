// Framing plan PDF and materials routes against the real database: roles, firm isolation, query
// validation, the PDF read back, the priced take-off and its CSV.
import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as getMaterials } from '@/app/api/designs/[id]/materials/route';
import { GET as getPlan } from '@/app/api/designs/[id]/plan/route';
import { POST as createDesign } from '@/app/api/jobs/[id]/designs/route';
import { POST as createJob } from '@/app/api/jobs/route';
import { designDocumentSchema, exampleDesign, planFrame, type DesignDocument } from '@/engine';
import type { PricedTakeOff } from '@/engine/takeoff/price';
import { pdfText } from '@/lib/pdf/text';
import { formatLength } from '@/lib/units';
import { Product } from '@/models';
import { demoUser, json, params, request, type Who } from './helpers';

/** An overall dimension as the plan writes it: bare millimetres, or feet and inches. */
const overall = (mm: number, units: 'metric' | 'imperial') =>
  pdfText(formatLength(mm, units)).replace(/ mm$/, '');

const tag = `pdf${crypto.randomUUID().slice(0, 8)}`;

async function readPdf(res: Response) {
  const bytes = new Uint8Array(await res.arrayBuffer());
  // pdf.js takes the buffer over (detaches it), so keep what the test reads first.
  const head = new TextDecoder().decode(bytes.slice(0, 5));
  const parser = new PDFParse({ data: bytes });
  try {
    const text = await parser.getText();
    const info = await parser.getInfo({ parsePageInfo: true });
    return {
      head,
      text: text.text.replace(/\s+/g, ' '),
      sizes: info.pages.map((p) => [p.width, p.height]),
    };
  } finally {
    await parser.destroy();
  }
}

async function newDesign(as: Who, title: string, document: DesignDocument) {
  const jobRes = await createJob(
    await request('POST', '/api/jobs', {
      as,
      body: {
        title,
        siteAddress: '3 Weir Cottages, Kestrelford',
        client: { name: `${tag} Client` },
      },
    }),
  );
  expect(jobRes.status).toBe(201);
  const job = (await json(jobRes)) as { id: string };
  const res = await createDesign(
    await request('POST', `/api/jobs/${job.id}/designs`, {
      as,
      body: { name: 'Main deck', document },
    }),
    params(job.id),
  );
  expect(res.status).toBe(201);
  return (await json(res)) as { id: string; version: number };
}

const plan = async (id: string, as: Who | undefined, query = '') =>
  getPlan(await request('GET', `/api/designs/${id}/plan${query}`, { as }), params(id));
const materials = async (id: string, as: Who | undefined, query = '') =>
  getMaterials(await request('GET', `/api/designs/${id}/materials${query}`, { as }), params(id));

let document: DesignDocument;
let ours: { id: string; version: number };
let theirs: { id: string; version: number };

beforeAll(async () => {
  const firmId = (await demoUser('designer')).firmId;
  // Choose the firm's first joist and board so those lines are priced (the seed has two of each).
  const joist = await Product.findOne({
    where: { firmId, kind: 'joist', active: true },
    order: [['name', 'ASC']],
  });
  const board = await Product.findOne({
    where: { firmId, kind: 'board', active: true },
    order: [['name', 'ASC']],
  });
  document = designDocumentSchema.parse({
    ...exampleDesign(),
    steps: [{ edge: 0, offsetMm: 2000, widthMm: 1500, count: 2, treadBoards: 3 }],
    products: { joist: joist?.id, board: board?.id },
  });
  ours = await newDesign('designer', `${tag} Larchfield deck`, document);
  theirs = await newDesign('otherOwner', `${tag} Orchard deck`, exampleDesign());
});

describe('GET /api/designs/[id]/plan', () => {
  it.each(['owner', 'designer', 'crew'] as const)(
    '%s downloads the framing plan PDF',
    async (who) => {
      const res = await plan(ours.id, who);
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toBe('application/pdf');
      expect(res.headers.get('content-disposition')).toMatch(
        /^attachment; filename="framing-plan-.*-v1-a4\.pdf"$/,
      );
      const pdf = await readPdf(res);
      expect(pdf.head).toBe('%PDF-');
      // Dimensions come in the reader's own units (the seed gives the users different ones).
      const { units } = await demoUser(who);
      for (const text of [
        'Larchfield Decks',
        `${tag} Larchfield deck`,
        `${tag} Client`,
        '3 Weir Cottages, Kestrelford',
        'Tom Ashby',
        'v1',
        overall(6000, units),
        overall(4000, units),
        'Member schedule',
        'Footing schedule',
        'Cut list',
      ])
        expect(pdf.text).toContain(text);
      expect(pdf.text.toLowerCase()).toContain('qualified engineer');
    },
  );

  it('prints A3 when asked (ISO 216 landscape, 420 x 297 mm)', async () => {
    const res = await plan(ours.id, 'crew', '?paper=a3');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toContain('-a3.pdf');
    const pdf = await readPdf(res);
    expect(pdf.sizes[0][0]).toBeCloseTo((420 * 72) / 25.4, 0);
    expect(pdf.sizes[0][1]).toBeCloseTo((297 * 72) / 25.4, 0);
    expect(pdf.text).toContain('at A3');
  });

  it('refuses an unknown paper size with 400', async () => {
    const res = await plan(ours.id, 'owner', '?paper=a5');
    expect(res.status).toBe(400);
    expect(await json(res)).toMatchObject({
      error: 'Paper must be a4 or a3',
      fields: { paper: expect.any(Array) },
    });
  });

  it('answers 401 without a session', async () => {
    expect((await plan(ours.id, undefined)).status).toBe(401);
  });

  it("answers 404 for another firm's design, either way round, and for a malformed id", async () => {
    for (const who of ['owner', 'designer', 'crew'] as const)
      expect((await plan(theirs.id, who)).status).toBe(404);
    expect((await plan(ours.id, 'otherOwner')).status).toBe(404);
    expect((await plan('not-a-uuid', 'owner')).status).toBe(404);
  });
});

describe('GET /api/designs/[id]/materials', () => {
  it('answers the priced take-off as JSON with a 10% waste allowance by default', async () => {
    const res = await materials(ours.id, 'crew');
    expect(res.status).toBe(200);
    const body = (await json(res)) as PricedTakeOff & { designId: string };
    expect(body.designId).toBe(ours.id);
    expect(body.wastePct).toBe(10);
    expect(body.lines.map((l) => l.key)).toEqual(planFrame(document).quantities.map((q) => q.key));
    const joists = body.lines.find((l) => l.product === 'joist');
    expect(joists?.unpriced).toBeUndefined();
    expect(joists?.amount).toBeCloseTo((joists!.buyQty ?? 0) * (joists!.unitPrice ?? 0), 2);
    const sum = body.lines.reduce((s, l) => s + (l.amount ?? 0), 0);
    expect(body.subtotal).toBeCloseTo(sum, 2);
    expect(body.total).toBeCloseTo(body.subtotal + body.waste, 2);
  });

  it('applies the waste allowance the user sets', async () => {
    const none = (await json(await materials(ours.id, 'owner', '?wastePct=0'))) as PricedTakeOff;
    expect(none.waste).toBe(0);
    expect(none.total).toBe(none.subtotal);
    const fifteen = (await json(
      await materials(ours.id, 'owner', '?wastePct=15'),
    )) as PricedTakeOff;
    const base = fifteen.lines
      .filter((l) => l.wasteApplies)
      .reduce((s, l) => s + (l.amount ?? 0), 0);
    expect(fifteen.waste).toBeCloseTo(base * 0.15, 1);
    expect(fifteen.subtotal).toBe(none.subtotal);
  });

  it('downloads the same lines as CSV', async () => {
    const json10 = (await json(await materials(ours.id, 'designer'))) as PricedTakeOff;
    const res = await materials(ours.id, 'designer', '?format=csv');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expect(res.headers.get('content-disposition')).toMatch(
      /^attachment; filename="materials-.*-v1\.csv"$/,
    );
    const csv = await res.text();
    const rows = csv.trimEnd().split('\r\n');
    expect(rows[0]).toMatch(/^Item,Quantity,Unit,/);
    for (const line of json10.lines) expect(csv).toContain(line.label);
    expect(rows.find((r) => r.startsWith('Total,'))).toContain(json10.total.toFixed(2));
    expect(rows.some((r) => r.startsWith('Waste allowance 10%'))).toBe(true);
    expect(csv).toContain('qualified engineer');
  });

  it.each([['?wastePct=-1'], ['?wastePct=101'], ['?wastePct=lots'], ['?format=xls']])(
    'refuses %s with 400',
    async (q) => {
      const res = await materials(ours.id, 'owner', q);
      expect(res.status).toBe(400);
      expect(await json(res)).toMatchObject({
        error: expect.any(String),
        fields: expect.any(Object),
      });
    },
  );

  it("answers 401 without a session and 404 for another firm's design", async () => {
    expect((await materials(ours.id, undefined)).status).toBe(401);
    expect((await materials(theirs.id, 'crew')).status).toBe(404);
    expect((await materials(ours.id, 'otherOwner', '?format=csv')).status).toBe(404);
  });
});
