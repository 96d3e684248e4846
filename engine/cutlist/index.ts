// Cut list: which stock bars to buy and how to cut each (1-D cutting stock with kerf, several stock lengths, reusable offcuts). Pure; touches nothing outside engine/.
import { z } from 'zod';
import type { CutListResult, CutStock } from '../types';
import { countLowerBound, isSingleStock, l2Bound, remainingBound } from './bounds';
import { binCompletion } from './exact';
import { fitDecreasing, greedyFill } from './heuristics';
import { improveTail } from './improve';
import { columnGeneration, type LpResult } from './lp';
import { better, scoreOf, type Bin, type BinType, type Problem, type Score } from './model';

const length = (label: string) =>
  z
    .number({ error: `${label} must be a number of millimetres` })
    .finite(`${label} must be a finite number`)
    .positive(`${label} must be more than 0 mm`)
    .max(1_000_000, `${label} must be at most 1 km`);

/** The cut list input, as the command line and callers give it. */
export const cutListInputSchema = z.object({
  stockMm: z.union([
    length('stockMm'),
    z.array(length('Each stock length')).min(1, 'stockMm needs at least one stock length'),
  ]),
  kerfMm: z
    .number({ error: 'kerfMm must be a number of millimetres' })
    .finite('kerfMm must be a finite number')
    .min(0, 'kerfMm cannot be negative')
    .max(50, 'kerfMm above 50 mm is not a saw'),
  pieces: z
    .array(
      z.object({
        lengthMm: length('Piece lengthMm'),
        qty: z
          .number({ error: 'Piece qty must be a whole number' })
          .int('Piece qty must be a whole number')
          .min(0, 'Piece qty cannot be negative')
          .max(100_000, 'Piece qty above 100000 is not a deck'),
      }),
    )
    .max(10_000, 'At most 10000 piece lines'),
  minOffcutMm: z.number().finite().min(0).optional(),
  offcuts: z.array(length('Each offcut')).max(10_000).optional(),
});

/** Cut list input (see cutListInputSchema). */
export type CutListInput = z.input<typeof cutListInputSchema>;

/** Tuning for solveCutList; the defaults suit the live editor. */
export interface CutListOptions {
  /** Work budget for the exact searches, in search steps (deterministic; no clock in the engine). */
  budget?: number;
  /** Reuse the answer for an identical input (default true); the bench turns it off. */
  cache?: boolean;
}

const DEFAULT_BUDGET = 200_000;
/** The LP bound is worked out when there are at most this many distinct piece lengths (its cost grows with their square). */
const LP_MAX_LENGTHS = 60;
/** Rough cap on the LP's arithmetic (pivots x knapsack table size), to keep it to milliseconds. */
const LP_WORK = 30_000_000;
const CACHE_SIZE = 64;
const cache = new Map<string, CutListResult>();

/**
 * Optimised cut list: minimises the total length of new stock bought, then the number of new bars
 * (with one stock length: the number of bars). Kerf model in ./model.ts: the last piece of a bar may
 * run to its end without a saw cut. Offcuts in `offcuts` no shorter than `minOffcutMm` are free
 * bars used first. Pieces longer than every bar are not cut and come back in `tooLong` (the
 * framing engine splits long joists itself). Throws a clear Error on bad input. Results are cached by
 * input; treat them as read-only.
 */
export function solveCutList(input: CutListInput, options: CutListOptions = {}): CutListResult {
  const parsed = cutListInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue.path.length ? ` (at ${issue.path.join('.')})` : '';
    throw new Error(`Bad cut list input: ${issue.message}${where}`);
  }
  const inp = parsed.data;
  const budget = options.budget ?? DEFAULT_BUDGET;
  const key = JSON.stringify([inp, budget]);
  const useCache = options.cache !== false;
  const hit = useCache ? cache.get(key) : undefined;
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return cloneResult(hit);
  }
  const result = solve(inp, budget);
  if (!useCache) return result;
  cache.set(key, result);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return cloneResult(result);
}

/** Forgets every cached cut list (for benchmarks that must time a cold solve). */
export function clearCutListCache(): void {
  cache.clear();
}

function cloneResult(r: CutListResult): CutListResult {
  return {
    ...r,
    stock: r.stock.map((s) => ({ ...s, cuts: s.cuts.slice() })),
    ...(r.tooLong ? { tooLong: r.tooLong.slice() } : {}),
  };
}

type ParsedInput = z.output<typeof cutListInputSchema>;

/** Group equal values: [value, count] pairs, largest value first. */
function grouped(values: { v: number; n: number }[]): [number, number][] {
  const m = new Map<number, number>();
  for (const { v, n } of values) if (n > 0) m.set(v, (m.get(v) ?? 0) + n);
  return [...m.entries()].sort((a, b) => b[0] - a[0]);
}

/** The packing problem for an input, and the pieces no bar can hold. */
export function buildProblem(inp: ParsedInput): { problem: Problem; tooLong: number[] } {
  const kerf = inp.kerfMm;
  const stockList = Array.isArray(inp.stockMm) ? inp.stockMm : [inp.stockMm];
  const minOff = inp.minOffcutMm ?? 0;
  const types: BinType[] = [];
  for (const [s] of grouped(stockList.map((v) => ({ v, n: 1 }))))
    types.push({ stockMm: s, cap: s + kerf, cost: s, avail: Infinity, offcut: false });
  const offs = (inp.offcuts ?? []).filter((o) => o >= minOff);
  for (const [o, n] of grouped(offs.map((v) => ({ v, n: 1 }))))
    types.push({ stockMm: o, cap: o + kerf, cost: 0, avail: n, offcut: true });
  // Pieces longer than every new stock length can only come from offcuts: match them longest to
  // longest; those left over cannot be cut at all.
  const longestStock = Math.max(...stockList);
  const spare = offs.filter((o) => o > longestStock).sort((a, b) => b - a);
  const tooLong: number[] = [];
  const lens: number[] = [];
  const demand: number[] = [];
  for (const [l, n] of grouped(inp.pieces.map((pc) => ({ v: pc.lengthMm, n: pc.qty })))) {
    let fit = 0;
    if (l > longestStock)
      while (fit < n && spare.length && spare[0] >= l) {
        spare.shift();
        fit++;
      }
    else fit = n;
    for (let k = fit; k < n; k++) tooLong.push(l);
    if (fit > 0) {
      lens.push(l);
      demand.push(fit);
    }
  }
  return {
    problem: { kerf, lens, sizes: lens.map((l) => l + kerf), demand, types },
    tooLong,
  };
}

function solve(inp: ParsedInput, budget: number): CutListResult {
  const { problem: p, tooLong } = buildProblem(inp);
  const extra = tooLong.length ? { tooLong } : {};
  if (p.lens.length === 0)
    return { count: 0, stock: [], lowerBound: 0, optimal: true, totalStockMm: 0, ...extra };

  let floor: Score;
  if (isSingleStock(p)) {
    const n = l2Bound(p.sizes, p.demand, p.types[0].cap);
    floor = { cost: n * p.types[0].cost, count: n };
  } else {
    let w = 0;
    for (let i = 0; i < p.sizes.length; i++) w += p.sizes[i] * p.demand[i];
    floor = remainingBound(
      p,
      w,
      p.types.map((t) => t.avail),
    );
  }

  let { bins, score } = bestHeuristic(p, floor);
  let lowerBound = countLowerBound(p);
  if (better(floor, score) && isSingleStock(p) && p.sizes.length <= LP_MAX_LENGTHS) {
    // The LP bound is usually the true optimum; its rounded solution is a strong plan too.
    const m = p.sizes.length;
    const maxIter = Math.min(4 * m + 20, Math.floor(LP_WORK / (p.types[0].cap * m)));
    const lp = columnGeneration(p, maxIter, score.count);
    if (lp.lowerBound > floor.count) {
      floor = { cost: lp.lowerBound * p.types[0].cost, count: lp.lowerBound };
      lowerBound = lp.lowerBound;
    }
    if (better(floor, score)) {
      const r = lpRounding(p, lp, floor, budget);
      if (better(r.score, score)) ({ bins, score } = r);
    }
  }
  if (better(floor, score)) {
    bins = improveTail(p, bins, floor, budget / 4);
    score = scoreOf(p, bins);
  }
  let optimal = !better(floor, score);
  if (!optimal) {
    const ex = binCompletion(p, bins, score, floor, budget);
    bins = ex.bins;
    score = ex.score;
    optimal = ex.complete || !better(floor, score);
  }
  return { ...toResult(p, bins), lowerBound, optimal, ...extra };
}

/** The best of the quick heuristics, stopping early at the floor. */
function bestHeuristic(p: Problem, floor: Score): { bins: Bin[]; score: Score } {
  const hasOffcuts = p.types.some((t) => t.offcut);
  const n = p.demand.reduce((a, b) => a + b, 0);
  const tries: (() => Bin[])[] = [
    () => greedyFill(p, true),
    () => fitDecreasing(p, false, false),
    () => greedyFill(p, false),
  ];
  // Best fit scans every bar for every piece: worth it on small lists only.
  if (n <= 400) tries.push(() => fitDecreasing(p, true, false));
  if (hasOffcuts) {
    tries.push(() => fitDecreasing(p, false, true));
    tries.push(() => fitDecreasing(p, true, true));
  }
  let bins: Bin[] = [];
  let score: Score = { cost: Infinity, count: Infinity };
  for (const t of tries) {
    let b: Bin[];
    try {
      b = t();
    } catch {
      continue; // a greedy can strand a long piece when offcuts are scarce; first fit never does
    }
    const s = scoreOf(p, b);
    if (better(s, score)) {
      bins = b;
      score = s;
    }
    if (!better(floor, score)) break; // already at the lower bound: proven optimal
  }
  return { bins, score };
}

/**
 * Round the LP down: cut each LP pattern as many whole times as it is used (never more pieces than
 * wanted), then pack what is left with the heuristics and a short exact search.
 */
function lpRounding(
  p: Problem,
  lp: LpResult,
  floor: Score,
  budget: number,
): { bins: Bin[]; score: Score } {
  const d = p.sizes.length;
  const rem = p.demand.slice();
  const bins: Bin[] = [];
  for (const pat of [...lp.patterns].sort((a, b) => b.x - a.x)) {
    const times = Math.floor(pat.x + 1e-9);
    for (let k = 0; k < times; k++) {
      const counts = pat.counts.map((c, i) => Math.min(c, rem[i]));
      let used = 0;
      for (let i = 0; i < d; i++) {
        used += counts[i] * p.sizes[i];
        rem[i] -= counts[i];
      }
      if (used <= 0) break;
      bins.push({ type: 0, counts, used });
    }
  }
  const rest: Problem = { ...p, demand: rem };
  let restBins: Bin[] = [];
  if (rem.some((r) => r > 0)) {
    const n = Math.max(0, floor.count - bins.length);
    const restFloor: Score = { cost: n * p.types[0].cost, count: n };
    const h = bestHeuristic(rest, restFloor);
    restBins = h.bins;
    if (better(restFloor, h.score))
      restBins = binCompletion(rest, h.bins, h.score, restFloor, budget / 4).bins;
  }
  const all = bins.concat(restBins);
  return { bins: all, score: scoreOf(p, all) };
}

function round3(x: number): number {
  return Math.round(x * 1000) / 1000;
}

/** Bars as the crew reads them: new stock longest first, then offcuts; cuts longest first. */
function toResult(
  p: Problem,
  bins: Bin[],
): { count: number; stock: CutStock[]; totalStockMm: number } {
  const stock: CutStock[] = bins.map((b) => {
    const ty = p.types[b.type];
    const cuts: number[] = [];
    let sum = 0;
    for (let i = 0; i < p.lens.length; i++)
      for (let k = 0; k < b.counts[i]; k++) {
        cuts.push(p.lens[i]);
        sum += p.lens[i];
      }
    const offcutMm = round3(Math.max(0, ty.stockMm - sum - cuts.length * p.kerf));
    const s: CutStock = { stockMm: ty.stockMm, cuts, offcutMm };
    if (ty.offcut) s.fromOffcut = true;
    return s;
  });
  stock.sort((a, b) => {
    if (!!a.fromOffcut !== !!b.fromOffcut) return a.fromOffcut ? 1 : -1;
    if (a.stockMm !== b.stockMm) return b.stockMm - a.stockMm;
    for (let i = 0; i < Math.min(a.cuts.length, b.cuts.length); i++)
      if (a.cuts[i] !== b.cuts[i]) return b.cuts[i] - a.cuts[i];
    return b.cuts.length - a.cuts.length;
  });
  const fresh = stock.filter((s) => !s.fromOffcut);
  return {
    count: fresh.length,
    stock,
    totalStockMm: round3(fresh.reduce((a, s) => a + s.stockMm, 0)),
  };
}
