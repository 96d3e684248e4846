// Cut list linear programme: the Gilmore-Gomory bound by column generation (a small revised simplex and an exact knapsack), for one stock length. Pure arithmetic; touches nothing outside engine/cutlist.
import { ceilEps } from './bounds';
import { EPS, type Problem } from './model';

/** What the column generation found. */
export interface LpResult {
  /** A proven lower bound on the number of bars (ceil of a proven bound on the LP optimum). */
  lowerBound: number;
  /** The LP value reached (an upper estimate of the LP optimum when stopped early). */
  value: number;
  /** Patterns (counts per distinct length) and how many times the LP uses each. */
  patterns: { counts: number[]; x: number }[];
}

/**
 * Exact bounded knapsack by depth-first search: the most value of pieces (at most `limit[i]` of
 * length i) that fit `cap`. Value per size decides the order; the fractional fill bounds each branch.
 * Returns null when it runs past `budget` nodes (then the answer is not proven).
 */
export function knapsack(
  sizes: number[],
  values: number[],
  limit: number[],
  cap: number,
  budget = 200_000,
): { value: number; counts: number[] } | null {
  const idx = sizes
    .map((_, i) => i)
    .filter((i) => values[i] > 1e-12 && limit[i] > 0 && sizes[i] <= cap + EPS)
    .sort((a, b) => values[b] / sizes[b] - values[a] / sizes[a]);
  const n = idx.length;
  const counts = new Array<number>(sizes.length).fill(0);
  let best = 0;
  let bestCounts = counts.slice();
  let nodes = 0;
  let aborted = false;
  // Fractional bound from position k with room left.
  const bound = (k: number, room: number): number => {
    let v = 0;
    for (let j = k; j < n && room > EPS; j++) {
      const i = idx[j];
      const take = Math.min(limit[i], room / sizes[i]);
      v += take * values[i];
      room -= take * sizes[i];
    }
    return v;
  };
  const dfs = (k: number, room: number, val: number) => {
    if (aborted) return;
    if (++nodes > budget) {
      aborted = true;
      return;
    }
    if (val > best + 1e-12) {
      best = val;
      bestCounts = counts.slice();
    }
    if (k >= n) return;
    if (val + bound(k, room) <= best + 1e-12) return;
    const i = idx[k];
    const maxC = Math.min(limit[i], Math.floor((room + EPS) / sizes[i]));
    for (let c = maxC; c >= 0; c--) {
      counts[i] = c;
      dfs(k + 1, room - c * sizes[i], val + c * values[i]);
      if (aborted) break;
    }
    counts[i] = 0;
  };
  dfs(0, cap, 0);
  if (aborted) return null;
  return { value: best, counts: bestCounts };
}

/**
 * Exact bounded knapsack by dynamic programming over whole millimetres (sizes and capacity must be
 * integers): each length split into 1, 2, 4... copies so every count up to its limit is reachable.
 * Work is about (number of split items) x capacity.
 */
export function knapsackDP(
  sizes: number[],
  values: number[],
  limit: number[],
  cap: number,
): { value: number; counts: number[] } {
  const C = Math.floor(cap + EPS);
  const itemOf: number[] = [];
  const mult: number[] = [];
  for (let i = 0; i < sizes.length; i++) {
    if (values[i] <= 1e-12 || limit[i] <= 0 || sizes[i] > C) continue;
    let left = Math.min(limit[i], Math.floor(C / sizes[i]));
    for (let k = 1; left > 0; k *= 2) {
      const take = Math.min(k, left);
      itemOf.push(i);
      mult.push(take);
      left -= take;
    }
  }
  const n = itemOf.length;
  const best = new Float64Array(C + 1);
  const keep = new Uint8Array(n * (C + 1));
  for (let j = 0; j < n; j++) {
    const w = sizes[itemOf[j]] * mult[j];
    const v = values[itemOf[j]] * mult[j];
    const row = j * (C + 1);
    for (let c = C; c >= w; c--) {
      const cand = best[c - w] + v;
      if (cand > best[c] + 1e-12) {
        best[c] = cand;
        keep[row + c] = 1;
      }
    }
  }
  const counts = new Array<number>(sizes.length).fill(0);
  let c = C;
  for (let j = n - 1; j >= 0; j--)
    if (keep[j * (C + 1) + c]) {
      counts[itemOf[j]] += mult[j];
      c -= sizes[itemOf[j]] * mult[j];
    }
  return { value: best[C], counts };
}

/** The exact pricing problem, by dynamic programming when lengths are whole millimetres and small enough, else by search. */
function price(
  p: Problem,
  values: number[],
  limit: number[],
  cap: number,
): { value: number; counts: number[] } | null {
  // A short search usually settles it (few lengths, strong fractional bound); the table is the fallback.
  const quick = knapsack(p.sizes, values, limit, cap, 5_000);
  if (quick) return quick;
  const integral = p.sizes.every((s) => Number.isInteger(s)) && Number.isInteger(cap);
  if (integral && cap * p.sizes.length <= 2_000_000) {
    const r = knapsackDP(p.sizes, values, limit, cap);
    // Recompute the value from the counts so the bound never rests on a rounding slip.
    let v = 0;
    for (let i = 0; i < values.length; i++) v += values[i] * r.counts[i];
    return { value: Math.max(v, r.value), counts: r.counts };
  }
  return knapsack(p.sizes, values, limit, cap);
}

/**
 * Column generation for one stock length (Gilmore and Gomory, 1961; the method from memory):
 * minimise the number of bars, bars may hold any pattern, demand met at least. Starts from one
 * single-length pattern per piece length, prices new patterns with the exact knapsack, and stops
 * when none improves or after `maxIter` pivots. Whatever happens the bound is valid: for any
 * non-negative duals y, sum(d_i y_i) / (best pattern value under y) bounds the LP from below
 * (Farley's bound), so rounding noise cannot make it claim too much. Stops early once the bound
 * reaches `stopAt` (the bar count of a plan already found: it is then proven optimal).
 */
export function columnGeneration(
  p: Problem,
  maxIter = 4 * p.sizes.length + 20,
  stopAt = Infinity,
): LpResult {
  const m = p.sizes.length;
  const cap = p.types[0].cap;
  const d = p.demand;
  const limit = p.sizes.map((s, i) => Math.min(d[i], Math.floor((cap + EPS) / s)));
  // Basis: m columns, each a pattern (counts) or a surplus (-e_i, marked by counts = null).
  const basis: ({ counts: number[] } | { surplus: number })[] = [];
  const cost: number[] = [];
  // Dense inverse of the basis matrix.
  const inv: number[][] = [];
  const xB: number[] = [];
  for (let i = 0; i < m; i++) {
    const counts = new Array<number>(m).fill(0);
    counts[i] = limit[i];
    basis.push({ counts });
    cost.push(1);
    const row = new Array<number>(m).fill(0);
    row[i] = 1 / limit[i];
    inv.push(row);
    xB.push(d[i] / limit[i]);
  }
  let lb = 0;
  let value = xB.reduce((a, b) => a + b, 0);
  for (let iter = 0; iter < maxIter; iter++) {
    // Duals y = c_B B^-1.
    const y = new Array<number>(m).fill(0);
    for (let r = 0; r < m; r++)
      if (cost[r] !== 0) for (let j = 0; j < m; j++) y[j] += cost[r] * inv[r][j];
    const yPos = y.map((v) => Math.max(0, v));
    const ks = price(p, yPos, limit, cap);
    if (ks && ks.value > EPS) {
      let dy = 0;
      for (let i = 0; i < m; i++) dy += d[i] * yPos[i];
      lb = Math.max(lb, dy / Math.max(1, ks.value));
      if (ceilEps(lb - 1e-6) >= stopAt) break; // the bound already meets the plan in hand
    }
    // Entering column: a surplus with negative dual, else the best pattern if it prices out.
    let col: number[] | null = null;
    let enter: { counts: number[] } | { surplus: number } | null = null;
    let enterCost = 0;
    const neg = y.findIndex((v) => v < -1e-9);
    if (neg >= 0) {
      col = new Array<number>(m).fill(0);
      col[neg] = -1;
      enter = { surplus: neg };
      enterCost = 0;
    } else if (ks && ks.value > 1 + 1e-9) {
      col = ks.counts;
      enter = { counts: ks.counts };
      enterCost = 1;
    }
    if (!col || !enter) break;
    // u = B^-1 a; ratio test.
    const u = new Array<number>(m).fill(0);
    for (let r = 0; r < m; r++) {
      let s = 0;
      for (let j = 0; j < m; j++) s += inv[r][j] * col[j];
      u[r] = s;
    }
    let leave = -1;
    let bestRatio = Infinity;
    for (let r = 0; r < m; r++)
      if (u[r] > 1e-9) {
        const ratio = xB[r] / u[r];
        if (ratio < bestRatio - 1e-12) {
          bestRatio = ratio;
          leave = r;
        }
      }
    if (leave < 0) break; // unbounded cannot happen with positive costs; stop safely
    const piv = u[leave];
    for (let j = 0; j < m; j++) inv[leave][j] /= piv;
    xB[leave] /= piv;
    for (let r = 0; r < m; r++) {
      if (r === leave || Math.abs(u[r]) < 1e-15) continue;
      const f = u[r];
      for (let j = 0; j < m; j++) inv[r][j] -= f * inv[leave][j];
      xB[r] -= f * xB[leave];
      if (xB[r] < 0 && xB[r] > -1e-9) xB[r] = 0;
    }
    basis[leave] = enter;
    cost[leave] = enterCost;
    value = 0;
    for (let r = 0; r < m; r++) value += cost[r] * xB[r];
    // The LP optimum lies between lb and value: once both round up alike, more pivots cannot
    // raise the whole-bar bound.
    if (lb > 0 && ceilEps(lb - 1e-6) >= ceilEps(value - 1e-6)) break;
  }
  const patterns: { counts: number[]; x: number }[] = [];
  for (let r = 0; r < m; r++) {
    const b = basis[r];
    if ('counts' in b && xB[r] > 1e-9) patterns.push({ counts: b.counts, x: xB[r] });
  }
  return { lowerBound: ceilEps(lb - 1e-6), value, patterns };
}
