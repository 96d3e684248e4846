import { describe, expect, it } from 'vitest';
import { designLoads } from '../codes';
import { engineeredSpan } from '../span';
import {
  boardSpecFromProduct,
  lookupSpanTable,
  productInputSchema,
  specsFromProducts,
  withProductSpecs,
  type CatalogueProduct,
  type ProductInput,
} from '.';

const make = (id: string, input: ProductInput): CatalogueProduct => ({
  id,
  ...productInputSchema.parse(input),
});

// Common practice (PRODUCT.md section 3): a 125 x 50 recycled-plastic joist spans 1.5 m at 400 mm.
const plasticJoist = make('j1', {
  kind: 'joist',
  name: 'Plastic joist 125 x 50',
  sku: 'J-1',
  unit: 'length',
  unitPrice: 24.5,
  stockLengthsMm: [3000],
  dimensions: { widthMm: 50, depthMm: 125 },
  spanTable: [
    { centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 },
    { centresMm: 300, maxSpanMm: 1700, maxCantileverMm: 150 },
  ],
});

// Illustrative allowable stresses for a softwood joist (from memory, roughly C24 wet service).
const timberJoist = make('j2', {
  kind: 'joist',
  name: 'Timber joist 47 x 150',
  sku: 'J-2',
  unit: 'length',
  unitPrice: 13.8,
  stockLengthsMm: [3600, 4800, 3000],
  dimensions: { widthMm: 47, depthMm: 150 },
  material: { EMPa: 8640, fbMPa: 6, fvMPa: 0.64, densityKgM3: 420 },
});

const board = make('b1', {
  kind: 'board',
  name: 'Composite board 140 x 25',
  sku: 'B-1',
  unit: 'length',
  unitPrice: 32,
  stockLengthsMm: [4800],
  dimensions: { widthMm: 140, depthMm: 25 },
  // Common practice for composite boards: 400 mm square, 300 mm at an angle.
  boardMaxCentres: { straightMm: 400, angledMm: 300 },
});

describe('maker span table lookup (conservative: next wider centres)', () => {
  const table = plasticJoist.spanTable!;
  it.each([
    [250, 1700, false],
    [300, 1700, false],
    [301, 1500, false],
    [400, 1500, false],
  ])('%i mm centres -> %i mm', (c, span, extra) => {
    const r = lookupSpanTable(table, c)!;
    expect(r.maxSpanMm).toBe(span);
    expect(r.extrapolated).toBe(extra);
  });
  it('beyond the widest row, scales by the centres ratio (never longer than the widest row)', () => {
    const r = lookupSpanTable(table, 600)!;
    expect(r.extrapolated).toBe(true);
    expect(r.maxSpanMm).toBe(Math.floor((1500 * 400) / 600));
    expect(r.maxCantileverMm).toBe(Math.floor((100 * 400) / 600));
  });
  it('an empty table gives nothing', () => {
    expect(lookupSpanTable([], 400)).toBeNull();
  });
});

describe('specsFromProducts', () => {
  it('plastic joist at 400 mm: the maker figure, 1500 mm span, 100 mm cantilever (common practice)', () => {
    const s = specsFromProducts({ joist: plasticJoist, board }, 'uk', 400);
    expect(s.joist).toMatchObject({
      widthMm: 50,
      depthMm: 125,
      stockMm: 3000,
      maxSpanMm: 1500,
      maxCantileverMm: 100,
      basis: 'span-table',
    });
    expect(s.joist!.explain).toContain('400 mm centres');
    expect(s.joist!.explain).toContain('qualified engineer');
    expect(s.board).toMatchObject({ widthMm: 140, stockMm: 4800, maxSpanMm: 400, gapMm: 5 });
  });

  it('timber joist: engineered span under the basis loads, longest stock, cantilever a quarter (AWC DCA 6)', () => {
    for (const basis of ['uk', 'us'] as const) {
      const s = specsFromProducts({ joist: timberJoist }, basis, 400);
      const loads = designLoads(basis);
      const r = engineeredSpan({
        section: { bMm: 47, dMm: 150 },
        material: timberJoist.material!,
        centresMm: 400,
        loads: { imposedKPa: loads.imposedKPa, deadKPa: loads.deadKPa },
        deflectionLimit: loads.deflectionLimit,
      });
      expect(s.joist!.maxSpanMm).toBe(Math.floor(r.allowableSpanMm));
      expect(s.joist!.maxCantileverMm).toBe(Math.floor(s.joist!.maxSpanMm / 4));
      expect(s.joist!.stockMm).toBe(4800);
      expect(s.joist!.basis).toBe('engineered');
      expect(s.joist!.explain).toContain('Design Aid No. 6');
      expect(s.board).toBeNull();
    }
    // The US design load (40 + 10 psf) is heavier than the UK one (1.5 + 0.5 kN/m²): shorter span.
    expect(specsFromProducts({ joist: timberJoist }, 'us', 400).joist!.maxSpanMm).toBeLessThan(
      specsFromProducts({ joist: timberJoist }, 'uk', 400).joist!.maxSpanMm,
    );
  });

  it('closer centres never give a shorter span', () => {
    const at = (c: number) => specsFromProducts({ joist: timberJoist }, 'uk', c).joist!.maxSpanMm;
    expect(at(300)).toBeGreaterThan(at(400));
    const pt = (c: number) => specsFromProducts({ joist: plasticJoist }, 'uk', c).joist!.maxSpanMm;
    expect(pt(300)).toBeGreaterThanOrEqual(pt(350));
    expect(pt(350)).toBeGreaterThanOrEqual(pt(400));
  });

  it('refuses the wrong kind and bad centres', () => {
    expect(() => specsFromProducts({ joist: board }, 'uk', 400)).toThrow(RangeError);
    expect(() => specsFromProducts({ joist: plasticJoist }, 'uk', 0)).toThrow(RangeError);
  });
});

describe('board span limit by laying angle (effective span = centres / sin angle; common practice)', () => {
  it('square: the straight figure', () => {
    expect(boardSpecFromProduct(board, { boardToJoistDeg: 90 }).maxSpanMm).toBe(400);
  });
  it('at 45°: 300 mm centres allowed, so the limit along the board is 300 / sin 45° = 424 mm', () => {
    const s = boardSpecFromProduct(board, { boardToJoistDeg: 45 });
    expect(s.maxSpanMm).toBe(Math.floor(300 / Math.sin(Math.PI / 4)));
    // 300 mm centres pass, 310 mm fail the engine's check (centres / sin angle <= maxSpanMm).
    expect(300 / Math.sin(Math.PI / 4)).toBeLessThanOrEqual(s.maxSpanMm + 1);
    expect(310 / Math.sin(Math.PI / 4)).toBeGreaterThan(s.maxSpanMm);
  });
  it('nearly parallel boards are refused', () => {
    expect(() => boardSpecFromProduct(board, { boardToJoistDeg: 3 })).toThrow(RangeError);
  });
});

describe('product schema (shared by API and form)', () => {
  it('a joist needs a span table or material; a board needs its maximum centres', () => {
    const j = productInputSchema.safeParse({
      kind: 'joist',
      name: 'x',
      sku: 'x',
      unitPrice: 1,
      stockLengthsMm: [3000],
      dimensions: { widthMm: 50, depthMm: 125 },
    });
    expect(j.success).toBe(false);
    expect(j.error!.issues.map((i) => i.path.join('.'))).toContain('spanTable');
    const b = productInputSchema.safeParse({
      kind: 'board',
      name: 'x',
      sku: 'x',
      unitPrice: 1,
      stockLengthsMm: [4800],
      dimensions: { widthMm: 140, depthMm: 25 },
    });
    expect(b.error!.issues.map((i) => i.path.join('.'))).toContain('boardMaxCentres');
  });
  it('an empty joist reports every missing piece at once (kind rules run beside field errors)', () => {
    const r = productInputSchema.safeParse({ kind: 'joist', name: '', sku: '', unitPrice: 0 });
    const paths = r.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(
      expect.arrayContaining(['name', 'sku', 'dimensions.widthMm', 'stockLengthsMm', 'spanTable']),
    );
  });
  it('prices: no negatives, at most two decimals; screws need no stock length', () => {
    const base = { kind: 'screw', name: 'Screw', sku: 'S', dimensions: {} } as const;
    expect(productInputSchema.safeParse({ ...base, unitPrice: -1 }).success).toBe(false);
    expect(productInputSchema.safeParse({ ...base, unitPrice: 0.125 }).success).toBe(false);
    expect(productInputSchema.safeParse({ ...base, unitPrice: 0.28 }).success).toBe(true);
  });
  it('span table rows need distinct centres; angled centres cannot exceed square', () => {
    const r = productInputSchema.safeParse({
      ...plasticJoist,
      spanTable: [
        { centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 },
        { centresMm: 400, maxSpanMm: 1600, maxCantileverMm: 100 },
      ],
    });
    expect(r.success).toBe(false);
    const b = productInputSchema.safeParse({
      ...board,
      boardMaxCentres: { straightMm: 300, angledMm: 400 },
    });
    expect(b.error!.issues[0].path.join('.')).toBe('boardMaxCentres.angledMm');
  });
});

describe('withProductSpecs', () => {
  it('puts the chosen limits, their source and working into the design; same design when unchanged', async () => {
    const { exampleDesign } = await import('../schema');
    const design = exampleDesign();
    const specs = specsFromProducts({ joist: timberJoist, board }, 'uk', design.joistCentresMm);
    const next = withProductSpecs(design, specs);
    expect(next).not.toBe(design);
    expect(next.joist.maxSpanMm).toBe(specs.joist!.maxSpanMm);
    expect(next.joist.source).toContain('engineered span');
    expect(next.joist.limitExplain).toContain('Design Aid No. 6');
    expect(next.board.source).toContain('maker');
    expect(withProductSpecs(next, specs)).toBe(next);
    expect(design.joist.source).toBeUndefined(); // input untouched
  });
});
