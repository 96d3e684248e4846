// Cut list lower bounds: how few stock bars any cutting plan can use. Pure arithmetic; touches nothing outside engine/cutlist.
import { EPS, type Problem, type Score } from './model';

/** ceil that forgives floating noise just above an integer. */
export function ceilEps(x: number): number {
  return Math.ceil(x - 1e-9);
}

/**
 * Martello and Toth's bound L2 for bin packing (Martello & Toth, "Knapsack Problems", 1990, ch. 8;
 * the formula from memory): for each threshold K <= C/2, items bigger than C - K each need their own
 * bin; items in (C/2, C - K] need one bin each too, and what is left in those bins can hold items in
 * [K, C/2]; the rest of [K, C/2] needs ceil(rest / C) more. L2 = the best K. Never below ceil(sum/C).
 */
export function l2Bound(sizes: number[], demand: number[], cap: number): number {
  // sizes descending
  let total = 0;
  for (let i = 0; i < sizes.length; i++) total += sizes[i] * demand[i];
  let best = ceilEps(total / cap);
  const half = cap / 2;
  // Candidate thresholds: 0 and every distinct size <= C/2.
  const ks = [0];
  for (const s of sizes) if (s <= half + EPS) ks.push(s);
  for (const k of ks) {
    let n1 = 0;
    let n2 = 0;
    let sum2 = 0;
    let sum3 = 0;
    for (let i = 0; i < sizes.length; i++) {
      const s = sizes[i];
      const d = demand[i];
      if (d === 0) continue;
      if (s > cap - k + EPS) n1 += d;
      else if (s > half + EPS) {
        n2 += d;
        sum2 += s * d;
      } else if (s >= k - EPS) sum3 += s * d;
    }
    const spare = n2 * cap - sum2;
    const extra = Math.max(0, ceilEps((sum3 - spare) / cap));
    const lk = n1 + n2 + extra;
    if (lk > best) best = lk;
  }
  return best;
}

/** True when the problem is plain bin packing: one stock length and no offcuts to use. */
export function isSingleStock(p: Problem): boolean {
  return p.types.length === 1 && !p.types[0].offcut;
}

/**
 * Lower bound on what packing the remaining size `remW` costs, given offcuts still available.
 * Cost: the new-stock capacity needed, priced at the cheapest length per unit of capacity.
 * Count: that capacity in the longest stock bars.
 */
export function remainingBound(p: Problem, remW: number, avail: number[]): Score {
  let free = 0;
  let minRatio = Infinity;
  let maxCap = 0;
  let stockTypes = 0;
  let stockCost = 0;
  for (let t = 0; t < p.types.length; t++) {
    const ty = p.types[t];
    if (ty.offcut) free += ty.cap * avail[t];
    else {
      stockTypes++;
      stockCost = ty.cost;
      minRatio = Math.min(minRatio, ty.cost / ty.cap);
      maxCap = Math.max(maxCap, ty.cap);
    }
  }
  const need = Math.max(0, remW - free);
  if (need <= EPS || maxCap === 0) return { cost: 0, count: 0 };
  const count = ceilEps(need / maxCap);
  // One stock length: every new bar costs the same, so the count bound prices exactly.
  if (stockTypes === 1) return { cost: count * stockCost, count };
  return { cost: need * minRatio, count };
}

/** Lower bound on new bars for the whole problem (reported as lowerBound). */
export function countLowerBound(p: Problem): number {
  if (isSingleStock(p)) return l2Bound(p.sizes, p.demand, p.types[0].cap);
  let w = 0;
  for (let i = 0; i < p.sizes.length; i++) w += p.sizes[i] * p.demand[i];
  const avail = p.types.map((t) => t.avail);
  return remainingBound(p, w, avail).count;
}
