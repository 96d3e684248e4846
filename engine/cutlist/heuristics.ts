// Cut list heuristics: quick good plans (first/best fit decreasing, greedy best-filled bars) that give the exact search its upper bound. Pure; touches nothing outside engine/cutlist.
import { EPS, better, scoreOf, type Bin, type Problem } from './model';

/** The most-filled set of pieces for one bar, found by a small depth-first search. */
export interface Fill {
  counts: number[];
  used: number;
}

/**
 * Best fill of one bar of capacity `cap` from the remaining pieces `rem` (depth-first, longest
 * first, pruned by what could still be added). With `must` >= 0 the bar holds at least one piece of
 * that length. `budget` caps the nodes visited; the best fill found so far is returned.
 */
export function bestFill(p: Problem, cap: number, rem: number[], must = -1, budget = 4000): Fill {
  const d = p.sizes.length;
  const counts = new Array<number>(d).fill(0);
  const best: Fill = { counts: counts.slice(), used: 0 };
  let start = 0;
  if (must >= 0) {
    if (rem[must] <= 0 || p.sizes[must] > cap + EPS) return best;
    counts[must] = 1;
    start = p.sizes[must];
    best.counts = counts.slice();
    best.used = start;
  }
  // suffix[i] = size of everything still available from index i on (for pruning).
  const suffix = new Array<number>(d + 1).fill(0);
  let minSize = Infinity;
  for (let i = d - 1; i >= 0; i--) {
    const avail = rem[i] - counts[i];
    suffix[i] = suffix[i + 1] + avail * p.sizes[i];
    if (avail > 0) minSize = Math.min(minSize, p.sizes[i]);
  }
  let nodes = 0;
  let done = false;
  const dfs = (i: number, used: number) => {
    if (done) return;
    if (used > best.used + EPS) {
      best.used = used;
      best.counts = counts.slice();
      if (cap - used < minSize - EPS) done = true; // nothing more can fit: cannot do better
    }
    if (i >= d || ++nodes > budget) return;
    if (used + suffix[i] <= best.used + EPS) return;
    const avail = rem[i] - counts[i];
    const base = counts[i];
    const maxC = Math.min(avail, Math.floor((cap - used + EPS) / p.sizes[i]));
    for (let c = maxC; c >= 0 && !done; c--) {
      counts[i] = base + c;
      dfs(i + 1, used + c * p.sizes[i]);
    }
    counts[i] = base;
  };
  dfs(0, start);
  return best;
}

/**
 * Give every bar the cheapest bar type that holds it: a free offcut where one fits (smallest first),
 * else the shortest new stock. Returns the input when that is no better.
 */
export function downsize(p: Problem, bins: Bin[]): Bin[] {
  const avail = p.types.map((t) => t.avail);
  const order = bins.map((_, i) => i).sort((a, b) => bins[b].used - bins[a].used);
  const out: Bin[] = new Array(bins.length);
  for (const i of order) {
    const b = bins[i];
    let pick = -1;
    for (let t = 0; t < p.types.length; t++) {
      const ty = p.types[t];
      if (avail[t] <= 0 || ty.cap < b.used - EPS) continue;
      if (pick < 0) {
        pick = t;
        continue;
      }
      const cur = p.types[pick];
      const cheaper = ty.cost < cur.cost - EPS;
      const sameCostSmaller = Math.abs(ty.cost - cur.cost) <= EPS && ty.cap < cur.cap;
      if (cheaper || sameCostSmaller) pick = t;
    }
    if (pick < 0) return bins; // cannot happen: the bar fitted its own type
    avail[pick]--;
    out[i] = { ...b, type: pick };
  }
  return better(scoreOf(p, out), scoreOf(p, bins)) ? out : bins;
}

/** The type to open for a piece of size `size`: the longest free offcut if asked, else the longest stock that fits. */
function openType(p: Problem, avail: number[], size: number, offcutsFirst: boolean): number {
  let stock = -1;
  let off = -1;
  for (let t = 0; t < p.types.length; t++) {
    const ty = p.types[t];
    if (avail[t] <= 0 || ty.cap < size - EPS) continue;
    if (ty.offcut) {
      if (off < 0 || ty.cap > p.types[off].cap) off = t;
    } else if (stock < 0 || ty.cap > p.types[stock].cap) stock = t;
  }
  if (offcutsFirst && off >= 0) return off;
  return stock >= 0 ? stock : off;
}

/**
 * First fit decreasing (`best` false) or best fit decreasing (`best` true): pieces longest first,
 * each into the first (or the fullest) bar it fits, opening a new bar when none; then downsized.
 */
export function fitDecreasing(p: Problem, best: boolean, offcutsFirst: boolean): Bin[] {
  const d = p.sizes.length;
  const avail = p.types.map((t) => t.avail);
  const bins: Bin[] = [];
  for (let i = 0; i < d; i++) {
    const s = p.sizes[i];
    // WARNING: first fit for equal pieces only moves forward (earlier bars only fill up), so the
    // scan resumes where the last equal piece went; this keeps big decks linear, not quadratic.
    let from = 0;
    for (let q = 0; q < p.demand[i]; q++) {
      let into = -1;
      for (let b = best ? 0 : from; b < bins.length; b++) {
        const room = p.types[bins[b].type].cap - bins[b].used;
        if (room < s - EPS) continue;
        if (!best) {
          into = b;
          break;
        }
        if (into < 0 || room < p.types[bins[into].type].cap - bins[into].used) into = b;
      }
      if (into < 0) {
        const t = openType(p, avail, s, offcutsFirst);
        if (t < 0) throw new Error(`no bar holds a piece of ${p.lens[i]} mm`);
        avail[t]--;
        bins.push({ type: t, counts: new Array<number>(d).fill(0), used: 0 });
        into = bins.length - 1;
      }
      from = into;
      bins[into].counts[i]++;
      bins[into].used += s;
    }
  }
  return downsize(p, bins);
}

/**
 * Greedy by bars: repeatedly cut the bar whose best fill wastes least (free offcuts first), as many
 * times as the remaining pieces allow. With `mustLargest` each bar holds the longest piece left.
 */
export function greedyFill(p: Problem, mustLargest: boolean): Bin[] {
  const d = p.sizes.length;
  const rem = p.demand.slice();
  const avail = p.types.map((t) => t.avail);
  const bins: Bin[] = [];
  let left = rem.reduce((a, b) => a + b, 0);
  while (left > 0) {
    const first = rem.findIndex((r) => r > 0);
    let pick: { t: number; fill: Fill; ratio: number } | null = null;
    for (let t = 0; t < p.types.length; t++) {
      const ty = p.types[t];
      if (avail[t] <= 0) continue;
      const fill = bestFill(p, ty.cap, rem, mustLargest ? first : -1);
      if (fill.used <= EPS) continue;
      const ratio = ty.cost / fill.used;
      if (
        !pick ||
        ratio < pick.ratio - 1e-12 ||
        (Math.abs(ratio - pick.ratio) <= 1e-12 && fill.used > pick.fill.used + EPS)
      )
        pick = { t, fill, ratio };
    }
    if (!pick) throw new Error('no bar holds the remaining pieces');
    let times = avail[pick.t];
    for (let i = 0; i < d; i++)
      if (pick.fill.counts[i] > 0)
        times = Math.min(times, Math.floor(rem[i] / pick.fill.counts[i]));
    times = Math.max(1, times);
    for (let k = 0; k < times; k++)
      bins.push({ type: pick.t, counts: pick.fill.counts.slice(), used: pick.fill.used });
    for (let i = 0; i < d; i++) {
      rem[i] -= pick.fill.counts[i] * times;
      left -= pick.fill.counts[i] * times;
    }
    avail[pick.t] -= times;
  }
  return downsize(p, bins);
}
