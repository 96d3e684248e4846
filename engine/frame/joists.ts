// Places joist lines: field joists at the set centres, edge joists, border joists; clips them to the outline. Pure: engine only.
import type { MemberRole, Ply, Pt } from '../types';
import { EPS, crossVertical, distToSegment, insetRing, subtractInterval } from '../geometry';
import { verticalsInside } from '../clip';
import type { EdgeInfo, FrameContext, JoistLine } from './model';

/** Lines shorter than this (mm) are left out. Kept tiny: a short joist in a sharp corner still carries board ends. */
const MIN_LINE_MM = 1;

interface Candidate {
  x: number;
  role: MemberRole;
  kind: 'joist' | 'rim';
  ply: Ply;
  /** Restrict to this y-range (border joists follow their edge only). */
  range?: [number, number];
}

/** The edge whose rim a line end at (x, y) butts against: the nearest edge that crosses the joists. */
export function endEdgeAt(ctx: FrameContext, x: number, y: number): EdgeInfo | null {
  let best: EdgeInfo | null = null;
  let bestD = Infinity;
  for (const e of ctx.edges) {
    if (e.kind === 'parallel') continue;
    const d = distToSegment([x, y], e.a, e.b);
    // At a corner both edges are "nearest": take the one the line crosses more squarely, whose
    // rim it actually meets (the other only touches the corner).
    const tie = Math.abs(d - bestD) <= 1;
    if ((tie && best && Math.abs(e.ux) > Math.abs(best.ux)) || (!tie && d < bestD)) {
      bestD = Math.min(d, bestD);
      best = e;
    }
  }
  return best;
}

/**
 * Lays out every joist line of the deck: edge joists along edges that run with the joists, field
 * joists at the set centres from the first edge, and (with a border course) two border joists
 * beside each edge joist where the field boards end. Lines are clipped to the outline with the
 * polygon library, then shortened at each end by the rim they butt against.
 */
export function placeJoistLines(ctx: FrameContext): JoistLine[] {
  const { design, w, bounds } = ctx;
  const c = design.joistCentresMm;
  const candidates: Candidate[] = [];
  const edgeRims: { x: number; lo: number; hi: number; edge: EdgeInfo }[] = [];
  for (const e of ctx.edges) {
    if (e.kind !== 'parallel') continue;
    const lo = Math.min(e.rimA[1], e.rimB[1]);
    const hi = Math.max(e.rimA[1], e.rimB[1]);
    if (hi - lo < MIN_LINE_MM) continue;
    edgeRims.push({ x: (e.rimA[0] + e.rimB[0]) / 2, lo, hi, edge: e });
  }
  const first = bounds.minX + w / 2;
  for (let x = first + c; x < bounds.maxX - w / 2; x += c) {
    candidates.push({ x, role: 'field', kind: 'joist', ply: 1 });
  }
  // Where field joists may not go; `field` is the side border joists face the field boards.
  const blockers: { x: number; lo: number; hi: number; field: number }[] = edgeRims.map((r) => ({
    x: r.x,
    lo: r.lo,
    hi: r.hi,
    field: 0,
  }));
  if (design.borderCourses > 0) {
    const bw = design.board.widthMm;
    const gap = design.board.gapMm;
    // Field boards end in the gap inside the last border course: two joists straddle that line.
    const fieldEnd = design.borderCourses * (bw + gap) - gap / 2;
    for (const r of edgeRims) {
      // Inward normal of a counter-clockwise ring points left of the edge direction.
      const inward = -Math.sign(r.edge.uy);
      // Where the edge ends in a reflex (inside) corner the deck carries on past it: the border
      // joists run on to the far edge so their ends stand on a rim rather than in mid-air.
      const loAtA = r.edge.a[1] < r.edge.b[1];
      const aReflex = isReflex(ctx, r.edge.index);
      const bReflex = isReflex(ctx, (r.edge.index + 1) % ctx.ring.length);
      const eLo = (loAtA ? aReflex : bReflex) ? -Infinity : Math.min(r.edge.a[1], r.edge.b[1]);
      const eHi = (loAtA ? bReflex : aReflex) ? Infinity : Math.max(r.edge.a[1], r.edge.b[1]);
      const edgeX = r.edge.a[0];
      for (const off of [fieldEnd - w / 2, fieldEnd + w / 2]) {
        const x = edgeX + inward * off;
        candidates.push({ x, role: 'border', kind: 'joist', ply: 3, range: [eLo, eHi] });
        blockers.push({ x, lo: eLo, hi: eHi, field: inward });
      }
    }
  }
  const xs = candidates.map((cd) => cd.x);
  const inside = verticalsInside(ctx.ring, xs);
  const lines: JoistLine[] = [];
  let n = 0;
  for (let i = 0; i < candidates.length; i++) {
    const cd = candidates[i];
    let ivs = inside[i];
    if (cd.range) ivs = ivs.filter(([a, b]) => b > cd.range![0] && a < cd.range![1]);
    const trimmed: [number, number][] = [];
    for (const [a, b] of ivs) {
      let y0 = a;
      let y1 = b;
      if (cd.range) {
        y0 = Math.max(y0, cd.range[0]);
        y1 = Math.min(y1, cd.range[1]);
      }
      y0 += trimAt(ctx, cd.x, y0, 1);
      y1 -= trimAt(ctx, cd.x, y1, -1);
      if (y1 - y0 >= MIN_LINE_MM) trimmed.push([y0, y1]);
    }
    let pieces = trimmed;
    // A field joist may not sit on top of an edge joist or a border joist: cut it out there.
    const moved: { x: number; ivs: [number, number][] }[] = [];
    if (cd.role === 'field') {
      for (const b of blockers) {
        if (Math.abs(b.x - cd.x) >= w) continue;
        // (half a joist past each end covers the mitre where the blocking rim meets the next)
        const lo = b.lo - w / 2;
        const hi = b.hi + w / 2;
        if (b.field !== 0) {
          // Beside a border joist, keep the field joist but move it alongside on the field side,
          // so the boards there do not lose a joist (it would leave more than the centres).
          const side = Math.sign(cd.x - b.x) || b.field;
          const x = b.x + side * w;
          const clash = blockers.some((o) => o !== b && Math.abs(o.x - x) < w - 1e-6);
          const ivs = pieces
            .map(([a, c]) => [Math.max(a, lo), Math.min(c, hi)] as [number, number])
            .filter(([a, c]) => c - a >= MIN_LINE_MM);
          if (!clash && side === b.field && ivs.length > 0) moved.push({ x, ivs });
        }
        pieces = subtractInterval(pieces, lo, hi);
      }
    }
    for (const m of moved) {
      for (const [y0, y1] of m.ivs) {
        lines.push(makeLine(ctx, `L${++n}`, { ...cd, x: m.x }, y0, y1));
      }
    }
    for (const [y0, y1] of pieces) {
      if (y1 - y0 < MIN_LINE_MM) continue;
      lines.push(makeLine(ctx, `L${++n}`, cd, y0, y1));
    }
  }
  for (const r of edgeRims) {
    const ply: Ply = design.borderCourses > 0 ? 3 : 1;
    lines.push(makeLine(ctx, `L${++n}`, { x: r.x, role: 'edge', kind: 'rim', ply }, r.lo, r.hi));
  }
  lines.sort((a, b) => a.x - b.x || a.y0 - b.y0);
  return lines;
}

/** True when the outline turns clockwise (inward) at vertex i of the counter-clockwise ring. */
function isReflex(ctx: FrameContext, i: number): boolean {
  const n = ctx.ring.length;
  const p = ctx.ring[(i + n - 1) % n];
  const q = ctx.ring[i];
  const r = ctx.ring[(i + 1) % n];
  return (q[0] - p[0]) * (r[1] - q[1]) - (q[1] - p[1]) * (r[0] - q[0]) < 0;
}

/** Each rim band of an edge that crosses the joists, as a mitred quad transposed (y, x) for vertical scans. */
interface RimQuad {
  index: number;
  quad: Pt[];
  /** The quad's range across the joists (layout x), to skip it quickly. */
  lo: number;
  hi: number;
}

const bandCache = new WeakMap<FrameContext, RimQuad[]>();

function rimQuads(ctx: FrameContext): RimQuad[] {
  let quads = bandCache.get(ctx);
  if (quads) return quads;
  const inner = insetRing(ctx.ring, ctx.w);
  const n = ctx.ring.length;
  quads = [];
  for (const e of ctx.edges) {
    if (e.kind === 'parallel') continue;
    const j = (e.index + 1) % n;
    // Outer face on the edge, inner face a joist width inside; the ends are the mitre lines.
    const quad: Pt[] = [ctx.ring[e.index], ctx.ring[j], inner[j], inner[e.index]];
    const xs = quad.map((p) => p[0]);
    quads.push({
      index: e.index,
      quad: quad.map((p) => [p[1], p[0]] as Pt),
      lo: Math.min(...xs),
      hi: Math.max(...xs),
    });
  }
  bandCache.set(ctx, quads);
  return quads;
}

/** Scratch for quadCrossings: the sorted crossings of one quad (at most four). */
const CROSS = [0, 0, 0, 0];

/**
 * The crossings of the line x (a transposed quad's y) with the quad's sides, sorted into CROSS;
 * returns how many (consecutive pairs are the inside intervals, even-odd, as scanRing gives them).
 * Allocation-free: this runs for every line end.
 */
function quadCrossings(quad: Pt[], x: number): number {
  let k = 0;
  for (let i = 0, j = 3; i < 4; j = i++) {
    const qi = quad[i];
    const qj = quad[j];
    // Transposed: [1] is across the joists, [0] along them.
    if (qi[1] > x !== qj[1] > x) {
      const v = qi[0] + ((x - qi[1]) * (qj[0] - qi[0])) / (qj[1] - qi[1]);
      // Insertion into the sorted scratch.
      let m = k++;
      while (m > 0 && CROSS[m - 1] > v) {
        CROSS[m] = CROSS[m - 1];
        m--;
      }
      CROSS[m] = v;
    }
  }
  return k;
}

/**
 * How far a line end at (x, y) on the outline must move inward (dir +1: up from a lower end, -1:
 * down from an upper end) to stop at the inner face of the rims it runs into. The rims meet mitred,
 * so near a corner the line passes from one rim's band into its neighbour's and stops at the
 * neighbour's inner face; along an edge nearly parallel to the joists it runs inside the rim for a
 * long way. Falls back to the straight depth across the nearest rim when no band holds the end.
 */
export function trimAt(ctx: FrameContext, x: number, y: number, dir: 1 | -1): number {
  const quads = rimQuads(ctx);
  const tol = 1e-3;
  // Start from the exact crossing with the outline: the clipped end is rounded to 0.1 mm in x,
  // which moves it along an edge nearly parallel to the joists by much more than that in y.
  let t = y;
  let near = Infinity;
  const n = ctx.ring.length;
  for (let i = 0; i < n; i++) {
    const c = crossVertical(ctx.ring[i], ctx.ring[(i + 1) % n], x);
    if (c !== null && Math.abs(c - y) < near) {
      near = Math.abs(c - y);
      t = c;
    }
  }
  let found = false;
  for (let guard = 0; guard <= quads.length; guard++) {
    let next = t;
    for (const q of quads) {
      if (x <= q.lo || x >= q.hi) continue;
      const k = quadCrossings(q.quad, x);
      for (let c = 0; c + 1 < k; c += 2) {
        const lo = CROSS[c];
        const hi = CROSS[c + 1];
        if (hi - lo <= EPS) continue;
        if (dir > 0 && lo <= t + tol && hi > next) next = hi;
        if (dir < 0 && hi >= t - tol && lo < next) next = lo;
      }
    }
    if (Math.abs(next - t) <= tol) break;
    found = true;
    t = next;
  }
  if (found) return Math.max(0, (t - y) * dir);
  const e = endEdgeAt(ctx, x, y);
  if (!e) return ctx.w;
  // Perpendicular depth w along a vertical line is w / |cos| of the edge's angle to the boards.
  return ctx.w / Math.max(Math.abs(e.ux), 0.05);
}

function makeLine(ctx: FrameContext, id: string, cd: Candidate, y0: number, y1: number): JoistLine {
  const e0 = endEdgeAt(ctx, cd.x, y0);
  const e1 = endEdgeAt(ctx, cd.x, y1);
  return {
    id,
    x: cd.x,
    y0,
    y1,
    kind: cd.kind,
    role: cd.role,
    ply: cd.ply,
    endEdge: [e0 ? e0.index : -1, e1 ? e1.index : -1],
    supports: [],
    endSupported: [false, false],
    bearY: [y0, y1],
    pieces: [],
  };
}
