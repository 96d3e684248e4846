// Cut list exact search: branch and bound over whole bars ("bin completion"), proving a plan optimal or improving it within a node budget. Pure; touches nothing outside engine/cutlist.
import { remainingBound } from './bounds';
import { EPS, better, remainingSize, type Bin, type Problem, type Score } from './model';

/** What the search found. */
export interface ExactResult {
  bins: Bin[];
  score: Score;
  /** True when the search finished: the plan is optimal. */
  complete: boolean;
  nodes: number;
}

/**
 * Bin completion (after Korf, "An improved algorithm for optimal bin packing", IJCAI 2003; the idea
 * from memory): take the longest piece left, choose the bar that will hold it (each bar type in
 * turn) and fill that bar with a maximal set of the remaining pieces (one no other remaining piece
 * could join); recurse. Restricting to maximal bars loses nothing: moving a piece into a bar with
 * room never makes a plan dearer. Prunes with `remainingBound` against the best plan so far.
 * Deterministic: the budget counts work (nodes plus the steps spent listing bar fills), not time.
 */
export function binCompletion(
  p: Problem,
  incumbent: Bin[],
  incumbentScore: Score,
  floor: Score,
  budget: number,
): ExactResult {
  const d = p.sizes.length;
  const rem = p.demand.slice();
  const avail = p.types.map((t) => t.avail);
  let best = incumbent;
  let bestScore = incumbentScore;
  let nodes = 0;
  let aborted = false;
  const path: Bin[] = [];

  const atFloor = () => !better(floor, bestScore);

  const search = (cost: number, count: number, remW: number) => {
    if (aborted || atFloor()) return;
    if (++nodes > budget) {
      aborted = true;
      return;
    }
    if (remW <= EPS) {
      const s = { cost, count };
      if (better(s, bestScore)) {
        best = path.slice();
        bestScore = s;
      }
      return;
    }
    const lb = remainingBound(p, remW, avail);
    if (!better({ cost: cost + lb.cost, count: count + lb.count }, bestScore)) return;

    let first = 0;
    while (rem[first] === 0) first++;
    const listed = candidates(p, rem, avail, first, budget - nodes);
    nodes += listed.steps;
    const cands = listed.bins;
    if (!cands) {
      aborted = true;
      return;
    }
    for (const c of cands) {
      const ty = p.types[c.type];
      const nextCost = cost + ty.cost;
      const nextCount = count + (ty.offcut ? 0 : 1);
      for (let i = 0; i < d; i++) rem[i] -= c.counts[i];
      avail[c.type]--;
      path.push(c);
      search(nextCost, nextCount, remW - c.used);
      path.pop();
      avail[c.type]++;
      for (let i = 0; i < d; i++) rem[i] += c.counts[i];
      if (aborted || atFloor()) return;
    }
  };

  search(0, 0, remainingSize(p, rem));
  return { bins: best, score: bestScore, complete: !aborted, nodes };
}

/** Maximal fills, holding piece `first`, of every bar type available; least waste first. Null when over `limit` steps. */
function candidates(
  p: Problem,
  rem: number[],
  avail: number[],
  first: number,
  limit: number,
): { bins: Bin[] | null; steps: number } {
  const d = p.sizes.length;
  const out: Bin[] = [];
  let steps = 0;
  const counts = new Array<number>(d).fill(0);
  for (let t = 0; t < p.types.length; t++) {
    const ty = p.types[t];
    if (avail[t] <= 0 || ty.cap < p.sizes[first] - EPS) continue;
    counts.fill(0);
    counts[first] = 1;
    const enumerate = (i: number, used: number) => {
      if (++steps > limit) return;
      if (i >= d) {
        // Maximal: no remaining piece fits in the room left.
        const room = ty.cap - used;
        for (let j = d - 1; j >= 0; j--) {
          if (rem[j] - counts[j] > 0 && p.sizes[j] <= room + EPS) return;
        }
        out.push({ type: t, counts: counts.slice(), used });
        return;
      }
      if (i === first) {
        const base = counts[i];
        const maxC = Math.min(rem[i] - base, Math.floor((ty.cap - used + EPS) / p.sizes[i]));
        for (let c = maxC; c >= 0; c--) {
          counts[i] = base + c;
          enumerate(i + 1, used + c * p.sizes[i]);
        }
        counts[i] = base;
        return;
      }
      const maxC = Math.min(rem[i], Math.floor((ty.cap - used + EPS) / p.sizes[i]));
      for (let c = maxC; c >= 0; c--) {
        counts[i] = c;
        enumerate(i + 1, used + c * p.sizes[i]);
      }
      counts[i] = 0;
    };
    enumerate(first, p.sizes[first]);
    if (steps > limit) return { bins: null, steps };
  }
  // Cheapest per unit used first, then fullest.
  out.sort((a, b) => {
    const ra = p.types[a.type].cost / a.used;
    const rb = p.types[b.type].cost / b.used;
    if (Math.abs(ra - rb) > 1e-12) return ra - rb;
    return b.used - a.used;
  });
  return { bins: out, steps };
}
