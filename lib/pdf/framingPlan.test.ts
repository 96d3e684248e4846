import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { designDocumentSchema, exampleDesign, planFrame, type DesignDocument } from '@/engine';
import { formatLength } from '@/lib/units';
import { STANDARD_SCALES, chooseScale, framingPlanPdf, type PlanMeta } from './framingPlan';
import { frameAxes, geometryPoints, paperExtent, planChains } from './planDrawing';
import { TRENCH_BELOW_BLOCK_TOP_MM, memberSchedule } from './schedules';
import { pdfText } from './text';

const meta: PlanMeta = {
  firm: 'Larchfield Decks',
  job: 'Back garden deck',
  client: 'Ada Lovelace',
  site: '9 Orchard Way, Kestrelford',
  designer: 'Tom Ashby',
  date: '1 Dec 2026',
  revision: 'v7',
  units: 'metric',
};

async function readPdf(bytes: Uint8Array) {
  const parser = new PDFParse({ data: bytes });
  try {
    const text = await parser.getText();
    const info = await parser.getInfo({ parsePageInfo: true });
    return {
      pages: text.pages.map((p) => p.text),
      all: text.text,
      sizes: info.pages.map((p) => [p.width, p.height]),
    };
  } finally {
    await parser.destroy();
  }
}

const withSteps = (): DesignDocument =>
  designDocumentSchema.parse({
    ...exampleDesign(),
    steps: [{ edge: 0, offsetMm: 2000, widthMm: 1500, count: 2, treadBoards: 3 }],
  });

/** A 30 m x 20 m L-shaped deck with a flight of steps (PRODUCT.md section 6's benchmark deck). */
const largeDeck = (): DesignDocument =>
  designDocumentSchema.parse({
    ...exampleDesign(),
    heightMm: 700,
    outline: [
      [0, 0],
      [30000, 0],
      [30000, 12000],
      [14000, 12000],
      [14000, 20000],
      [0, 20000],
    ],
    steps: [{ edge: 0, offsetMm: 3000, widthMm: 2000, count: 3, treadBoards: 3 }],
  });

const norm = (s: string) => s.replace(/\s+/g, ' ');

describe('framingPlanPdf', () => {
  const design = withSteps();
  const plan = planFrame(design);

  it('carries the title block on every sheet', async () => {
    const pdf = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a4' }));
    expect(pdf.pages.length).toBeGreaterThanOrEqual(2);
    pdf.pages.forEach((page, i) => {
      for (const field of [
        meta.firm,
        meta.job,
        meta.client,
        meta.site,
        meta.designer,
        meta.date,
        meta.revision,
        'Millimetres (mm)',
      ])
        expect(page).toContain(field);
      expect(page).toContain(`${i + 1} of ${pdf.pages.length}`);
    });
    // The plan sheet's scale is a standard one, written as on a drawing.
    expect(pdf.pages[0]).toMatch(/1:(20|25|50|100) at A4/);
  });

  it('dimensions the overall size, the support rows and the joist centres', async () => {
    const pdf = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a4' }));
    const page = norm(pdf.pages[0]);
    const bare = (mm: number) => pdfText(formatLength(mm, 'metric')).replace(/ mm$/, '');
    expect(page).toContain(bare(6000));
    expect(page).toContain(bare(4000));
    // Every gap between consecutive support rows appears on the chain.
    const ys = [0, ...plan.supportRows.map((r) => (r.a[1] + r.b[1]) / 2), 4000].sort(
      (a, b) => a - b,
    );
    for (let i = 1; i < ys.length; i++) {
      const gap = ys[i] - ys[i - 1];
      if (gap > 1) expect(page).toContain(bare(gap));
    }
    // 400 mm centres (common practice, PRODUCT.md) are written on the joist chain.
    expect(page).toMatch(/\b400\b/);
    // Every support row is named on the plan, as in the footing schedule.
    plan.supportRows.forEach((_, i) => expect(page).toContain(`Row ${i + 1}`));
  });

  it('lists the member, footing and cut-list schedules', async () => {
    const pdf = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a4' }));
    const all = norm(pdf.all);
    expect(all).toContain('Member schedule');
    for (const row of memberSchedule(plan, 'metric').rows) expect(all).toContain(row.join(' '));
    expect(all).toContain('Footing schedule');
    // Block laid flat on a 100 mm bed: trench bottom 200 mm below the block top (common practice).
    expect(TRENCH_BELOW_BLOCK_TOP_MM).toBe(200);
    expect(all).toContain('200 mm below block top');
    plan.supportRows.forEach((_, i) => expect(all).toMatch(new RegExp(`Row ${i + 1} Blocks flat`)));
    expect(all).toContain('Cut list');
    expect(all).toContain(`Joists: ${plan.cutList.joists.count} stock piece`);
    expect(all).toContain(`Boards: ${plan.cutList.boards.count} stock piece`);
  });

  it('shows the cautions and lists every error and warning', async () => {
    const pdf = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a4' }));
    const first = norm(pdf.pages[0]);
    // PRODUCT.md, safety: guidance only, codes and an engineer decide, guards, buried services.
    for (const words of ['guidance only', 'qualified engineer', 'guards', 'buried services'])
      expect(first.toLowerCase()).toContain(words);
    const all = norm(pdf.all);
    expect(all).toContain('Checks to resolve');
    const serious = plan.flags.filter((f) => f.severity !== 'info');
    expect(serious.length).toBeGreaterThan(0); // a 435 mm going is over ADK Table 1.1's 300 mm
    for (const f of serious) expect(all).toContain(norm(pdfText(f.message)));
  });

  it('prints landscape A4 and A3 pages (ISO 216: 297 x 210 mm and 420 x 297 mm)', async () => {
    const ptPerMm = 72 / 25.4;
    const a4 = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a4' }));
    const a3 = await readPdf(framingPlanPdf({ plan, design, meta, paper: 'a3' }));
    for (const [w, h] of a4.sizes) {
      expect(w).toBeCloseTo(297 * ptPerMm, 0);
      expect(h).toBeCloseTo(210 * ptPerMm, 0);
    }
    for (const [w, h] of a3.sizes) {
      expect(w).toBeCloseTo(420 * ptPerMm, 0);
      expect(h).toBeCloseTo(297 * ptPerMm, 0);
    }
  });

  it('writes feet and inches for imperial readers', async () => {
    const pdf = await readPdf(
      framingPlanPdf({ plan, design, meta: { ...meta, units: 'imperial' }, paper: 'a4' }),
    );
    const page = norm(pdf.pages[0]);
    expect(page).toContain('Feet and inches');
    expect(page).toContain(pdfText(formatLength(6000, 'imperial')));
    expect(page).toContain(pdfText(formatLength(4000, 'imperial')));
  });

  it('splits a large deck into an overview and part sheets at a legible scale', async () => {
    const big = largeDeck();
    const bigPlan = planFrame(big);
    const pdf = await readPdf(framingPlanPdf({ plan: bigPlan, design: big, meta, paper: 'a4' }));
    const titles = pdf.pages.map((p) => norm(p));
    expect(titles[0]).toContain('OVERVIEW');
    const parts = titles.filter((p) => /PART [A-Z]\d 1:100/.test(p));
    expect(parts.length).toBeGreaterThanOrEqual(2);
    expect(norm(pdf.all)).toContain('30 000');
    expect(norm(pdf.all)).toContain('20 000');
    // The L's inner edges are written along them (the overall chains give only 30 m and 20 m).
    for (const edge of ['14 000', '16 000', '12 000', '8 000']) expect(titles[0]).toContain(edge);
    // Part sheets carry the cautions too.
    for (const p of parts) expect(p.toLowerCase()).toContain('buried services');
  });

  it('never prints a character the built-in font cannot encode', async () => {
    const odd = { ...meta, client: 'Zoë Łukasz ☃', site: 'Flat 2\u2009B' };
    const pdf = await readPdf(framingPlanPdf({ plan, design, meta: odd, paper: 'a4' }));
    expect(pdf.pages[0]).toContain('Zoë ?ukasz ?');
    expect(pdf.pages[0]).toContain('Flat 2 B');
  });
});

describe('chooseScale', () => {
  it('picks the largest standard scale at which the plan and its dimensions fit', () => {
    const design = withSteps();
    const plan = planFrame(design);
    const chains = planChains(plan, design, frameAxes(design));
    const points = geometryPoints(plan);
    const area = { w: 180, h: 170 };
    const s = chooseScale(points, chains, area);
    expect(s).not.toBeNull();
    const fits = (k: number) => {
      const e = paperExtent(points, chains, k);
      return e.x1 - e.x0 <= area.w && e.y1 - e.y0 <= area.h;
    };
    expect(fits(s!)).toBe(true);
    const larger = STANDARD_SCALES.filter((k) => k < s!);
    for (const k of larger) expect(fits(k)).toBe(false);
  });

  it('returns null when nothing fits', () => {
    const design = withSteps();
    const plan = planFrame(design);
    const chains = planChains(plan, design, frameAxes(design));
    expect(chooseScale(geometryPoints(plan), chains, { w: 5, h: 5 })).toBeNull();
  });
});

describe('pdfText', () => {
  it('keeps WinAnsi text and swaps what Helvetica cannot show', () => {
    expect(pdfText('4\u2009800 mm × 2 m² – ok')).toBe('4 800 mm × 2 m² – ok');
    expect(pdfText('\u2264 300 \u2212 5')).toBe('<= 300 - 5');
    expect(pdfText('雪')).toBe('?');
  });
});
