// Cut list improvement: re-cut the emptiest bars of a plan together, exactly, to free a bar. Pure; touches nothing outside engine/cutlist.
import { l2Bound } from './bounds';
import { binCompletion } from './exact';
import { fitDecreasing, greedyFill } from './heuristics';
import { better, scoreOf, type Bin, type Problem, type Score } from './model';

/**
 * Tail re-cutting: pool the pieces of the k least-filled bars and pack them again on their own
 * (heuristics, then a short exact search); keep the result when it costs less. Tried for a few k,
 * repeated while it helps. Deterministic; `budget` caps the work of all the exact searches together.
 */
export function improveTail(p: Problem, bins: Bin[], floor: Score, budget: number): Bin[] {
  let cur = bins;
  let curScore = scoreOf(p, cur);
  let spent = 0;
  for (let round = 0; round < 8 && better(floor, curScore) && spent < budget; round++) {
    let improved = false;
    for (const k of [3, 5, 8, 12]) {
      if (k > cur.length) break;
      const order = cur
        .map((b, i) => ({ i, slack: (p.types[b.type].cap - b.used) / p.types[b.type].cap }))
        .sort((a, b) => b.slack - a.slack);
      const pick = new Set(order.slice(0, k).map((o) => o.i));
      const keep = cur.filter((_, i) => !pick.has(i));
      const taken = cur.filter((_, i) => pick.has(i));
      const avail = p.types.map((t) => t.avail);
      for (const b of keep) avail[b.type]--;
      const demand = new Array<number>(p.sizes.length).fill(0);
      for (const b of taken) for (let i = 0; i < demand.length; i++) demand[i] += b.counts[i];
      const sub: Problem = {
        ...p,
        demand,
        types: p.types.map((t, i) => ({ ...t, avail: avail[i] })),
      };
      const before = scoreOf(p, taken);
      let subFloor: Score = { cost: 0, count: 0 };
      if (p.types.length === 1) {
        const n = l2Bound(sub.sizes, sub.demand, p.types[0].cap);
        subFloor = { cost: n * p.types[0].cost, count: n };
        if (!better(subFloor, before)) continue; // these bars cannot be cut into fewer
      }
      let best = taken;
      let bestScore = before;
      for (const h of [() => fitDecreasing(sub, true, false), () => greedyFill(sub, true)]) {
        let b: Bin[];
        try {
          b = h();
        } catch {
          continue; // a greedy stranded a long piece; the bars as they were still stand
        }
        const s = scoreOf(sub, b);
        if (better(s, bestScore)) {
          best = b;
          bestScore = s;
        }
      }
      if (better(subFloor, bestScore)) {
        const ex = binCompletion(
          sub,
          best,
          bestScore,
          subFloor,
          Math.min(budget / 8, budget - spent),
        );
        spent += ex.nodes;
        if (better(ex.score, bestScore)) {
          best = ex.bins;
          bestScore = ex.score;
        }
      }
      if (better(bestScore, before)) {
        cur = keep.concat(best);
        curScore = scoreOf(p, cur);
        improved = true;
        break;
      }
    }
    if (!improved) break;
  }
  return cur;
}
