// Cut list internals: the packing problem as the solvers see it, and its objective. Pure data; touches nothing outside engine/cutlist.

/**
 * KERF MODEL (every solver and the test ILP use it):
 * a stock bar of length S is cut from one end. Every piece cut off consumes its length plus one
 * kerf, except that the last piece may run to the far end of the bar, where no saw cut is needed
 * (and a last cut that would leave less than a kerf simply turns the tail to dust).
 * So n pieces fit a bar when  sum(length) + (n - 1) * kerf <= S,  which is the same as
 * sum(length + kerf) <= S + kerf.  The solvers therefore pack item sizes  w = length + kerf
 * into bins of capacity  C = S + kerf.  The offcut left on a bar is  max(0, S - sum - n * kerf).
 * A reusable offcut is a bar like any other (its cut end is square), with capacity offcut + kerf.
 */

/** Tolerance for length comparisons, mm. */
export const EPS = 1e-6;

/** One kind of bar pieces can be cut from. */
export interface BinType {
  stockMm: number;
  /** stockMm + kerf. */
  cap: number;
  /** What it costs the job: its length for new stock, 0 for a reusable offcut. */
  cost: number;
  /** How many are available (Infinity for new stock). */
  avail: number;
  offcut: boolean;
}

/** The problem with pieces grouped by length, longest first. */
export interface Problem {
  kerf: number;
  /** Distinct piece lengths, descending. */
  lens: number[];
  /** lens[i] + kerf. */
  sizes: number[];
  /** How many pieces of each length. */
  demand: number[];
  /** New stock types first (longest first), then reusable offcuts (longest first). */
  types: BinType[];
}

/** One bar in a solution: its type and how many pieces of each distinct length it gives. */
export interface Bin {
  type: number;
  counts: number[];
  /** Sum of sizes packed (lengths + one kerf each). */
  used: number;
}

/** The objective, compared lexicographically: total new stock length first, then new bars. */
export interface Score {
  cost: number;
  count: number;
}

/** The score of a packing. */
export function scoreOf(p: Problem, bins: Bin[]): Score {
  let cost = 0;
  let count = 0;
  for (const b of bins) {
    const t = p.types[b.type];
    cost += t.cost;
    if (!t.offcut) count++;
  }
  return { cost, count };
}

/** True when a is strictly better than b. */
export function better(a: Score, b: Score): boolean {
  if (a.cost < b.cost - EPS) return true;
  if (a.cost > b.cost + EPS) return false;
  return a.count < b.count;
}

/** Total size still to pack. */
export function remainingSize(p: Problem, rem: number[]): number {
  let w = 0;
  for (let i = 0; i < rem.length; i++) w += rem[i] * p.sizes[i];
  return w;
}
