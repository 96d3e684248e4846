// Support rows, pads and posts: honours the user's rows or places them, and finds where each joist line bears. Pure: engine only.
import type { Pt } from '../types';
import { crossVertical, dist, distToSegment, scanRing } from '../geometry';
import type { EdgeInfo, FrameContext, JoistLine, RowSeg } from './model';

/** The user's support rows, turned into the layout frame. */
export function userRows(ctx: FrameContext): RowSeg[] {
  return ctx.design.supports.map((s, i) => ({
    id: `S${i + 1}`,
    a: toFrame(ctx, s.a as Pt),
    b: toFrame(ctx, s.b as Pt),
    kind: s.kind,
    placed: false,
  }));
}

function toFrame(ctx: FrameContext, p: Pt): Pt {
  return [p[0] * ctx.cos + p[1] * ctx.sin, -p[0] * ctx.sin + p[1] * ctx.cos];
}

/** True when the rim of this edge is usable (the mitred centreline did not fold over or off the deck). */
export function rimUsable(e: EdgeInfo): boolean {
  const dx = e.rimB[0] - e.rimA[0];
  const dy = e.rimB[1] - e.rimA[1];
  return dx * e.ux + dy * e.uy > 1 && e.rimInside;
}

/** Rows under the rims of edges that run with the boards: the rows "at both ends" of the joists. */
export function endRows(ctx: FrameContext): RowSeg[] {
  const kind = ctx.usePosts ? 'beam' : 'blocks';
  return ctx.edges
    .filter((e) => e.kind === 'row' && rimUsable(e))
    .map((e) => ({ id: '', a: e.rimA, b: e.rimB, kind, placed: true }));
}

/**
 * Finds, for every joist line, where support rows cross it and whether each end bears on a
 * support: a row passing under the end, or a rim that stands on pads.
 */
export function bearLines(
  ctx: FrameContext,
  lines: JoistLine[],
  rows: RowSeg[],
  paddedEdges: EdgeInfo[],
): void {
  const reach = ctx.w + 1;
  for (const line of lines) {
    const ys: number[] = [];
    for (const r of rows) {
      const y = crossVertical(r.a, r.b, line.x);
      if (y !== null && y > line.y0 + 1 && y < line.y1 - 1) ys.push(y);
    }
    ys.sort((a, b) => a - b);
    line.supports = dedupe(ys);
    const ends: Pt[] = [
      [line.x, line.y0],
      [line.x, line.y1],
    ];
    line.bearY = [line.y0, line.y1];
    line.endSupported = ends.map((p, i) => {
      const bear = (a: Pt, b: Pt) => {
        if (distToSegment(p, a, b) > reach) return false;
        // Bear where the support's centreline crosses the line, if it does nearby.
        const y = crossVertical(a, b, line.x);
        if (y !== null && Math.abs(y - p[1]) <= reach) line.bearY[i] = y;
        return true;
      };
      for (const r of rows) if (bear(r.a, r.b)) return true;
      for (const e of paddedEdges) if (bear(e.rimA, e.rimB)) return true;
      return false;
    }) as [boolean, boolean];
  }
}

function dedupe(sorted: number[]): number[] {
  const out: number[] = [];
  for (const y of sorted) if (out.length === 0 || y - out[out.length - 1] > 1) out.push(y);
  return out;
}

/**
 * Places rows across the joists (parallel to the boards) so that no line has more than the row
 * limit between supports, spacing each run evenly. Returns the new rows, clipped to the outline.
 */
export function placeRows(ctx: FrameContext, lines: JoistLine[]): RowSeg[] {
  const S = ctx.rowLimit;
  const C = ctx.design.joist.maxCantileverMm;
  interface Gap {
    lo: number;
    hi: number;
    x: number;
  }
  let gaps: Gap[] = [];
  for (const line of lines) {
    // An end not on a support needs a row within the cantilever limit of it.
    const lo = line.endSupported[0] ? line.bearY[0] : line.y0 - Math.max(0, S - C);
    const hi = line.endSupported[1] ? line.bearY[1] : line.y1 + Math.max(0, S - C);
    const pts = [lo, ...line.supports, hi];
    for (let i = 0; i + 1 < pts.length; i++) {
      if (pts[i + 1] - pts[i] > S + 0.5) gaps.push({ lo: pts[i], hi: pts[i + 1], x: line.x });
    }
  }
  const rowsAt: { y: number; xs: number[] }[] = [];
  let guard = 0;
  while (gaps.length > 0 && guard++ < 10_000) {
    let y = Infinity;
    for (const g of gaps) {
      const n = Math.ceil((g.hi - g.lo) / S - 1e-9);
      const ideal = g.lo + (g.hi - g.lo) / n;
      if (ideal < y) y = ideal;
    }
    const xs: number[] = [];
    const next: Gap[] = [];
    for (const g of gaps) {
      if (g.lo < y - 1e-6 && y < g.hi - 1e-6) {
        xs.push(g.x);
        if (g.hi - y > S + 0.5) next.push({ lo: y, hi: g.hi, x: g.x });
      } else next.push(g);
    }
    gaps = next;
    rowsAt.push({ y, xs });
  }
  // Rows are not joists: a plain scanline finds where each crosses the deck.
  const spans = rowsAt.map((r) => scanRing(ctx.ring, r.y));
  const kind = ctx.usePosts ? 'beam' : 'blocks';
  const out: RowSeg[] = [];
  rowsAt.forEach((r, i) => {
    for (const [xa, xb] of spans[i]) {
      if (!r.xs.some((x) => x >= xa && x <= xb)) continue;
      out.push({ id: '', a: [xa, r.y], b: [xb, r.y], kind, placed: true });
    }
  });
  return out;
}

/** Pads and posts placed, and any pad gaps left over the limit. */
export interface PadPlan {
  /** Pad or post positions (layout frame). */
  points: Pt[];
  /** Gaps between supports along padded rims that are over the limit. */
  overLimit: { at: Pt; gap: number }[];
}

/**
 * Pads (or posts) under rims that stand on pads, at their ends, at rim joins and so that no gap
 * along the rim exceeds the row limit; posts under beam rows when the deck is high.
 */
export function placePads(
  ctx: FrameContext,
  paddedEdges: EdgeInfo[],
  rows: RowSeg[],
  rimJoins: Map<number, number[]>,
): PadPlan {
  const S = ctx.rowLimit;
  const reach = ctx.w + 1;
  const points: Pt[] = [];
  const overLimit: { at: Pt; gap: number }[] = [];
  for (const e of paddedEdges) {
    const L = dist(e.rimA, e.rimB);
    const at = (t: number): Pt => [
      e.rimA[0] + ((e.rimB[0] - e.rimA[0]) * t) / L,
      e.rimA[1] + ((e.rimB[1] - e.rimA[1]) * t) / L,
    ];
    // Where rows already carry the rim.
    const carried: number[] = [];
    for (const r of rows) {
      const t = segmentParam(e.rimA, e.rimB, r.a, r.b);
      if (t !== null) carried.push(t * L);
    }
    const onRow = (t: number) => rows.some((r) => distToSegment(at(t), r.a, r.b) <= reach);
    const pads: number[] = [];
    for (const t of [0, L, ...(rimJoins.get(e.index) ?? [])]) if (!onRow(t)) pads.push(t);
    const all = [
      ...new Set([...pads, ...carried, ...(onRow(0) ? [0] : []), ...(onRow(L) ? [L] : [])]),
    ]
      .filter((t) => t >= -1 && t <= L + 1)
      .sort((a, b) => a - b);
    for (let i = 0; i + 1 < all.length; i++) {
      const gap = all[i + 1] - all[i];
      if (gap > S + 0.5) {
        const n = Math.ceil(gap / S - 1e-9);
        for (let k = 1; k < n; k++) pads.push(all[i] + (gap * k) / n);
      }
    }
    const final = [...new Set([...pads, ...carried])].sort((a, b) => a - b);
    for (let i = 0; i + 1 < final.length; i++) {
      const gap = final[i + 1] - final[i];
      if (gap > S + 0.5) overLimit.push({ at: at((final[i] + final[i + 1]) / 2), gap });
    }
    for (const t of pads) points.push(at(t));
  }
  if (ctx.usePosts) {
    for (const r of rows) {
      if (r.kind !== 'beam') continue;
      const L = dist(r.a, r.b);
      const n = Math.max(1, Math.ceil(L / S - 1e-9));
      for (let k = 0; k <= n; k++) {
        points.push([r.a[0] + ((r.b[0] - r.a[0]) * k) / n, r.a[1] + ((r.b[1] - r.a[1]) * k) / n]);
      }
    }
  }
  return { points: dedupePoints(points, ctx.w), overLimit };
}

function dedupePoints(pts: Pt[], tol: number): Pt[] {
  const out: Pt[] = [];
  for (const p of pts) if (!out.some((q) => dist(p, q) < tol)) out.push(p);
  return out;
}

/** Parameter (0..1) along ab where segment cd crosses it, or null. */
function segmentParam(a: Pt, b: Pt, c: Pt, d: Pt): number | null {
  const rx = b[0] - a[0];
  const ry = b[1] - a[1];
  const sx = d[0] - c[0];
  const sy = d[1] - c[1];
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-9) return null;
  const t = ((c[0] - a[0]) * sy - (c[1] - a[1]) * sx) / den;
  const u = ((c[0] - a[0]) * ry - (c[1] - a[1]) * rx) / den;
  if (t < 0 || t > 1 || u < 0 || u > 1) return null;
  return t;
}
