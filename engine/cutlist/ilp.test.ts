// The cut list against an exact integer programme (GLPK through glpk.js, a test-only dependency) on hundreds of small random instances.
import GLPK, { type LP } from 'glpk.js/node';
import { beforeAll, describe, expect, it } from 'vitest';
import { solveCutList } from './index';
import { rng } from './instances';

type Glpk = Awaited<ReturnType<typeof GLPK>>;
let glpk: Glpk;
beforeAll(async () => {
  glpk = await GLPK();
});

interface Small {
  stock: number[];
  kerf: number;
  pieces: number[];
  offcuts: number[];
}

/**
 * The pattern ILP (Gilmore and Gomory's integer model), with the same kerf model as the solver: a
 * bar of length S holds pieces when sum(length + kerf) <= S + kerf. Every feasible pattern of every
 * bar type is listed by brute force; z_p = how many bars are cut to pattern p; each length is cut
 * exactly as often as wanted; each offcut is used at most once. Objective: total new stock length
 * first, then the number of new bars, as one weighted sum (length x (n + 1) + 1 per bar; the count
 * is at most n so it never outweighs a millimetre). Returns { cost, count } of the optimum.
 */
function ilpOptimum(inst: Small): { cost: number; count: number } {
  const n = inst.pieces.length;
  const lens = [...new Set(inst.pieces)];
  const demand = lens.map((l) => inst.pieces.filter((x) => x === l).length);
  const types: { cap: number; weight: number; stock: number; offcut: boolean; avail: number }[] =
    [];
  for (const s of [...new Set(inst.stock)])
    types.push({ cap: s + inst.kerf, weight: s * (n + 1) + 1, stock: s, offcut: false, avail: n });
  for (const o of [...new Set(inst.offcuts)])
    types.push({
      cap: o + inst.kerf,
      weight: 0,
      stock: o,
      offcut: true,
      avail: inst.offcuts.filter((x) => x === o).length,
    });
  const patterns: { type: number; a: number[] }[] = [];
  types.forEach((t, ti) => {
    const a = new Array<number>(lens.length).fill(0);
    const walk = (i: number, used: number) => {
      if (i === lens.length) {
        if (a.some((c) => c > 0)) patterns.push({ type: ti, a: a.slice() });
        return;
      }
      for (let c = 0; c <= demand[i] && used + c * (lens[i] + inst.kerf) <= t.cap; c++) {
        a[i] = c;
        walk(i + 1, used + c * (lens[i] + inst.kerf));
      }
      a[i] = 0;
    };
    walk(0, 0);
  });
  const z = (p: number) => `z${p}`;
  const lp: LP = {
    name: 'cutting',
    objective: {
      direction: glpk.GLP_MIN,
      name: 'cost',
      vars: patterns.map((p, j) => ({ name: z(j), coef: types[p.type].weight })),
    },
    subjectTo: [
      ...lens.map((_, i) => ({
        name: `len${i}`,
        vars: patterns.map((p, j) => ({ name: z(j), coef: p.a[i] })).filter((v) => v.coef > 0),
        bnds: { type: glpk.GLP_FX, lb: demand[i], ub: demand[i] },
      })),
      ...types.map((t, ti) => ({
        name: `avail${ti}`,
        vars: patterns.flatMap((p, j) => (p.type === ti ? [{ name: z(j), coef: 1 }] : [])),
        bnds: { type: glpk.GLP_UP, lb: 0, ub: t.avail },
      })),
    ].filter((c) => c.vars.length > 0),
    generals: patterns.map((_, j) => z(j)),
  };
  const res = glpk.solve(lp, { msglev: glpk.GLP_MSG_OFF });
  expect(res.result.status).toBe(glpk.GLP_OPT);
  let cost = 0;
  let count = 0;
  patterns.forEach((p, j) => {
    const k = Math.round(res.result.vars[z(j)]);
    if (!types[p.type].offcut) {
      cost += k * types[p.type].stock;
      count += k;
    }
  });
  return { cost, count };
}

function randomSmall(seed: number, multi: boolean): Small {
  const r = rng(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));
  const stock = multi
    ? [...new Set([int(20, 60) * 100, int(20, 60) * 100, int(20, 60) * 100])].slice(0, int(1, 3))
    : [int(20, 60) * 100];
  const longest = Math.max(...stock);
  const n = int(3, multi ? 8 : 10);
  // Lengths in whole mm, some repeated (as joists and noggins are), some random.
  const pool = Array.from({ length: int(1, 4) }, () => int(150, Math.round(longest * 0.7)));
  const pieces = Array.from({ length: n }, () =>
    r() < 0.5 ? pool[int(0, pool.length - 1)] : int(150, longest),
  );
  const offcuts =
    multi && r() < 0.6 ? Array.from({ length: int(1, 3) }, () => int(300, longest)) : [];
  return { stock, kerf: [0, 3, 4][int(0, 2)], pieces, offcuts };
}

function solveSmall(inst: Small) {
  return solveCutList({
    stockMm: inst.stock.length === 1 ? inst.stock[0] : inst.stock,
    kerfMm: inst.kerf,
    pieces: inst.pieces.map((lengthMm) => ({ lengthMm, qty: 1 })),
    offcuts: inst.offcuts,
    minOffcutMm: 0,
  });
}

describe('cut list vs an exact ILP (glpk.js)', () => {
  it('one stock length: the bar count equals the ILP optimum on 300 random instances', () => {
    let provenByBound = 0;
    for (let seed = 1; seed <= 300; seed++) {
      const inst = randomSmall(seed, false);
      const ours = solveSmall(inst);
      const opt = ilpOptimum(inst);
      expect({ seed, count: ours.count }).toEqual({ seed, count: opt.count });
      expect(ours.optimal).toBe(true);
      // The reported lower bound is a true lower bound.
      expect(ours.lowerBound).toBeLessThanOrEqual(opt.count);
      if (ours.lowerBound === opt.count) provenByBound++;
    }
    // Most are proven by the bound alone (a loose sanity check on the bound's strength).
    expect(provenByBound).toBeGreaterThan(200);
  }, 120_000);

  it('several stock lengths and offcuts: total new stock length, then bar count, equal the ILP optimum on 150 random instances', () => {
    for (let seed = 1001; seed <= 1150; seed++) {
      const inst = randomSmall(seed, true);
      const ours = solveSmall(inst);
      const opt = ilpOptimum(inst);
      expect({ seed, cost: ours.totalStockMm, count: ours.count }).toEqual({
        seed,
        cost: opt.cost,
        count: opt.count,
      });
      expect(ours.optimal).toBe(true);
    }
  }, 120_000);
});
