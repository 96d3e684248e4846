import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCutList, type CutListInput } from './index';
import { l2Bound } from './bounds';
import { deckLike, perfectFit, triplets } from './instances';
import { knapsack, knapsackDP } from './lp';
import type { CutListResult } from '../types';

/** Every bar obeys the kerf model, every piece is cut exactly once, offcuts are what is left. */
function expectValid(input: CutListInput, r: CutListResult) {
  const kerf = input.kerfMm;
  const stocks = Array.isArray(input.stockMm) ? input.stockMm : [input.stockMm];
  const wanted: number[] = [];
  for (const p of input.pieces) for (let k = 0; k < p.qty; k++) wanted.push(p.lengthMm);
  const cut = r.stock.flatMap((s) => s.cuts).concat(r.tooLong ?? []);
  expect(cut.sort((a, b) => a - b)).toEqual(wanted.sort((a, b) => a - b));
  const offcutsLeft = [...(input.offcuts ?? [])].filter((o) => o >= (input.minOffcutMm ?? 0));
  for (const s of r.stock) {
    const sum = s.cuts.reduce((a, b) => a + b, 0);
    expect(s.cuts.length).toBeGreaterThan(0);
    // Kerf model: n pieces fit when sum + (n - 1) * kerf <= bar.
    expect(sum + (s.cuts.length - 1) * kerf).toBeLessThanOrEqual(s.stockMm + 1e-6);
    expect(s.offcutMm).toBeCloseTo(Math.max(0, s.stockMm - sum - s.cuts.length * kerf), 3);
    if (s.fromOffcut) {
      const i = offcutsLeft.indexOf(s.stockMm);
      expect(i).toBeGreaterThanOrEqual(0);
      offcutsLeft.splice(i, 1);
    } else expect(stocks).toContain(s.stockMm);
  }
  expect(r.count).toBe(r.stock.filter((s) => !s.fromOffcut).length);
  expect(r.count).toBeGreaterThanOrEqual(r.lowerBound);
}

describe('kerf model (common practice: every cut takes a saw kerf; a piece running to the bar end needs none)', () => {
  it.each([
    // [length, qty, kerf, bars, offcut of the first bar]
    [1200, 4, 3, 2, 4800 - 3 * 1200 - 3 * 3], // 4 x 1200 + 3 kerfs = 4809 > 4800
    [1197, 4, 3, 1, 0], // 4788 + 3 x 3 = 4797: fits; the last cut leaves 0 after its kerf
    [1196, 4, 3, 1, 4], // 4784 + 4 x 3 = 4796: 4 mm left
    [1200, 4, 0, 1, 0], // no kerf: exactly four
    [2400, 2, 3, 2, 4800 - 2400 - 3], // 2400 + 3 + 2400 = 4803 > 4800
  ])('%d mm x %d with %d mm kerf from 4800 mm stock: %d bar(s)', (len, qty, kerf, bars, offcut) => {
    const input = { stockMm: 4800, kerfMm: kerf, pieces: [{ lengthMm: len, qty }] };
    const r = solveCutList(input);
    expectValid(input, r);
    expect(r.count).toBe(bars);
    expect(r.stock[0].offcutMm).toBe(offcut);
    expect(r.optimal).toBe(true);
  });

  it('a piece exactly as long as the stock takes a whole bar with no cut', () => {
    const r = solveCutList({ stockMm: 3000, kerfMm: 3, pieces: [{ lengthMm: 3000, qty: 2 }] });
    expect(r.count).toBe(2);
    expect(r.stock.map((s) => s.offcutMm)).toEqual([0, 0]);
  });
});

describe('several stock lengths and offcuts', () => {
  it('buys the least total length: 2 x 2000 come from one 4200 bar, not two 3000 bars', () => {
    const r = solveCutList({
      stockMm: [3000, 4200],
      kerfMm: 3,
      pieces: [{ lengthMm: 2000, qty: 2 }],
    });
    expect(r.totalStockMm).toBe(4200);
    expect(r.count).toBe(1);
  });

  it('uses a reusable offcut before buying new stock, and ignores offcuts below the minimum', () => {
    const input = {
      stockMm: 3000,
      kerfMm: 3,
      pieces: [{ lengthMm: 350, qty: 3 }],
      offcuts: [1100, 250],
      minOffcutMm: 300,
    };
    const r = solveCutList(input);
    expectValid(input, r);
    expect(r.count).toBe(0);
    expect(r.stock).toEqual([
      { stockMm: 1100, cuts: [350, 350, 350], offcutMm: 41, fromOffcut: true },
    ]);
  });

  it('returns pieces longer than every bar in tooLong instead of cutting them', () => {
    const input = {
      stockMm: 3000,
      kerfMm: 3,
      pieces: [
        { lengthMm: 3600, qty: 2 },
        { lengthMm: 1000, qty: 1 },
      ],
    };
    const r = solveCutList(input);
    expectValid(input, r);
    expect(r.tooLong).toEqual([3600, 3600]);
    expect(r.count).toBe(1);
  });
});

describe('bad input gets a clear error', () => {
  it.each([
    [{ stockMm: 0, kerfMm: 3, pieces: [] }, /stockMm must be more than 0/],
    [{ stockMm: [], kerfMm: 3, pieces: [] }, /at least one stock length/],
    [{ stockMm: 4800, kerfMm: -1, pieces: [] }, /kerfMm cannot be negative/],
    [
      { stockMm: 4800, kerfMm: 3, pieces: [{ lengthMm: -5, qty: 1 }] },
      /lengthMm must be more than 0/,
    ],
    [{ stockMm: 4800, kerfMm: 3, pieces: [{ lengthMm: 500, qty: 1.5 }] }, /whole number/],
    [{ stockMm: 4800, kerfMm: 3 }, /pieces/],
  ])('%j', (input, message) => {
    expect(() => solveCutList(input as CutListInput)).toThrow(message);
  });
});

describe('results', () => {
  it('are valid for any input (property test, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.record({
          stock: fc.uniqueArray(fc.integer({ min: 1000, max: 6000 }), {
            minLength: 1,
            maxLength: 3,
          }),
          kerf: fc.integer({ min: 0, max: 5 }),
          pieces: fc.array(
            fc.record({
              lengthMm: fc.integer({ min: 50, max: 7000 }),
              qty: fc.integer({ min: 0, max: 6 }),
            }),
            {
              maxLength: 8,
            },
          ),
          offcuts: fc.array(fc.integer({ min: 100, max: 3000 }), { maxLength: 3 }),
        }),
        ({ stock, kerf, pieces, offcuts }) => {
          const input = { stockMm: stock, kerfMm: kerf, pieces, offcuts, minOffcutMm: 300 };
          expectValid(input, solveCutList(input, { budget: 20_000 }));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('come from the cache for an identical input, and changing a result does not change the next', () => {
    const input = { stockMm: 4800, kerfMm: 3, pieces: [{ lengthMm: 1000, qty: 9 }] };
    const a = solveCutList(input);
    a.stock[0].cuts.push(99);
    const b = solveCutList(input);
    expect(b.stock[0].cuts).not.toContain(99);
    expect(b).toEqual(solveCutList(input, { cache: false }));
  });
});

describe('bounds', () => {
  it('L2 (Martello and Toth, from memory) beats ceil(sum / C) where big pieces cannot share', () => {
    // Three pieces over half the bar need three bars, though their total fits in two.
    expect(l2Bound([600, 600, 600], [1, 1, 1], 1000)).toBe(3);
    expect(Math.ceil(1800 / 1000)).toBe(2);
  });

  it('the DP and search knapsacks agree (exact pricing for the LP bound)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            s: fc.integer({ min: 50, max: 900 }),
            v: fc.double({ min: 0, max: 1, noNaN: true }),
            l: fc.integer({ min: 0, max: 4 }),
          }),
          {
            minLength: 1,
            maxLength: 8,
          },
        ),
        fc.integer({ min: 100, max: 2000 }),
        (items, cap) => {
          const sizes = items.map((i) => i.s);
          const values = items.map((i) => i.v);
          const limit = items.map((i) => i.l);
          const a = knapsackDP(sizes, values, limit, cap);
          const b = knapsack(sizes, values, limit, cap)!;
          expect(a.value).toBeCloseTo(b.value, 9);
          expect(a.counts.reduce((t, c, i) => t + c * sizes[i], 0)).toBeLessThanOrEqual(cap);
          a.counts.forEach((c, i) => expect(c).toBeLessThanOrEqual(limit[i]));
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('instances with a known optimum (constructed, so the optimum is known by construction)', () => {
  it('small perfect-fit instances (2-8 bars cut into 2-4 parts with kerf): exactly the optimum', () => {
    for (let seed = 1; seed <= 60; seed++) {
      const inst = perfectFit(seed, 2 + (seed % 7), 4800, 3);
      const r = solveCutList(inst, { budget: 1_000_000 });
      expectValid(inst, r);
      expect({ seed, count: r.count }).toEqual({ seed, count: inst.optimum });
    }
  }, 60_000);

  it('deck-sized perfect-fit instances (20-100 bars, 60-350 pieces, nearly all lengths different): within one bar of the optimum', () => {
    for (const [seed, bars, stock, parts] of [
      [1, 20, 4800, 4],
      [2, 50, 4800, 4],
      [3, 100, 3000, 5],
    ] as const) {
      const inst = perfectFit(seed, bars, stock, 3, parts);
      const r = solveCutList(inst);
      expectValid(inst, r);
      expect(r.lowerBound).toBe(bars);
      expect(r.count - bars).toBeLessThanOrEqual(1);
    }
  }, 60_000);

  it("triplet instances after Falkenauer's t class (recipe from memory; every bar exactly full): within one bar", () => {
    for (const [seed, bars] of [
      [1, 20],
      [2, 40],
    ] as const) {
      const inst = triplets(seed, bars);
      const r = solveCutList(inst);
      expectValid(inst, r);
      expect(r.count - (inst.optimum ?? 0)).toBeLessThanOrEqual(1);
    }
  }, 60_000);
});

describe('deck-sized lists (common practice: 3.0 m joist stock, 4.8 m boards)', () => {
  it.each([
    ['joists', 40, 12000, 1],
    ['boards', 80, 12000, 2],
    ['joists', 75, 20000, 3],
    ['boards', 140, 30000, 4],
  ] as const)(
    '%s, %d lines of %d mm: within one bar of the lower bound',
    (kind, lines, len, seed) => {
      const inst = deckLike(seed, kind, lines, len);
      const r = solveCutList(inst);
      expectValid(inst, r);
      const total = inst.pieces.reduce((a, p) => a + p.qty * (p.lengthMm + inst.kerfMm), 0);
      expect(r.lowerBound).toBeGreaterThanOrEqual(
        Math.ceil(total / (inst.stockMm + inst.kerfMm) - 1e-9),
      );
      expect(r.count - r.lowerBound).toBeLessThanOrEqual(1);
    },
  );
});
