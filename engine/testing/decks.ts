// Random and named decks for the engine's tests and benchmark. Pure: imports only fast-check, schema and types.
import fc from 'fast-check';
import { designDocumentSchema, type DesignDocument, type DesignDocumentInput } from '../schema';
import type { Pt } from '../types';

/** The joist and board settings of PRODUCT.md section 4 (common practice). */
export const STANDARD = {
  joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
  board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
};

/** A parsed design with the standard settings and the given outline and overrides. */
export function deck(outline: Pt[], over: Partial<DesignDocumentInput> = {}): DesignDocument {
  return designDocumentSchema.parse({
    version: 1,
    outline,
    boardAngleDeg: 0,
    heightMm: 450,
    joistCentresMm: 400,
    borderCourses: 0,
    supports: [],
    steps: [],
    ...STANDARD,
    ...over,
  });
}

/** A w x h rectangle from the origin. */
export function rect(w: number, h: number): Pt[] {
  return [
    [0, 0],
    [w, 0],
    [w, h],
    [0, h],
  ];
}

/** An L: a w x h rectangle with the top-right corner (w - legW) x (h - legH) cut away. */
export function lShape(w: number, h: number, legW: number, legH: number): Pt[] {
  return [
    [0, 0],
    [w, 0],
    [w, legH],
    [legW, legH],
    [legW, h],
    [0, h],
  ];
}

/** The benchmark deck: a 30 m x 20 m L with an 8 m deep arm and a 12 m wide leg, steps on the front. */
export function benchDeck(): DesignDocument {
  return deck(lShape(30_000, 20_000, 12_000, 8_000), {
    borderCourses: 1,
    steps: [{ edge: 0, offsetMm: 2000, widthMm: 3000, count: 2 }],
  });
}

const shapeArb = fc.oneof(
  // Star-shaped polygons: corners sorted by angle around a centre are always simple.
  fc
    .array(fc.tuple(fc.integer({ min: 5, max: 100 }), fc.integer({ min: 1500, max: 8000 })), {
      minLength: 3,
      maxLength: 9,
    })
    .map((parts) => {
      const total = parts.reduce((s, [g]) => s + g, 0);
      let acc = 0;
      return parts.map(([g, r]) => {
        const ang = (2 * Math.PI * acc) / total;
        acc += g;
        return [Math.round(r * Math.cos(ang)), Math.round(r * Math.sin(ang))] as Pt;
      });
    }),
  // Rectangles, Ls, Us, bays and chamfered rectangles.
  fc
    .record({
      kind: fc.constantFrom('rect', 'L', 'U', 'bay', 'chamfer'),
      W: fc.integer({ min: 1500, max: 14_000 }),
      H: fc.integer({ min: 1500, max: 10_000 }),
      a: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
      b: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
    })
    .map(({ kind, W, H, a, b }): Pt[] => {
      const r = (v: number) => Math.round(v);
      switch (kind) {
        case 'rect':
          return rect(W, H);
        case 'L':
          return lShape(W, H, r(W * a), r(H * b));
        case 'U': {
          const p = r(W * (0.15 + 0.2 * a));
          const q = r(W * (0.6 + 0.2 * a));
          const d = r(H * (1 - b * 0.8));
          return [
            [0, 0],
            [W, 0],
            [W, H],
            [q, H],
            [q, d],
            [p, d],
            [p, H],
            [0, H],
          ];
        }
        case 'bay': {
          const D = r(H * b * 0.5);
          return [
            [0, 0],
            [W, 0],
            [W, H],
            [r(W * 0.75), H],
            [r(W * 0.6), H + D],
            [r(W * 0.4), H + D],
            [r(W * 0.25), H],
            [0, H],
          ];
        }
        default: {
          const c = r(Math.min(W, H) * a * 0.3);
          return [
            [c, 0],
            [W - c, 0],
            [W, c],
            [W, H - c],
            [W - c, H],
            [c, H],
            [0, H - c],
            [0, c],
          ];
        }
      }
    }),
);

/** Random valid design documents: outlines, board angles and settings. */
export const designArb: fc.Arbitrary<DesignDocument> = fc
  .record({
    outline: shapeArb,
    shift: fc.tuple(fc.integer({ min: -5000, max: 5000 }), fc.integer({ min: -5000, max: 5000 })),
    reverse: fc.boolean(),
    angle: fc.oneof(
      fc.constantFrom(0, 45, 90, 30, -60, 135),
      fc.double({ min: -180, max: 180, noNaN: true }),
    ),
    centres: fc.integer({ min: 250, max: 600 }),
    border: fc.integer({ min: 0, max: 2 }),
    height: fc.integer({ min: 100, max: 1500 }),
    joistStock: fc.integer({ min: 2400, max: 6000 }),
    span: fc.integer({ min: 900, max: 2400 }),
    cant: fc.integer({ min: 0, max: 300 }),
    boardStock: fc.integer({ min: 2400, max: 6000 }),
    boardSpan: fc.integer({ min: 300, max: 600 }),
    stagger: fc.integer({ min: 0, max: 1200 }),
    noggin: fc.constantFrom(
      { kind: 'midspan' as const, overMm: 1200 },
      { kind: 'spacing' as const, maxSpacingMm: 900 },
      { kind: 'none' as const },
    ),
    step: fc.option(
      fc.record({ edge: fc.integer({ min: 0, max: 20 }), count: fc.integer({ min: 1, max: 4 }) }),
    ),
    rows: fc.option(
      fc.array(
        fc.tuple(
          fc.double({ min: 0, max: 1, noNaN: true }),
          fc.double({ min: 0, max: 1, noNaN: true }),
        ),
        { minLength: 1, maxLength: 4 },
      ),
      { freq: 5 },
    ),
  })
  .map((g) => {
    let outline = g.outline.map(([x, y]) => [x + g.shift[0], y + g.shift[1]] as Pt);
    if (g.reverse) outline = outline.slice().reverse();
    const xs = outline.map((p) => p[0]);
    const ys = outline.map((p) => p[1]);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    const supports = (g.rows ?? []).map(([u, v]) => ({
      a: [x0, y0 + u * (y1 - y0)] as Pt,
      b: [x1, y0 + v * (y1 - y0)] as Pt,
      kind: 'blocks' as const,
    }));
    return designDocumentSchema.parse({
      version: 1,
      outline,
      boardAngleDeg: g.angle,
      heightMm: g.height,
      joistCentresMm: g.centres,
      borderCourses: g.border,
      supports,
      steps: g.step ? [{ edge: g.step.edge % outline.length, count: g.step.count }] : [],
      joist: {
        ...STANDARD.joist,
        stockMm: g.joistStock,
        maxSpanMm: g.span,
        maxCantileverMm: g.cant,
      },
      board: { ...STANDARD.board, stockMm: g.boardStock, maxSpanMm: g.boardSpan },
      minStaggerMm: g.stagger,
      nogginRule: g.noggin,
    });
  });

/** Property runs per check: a few hundred by default, more with JW_PROPERTY_RUNS. */
export function propertyRuns(fallback = 150): number {
  const env = Number(globalThis.process?.env?.JW_PROPERTY_RUNS);
  return Number.isFinite(env) && env > 0 ? env : fallback;
}

/** The seed CI uses when JW_PROPERTY_SEED is unset: every run checks the same cases. */
export const DEFAULT_PROPERTY_SEED = 20261201;

/**
 * The fast-check seed for the property tests: JW_PROPERTY_SEED as a number, a fresh random seed for
 * "random" (fast-check prints the seed and path of any failure), or DEFAULT_PROPERTY_SEED.
 */
export function propertySeed(): number {
  const raw = globalThis.process?.env?.JW_PROPERTY_SEED?.trim();
  if (!raw) return DEFAULT_PROPERTY_SEED;
  if (raw === 'random') return (Math.random() * 2 ** 32) | 0;
  const n = Number(raw);
  if (!Number.isInteger(n)) {
    throw new Error(`JW_PROPERTY_SEED must be an integer or "random", not ${JSON.stringify(raw)}`);
  }
  return n | 0;
}
