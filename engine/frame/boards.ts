// Board courses, border courses, staggered butt joints and the paired joists under them. Pure: engine only.
import type { Pt } from '../types';
import { boundsOf, insetRing, intersectIntervals, pointInRing, scanRing } from '../geometry';
import type { FrameContext, JoistLine } from './model';
import { verticalsInside } from '../clip';
import { trimAt } from './joists';

/** One board piece in the layout frame. */
export interface BoardRaw {
  course: number;
  a: Pt;
  b: Pt;
  border: boolean;
}

/** A butt joint between two board pieces, on a joist line (or on nothing). */
export interface JointRaw {
  at: Pt;
  course: number;
  /** The joist line the joint is over; null when no joist was in reach. */
  line: JoistLine | null;
  /** Which side of the line the pair joist goes (+1 right, -1 left); 0 for joints along an edge joist. */
  side: number;
  /** The pair line, once inserted. */
  pair: JoistLine | null;
  /** A border joint along an edge joist: both ends bear on the triple joist. */
  alongEdge: boolean;
}

/** A field course interval, kept for the board span check. */
export interface CourseRaw {
  course: number;
  y: number;
  xa: number;
  xb: number;
}

/** Everything layBoards produces: board pieces, butt joints and the field courses. */
export interface BoardLayout {
  boards: BoardRaw[];
  joints: JointRaw[];
  courses: CourseRaw[];
}

interface Candidate {
  /** Distance along the run to the joint point. */
  t: number;
  line: JoistLine;
  side: number;
}

/**
 * Cuts one run of boards of length L into stock pieces, joints only at candidates (joist lines),
 * furthest first, keeping clear of the previous course's joints by minStagger and never on the same
 * joist line; relaxes those rules only when nothing else is in reach.
 */
function cutRun(
  L: number,
  stock: number,
  endGap: number,
  minPiece: number,
  candidates: Candidate[],
  prev: { t: number; lineId: string }[],
  minStagger: number,
): { t: number; cand: Candidate | null }[] {
  // Candidates sorted by t: each cut scans down from the furthest one in reach.
  const cands = candidates.slice().sort((p, q) => p.t - q.t);
  const out: { t: number; cand: Candidate | null }[] = [];
  const tailMin = Math.min(minPiece, L / 4);
  let start = 0;
  let guard = 0;
  while (L - start > stock + 1e-6 && guard++ < 1000) {
    const reach = start + stock + endGap / 2;
    const low = start + Math.min(minPiece, stock / 2);
    let top = cands.length - 1;
    while (top >= 0 && cands[top].t > reach) top--;
    let best: Candidate | null = null;
    // Tiers, best first: room left after the joint, stagger kept, a different joist from the
    // previous course; then the same without room; then anything in reach.
    for (let tier = 0; tier < 6 && !best; tier++) {
      const needRoom = tier < 3;
      const rule = tier % 3; // 0: staggered, 1: distinct joist, 2: any
      for (let i = top; i >= 0 && cands[i].t > low; i--) {
        const c = cands[i];
        if (needRoom && L - c.t < tailMin) continue;
        if (rule < 2 && !clearOf(c, prev, rule === 0 ? minStagger : 0)) continue;
        best = c;
        break;
      }
    }
    if (!best) {
      out.push({ t: start + stock, cand: null });
      start += stock + endGap;
      continue;
    }
    out.push({ t: best.t, cand: best });
    start = best.t + endGap / 2;
  }
  return out;
}

/** True when a joint at c keeps minStagger from every joint of the previous course, on another joist. */
function clearOf(c: Candidate, prev: { t: number; lineId: string }[], minStagger: number): boolean {
  for (const p of prev) {
    if (p.lineId === c.line.id) return false;
    if (Math.abs(p.t - c.t) < minStagger - 1e-6) return false;
  }
  return true;
}

/** Lines (sorted by x) under a course centred at y that is 2 * half wide. */
function linesAt(lines: JoistLine[], y: number, half: number): JoistLine[] {
  const out: JoistLine[] = [];
  for (const l of lines) if (l.y0 - half <= y && y <= l.y1 + half) out.push(l);
  return out;
}

/** y moved onto the line's length (a board over a joist end bears on that end). */
export function clampToLine(l: JoistLine, y: number): number {
  return Math.min(l.y1, Math.max(l.y0, y));
}

/** Which side the pair joist of carrying[i] can go: the side with more room to the next line. */
function pairSide(carrying: JoistLine[], i: number, w: number): number {
  const x = carrying[i].x;
  const right = i + 1 < carrying.length ? carrying[i + 1].x - x : Infinity;
  const left = i > 0 ? x - carrying[i - 1].x : Infinity;
  if (right >= 2 * w) return 1;
  if (left >= 2 * w) return -1;
  return right >= left ? 1 : -1;
}

/** Lays the field courses and border courses and finds every butt joint. */
export function layBoards(ctx: FrameContext, lines: JoistLine[]): BoardLayout {
  const { design, ring, w } = ctx;
  const bw = design.board.widthMm;
  const gap = design.board.gapMm;
  const endGap = design.board.endGapMm;
  const stock = design.board.stockMm;
  const pitch = bw + gap;
  const nBorder = design.borderCourses;
  const minPiece = design.joistCentresMm;
  const boards: BoardRaw[] = [];
  const joints: JointRaw[] = [];
  const courses: CourseRaw[] = [];

  // Field courses.
  const fieldRing = nBorder > 0 ? insetRing(ring, nBorder * pitch) : ring;
  const fb = boundsOf(fieldRing);
  let prev: { t: number; lineId: string }[] = [];
  for (let k = 0; fb.minY + k * pitch < fb.maxY - 1; k++) {
    const y = Math.min(fb.minY + bw / 2 + k * pitch, (fb.minY + k * pitch + fb.maxY) / 2);
    const ivs = intersectIntervals(scanRing(fieldRing, y), scanRing(ring, y));
    const carrying = linesAt(lines, y, bw / 2);
    const here: { t: number; lineId: string }[] = [];
    for (const [xa, xb] of ivs) {
      courses.push({ course: k, y, xa, xb });
      const cands: Candidate[] = [];
      for (let i = 0; i < carrying.length; i++) {
        const l = carrying[i];
        if (l.x <= xa || l.x >= xb) continue;
        const side = pairSide(carrying, i, w);
        const jx = l.x + (side * w) / 2;
        if (jx > xa && jx < xb) cands.push({ t: jx - xa, line: l, side });
      }
      // Joints of the previous course, measured from this interval's start.
      const prevHere = prev.map((p) => ({ t: p.t - xa, lineId: p.lineId }));
      const cuts = cutRun(xb - xa, stock, endGap, minPiece, cands, prevHere, design.minStaggerMm);
      let s = xa;
      for (const cut of cuts) {
        const jx = xa + cut.t;
        boards.push({ course: k, a: [s, y], b: [jx - endGap / 2, y], border: false });
        s = jx + endGap / 2;
        joints.push({
          at: [jx, y],
          course: k,
          line: cut.cand?.line ?? null,
          side: cut.cand?.side ?? 0,
          pair: null,
          alongEdge: false,
        });
        here.push({ t: jx, lineId: cut.cand?.line.id ?? `off${jx}` });
      }
      boards.push({ course: k, a: [s, y], b: [xb, y], border: false });
    }
    prev = here;
  }

  // Border courses: runs along every edge, mitred at the corners, outermost course first.
  for (let i = 0; i < nBorder; i++) {
    const course = -(i + 1);
    const centre = insetRing(ring, i * pitch + bw / 2);
    for (let j = 0; j < ring.length; j++) {
      const e = ctx.edges[j];
      const a = centre[j];
      const b = centre[(j + 1) % ring.length];
      const L = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if ((b[0] - a[0]) * e.ux + (b[1] - a[1]) * e.uy <= 1) continue;
      // Where the deck is narrower than its border courses the offset folds over: leave it out.
      if (!pointInRing(a, ring) || !pointInRing(b, ring)) continue;
      const ux = (b[0] - a[0]) / L;
      const uy = (b[1] - a[1]) / L;
      // Mitred ends are longer on the outside: keep a board width in hand.
      const runStock = Math.max(stock - bw, stock / 2);
      const cands: Candidate[] = [];
      if (e.kind !== 'parallel') {
        for (const l of lines) {
          const tl = (l.x - a[0]) / ux;
          const yl = a[1] + tl * uy;
          if (tl <= 0 || tl >= L || yl < l.y0 || yl > l.y1) continue;
          const side = ux > 0 ? 1 : -1;
          cands.push({ t: tl + w / 2 / Math.abs(ux), line: l, side });
        }
      }
      let cuts: { t: number; cand: Candidate | null }[];
      if (e.kind === 'parallel') {
        // Along an edge joist every joint bears on the triple: divide evenly.
        const n = Math.max(1, Math.ceil(L / runStock - 1e-9));
        cuts = [];
        for (let k = 1; k < n; k++) cuts.push({ t: (L * k) / n, cand: null });
      } else {
        cuts = cutRun(L, runStock, endGap, minPiece, cands, [], 0);
      }
      let s = 0;
      const at = (t: number): Pt => [a[0] + ux * t, a[1] + uy * t];
      for (const cut of cuts) {
        boards.push({ course, a: at(s), b: at(cut.t - endGap / 2), border: true });
        s = cut.t + endGap / 2;
        joints.push({
          at: at(cut.t),
          course,
          line: cut.cand?.line ?? null,
          side: e.kind === 'parallel' ? 0 : (cut.cand?.side ?? 0),
          pair: null,
          alongEdge: e.kind === 'parallel',
        });
      }
      boards.push({ course, a: at(s), b: at(L), border: true });
    }
  }
  return { boards, joints, courses };
}

/**
 * Inserts a pair joist beside the joist under every butt joint, running support to support, so
 * each board end has its own bearing. Joints in neighbouring bays on the same side share one pair.
 */
export function insertPairs(
  ctx: FrameContext,
  joints: JointRaw[],
  lines: JoistLine[],
): JoistLine[] {
  const w = ctx.w;
  const wanted = new Map<
    string,
    { line: JoistLine; side: number; bays: Set<number>; at: { bay: number; y: number }[] }
  >();
  for (const j of joints) {
    const line = j.line;
    if (!line || j.side === 0) continue;
    // Bay k runs from stop k to stop k + 1, stops being [y0, ...supports, y1].
    const y = clampToLine(line, j.at[1]);
    let bay = 0;
    while (bay < line.supports.length && line.supports[bay] < y) bay++;
    const key = `${line.id}|${j.side}`;
    let entry = wanted.get(key);
    if (!entry) {
      entry = { line, side: j.side, bays: new Set(), at: [] };
      wanted.set(key, entry);
    }
    entry.bays.add(bay);
    entry.at.push({ bay, y });
  }
  const made: JoistLine[] = [];
  /** The joint positions each pair is there for, and the key of its joist and side. */
  const madeFor: { key: string; ys: number[] }[] = [];
  const byKey = new Map<string, JoistLine[]>();
  let n = lines.length;
  for (const [key, { line, side, bays, at }] of wanted) {
    const stops = [line.y0, ...line.supports, line.y1];
    const last = stops.length - 2;
    const sorted = [...bays].sort((a, b) => a - b);
    const runs: [number, number][] = [];
    for (const b of sorted) {
      const r = runs[runs.length - 1];
      if (r && r[1] === b - 1) r[1] = b;
      else runs.push([b, b]);
    }
    const x = line.x + side * w;
    const out: JoistLine[] = [];
    for (const [b0, b1] of runs) {
      let lo = stops[b0];
      let hi = stops[b1 + 1];
      // Where the run ends at a rim, the pair may reach as far as that rim's slope carries it over
      // to the pair's position; the clip below stops it at the rim it really meets there. (Only
      // lengthen: a rim nearly parallel to the joists, or a corner between the two, would pull the
      // end far back along the slope, off the joints it is there for.)
      if (b0 === 0) lo += Math.min(0, slopeShift(ctx, line.endEdge[0], x - line.x));
      if (b1 === last) hi += Math.max(0, slopeShift(ctx, line.endEdge[1], x - line.x));
      const pair: JoistLine = {
        id: `L${++n}`,
        x,
        y0: lo,
        y1: hi,
        kind: 'joist',
        role: 'butt-pair',
        ply: 2,
        endEdge: [b0 === 0 ? line.endEdge[0] : -1, b1 === last ? line.endEdge[1] : -1],
        supports: [],
        endSupported: [false, false],
        bearY: [lo, hi],
        pieces: [],
      };
      out.push(pair);
      made.push(pair);
      madeFor.push({ key, ys: at.filter((j) => j.bay >= b0 && j.bay <= b1).map((j) => j.y) });
    }
    byKey.set(key, out);
  }
  const half = ctx.design.board.widthMm / 2;
  // A pair beside a joist near the deck edge may poke past it: clip the pairs like any joist.
  const inside = verticalsInside(
    ctx.ring,
    made.map((p) => p.x),
  );
  // Where the pair's line leaves the deck and comes back (past a notch), keep each inside piece
  // that carries one of its joints: the longest piece may be in another arm of the deck.
  const extra: JoistLine[] = [];
  made.forEach((p, i) => {
    const keep: [number, number][] = [];
    for (const [a, b] of inside[i]) {
      const lo = Math.max(p.y0, a + trimAt(ctx, p.x, a, 1));
      const hi = Math.min(p.y1, b - trimAt(ctx, p.x, b, -1));
      if (hi - lo > 1 && madeFor[i].ys.some((y) => lo - half <= y && y <= hi + half)) {
        keep.push([lo, hi]);
      }
    }
    if (keep.length === 0) {
      p.y1 = p.y0; // nothing left: dropped below
      return;
    }
    [p.y0, p.y1] = keep[0];
    p.bearY = [p.y0, p.y1];
    for (const [lo, hi] of keep.slice(1)) {
      const more: JoistLine = { ...p, id: `L${++n}`, y0: lo, y1: hi, bearY: [lo, hi] };
      extra.push(more);
      byKey.get(madeFor[i].key)!.push(more);
    }
  });
  made.push(...extra);
  for (let i = made.length - 1; i >= 0; i--) if (made[i].y1 - made[i].y0 <= 1) made.splice(i, 1);
  for (const list of byKey.values()) {
    for (let i = list.length - 1; i >= 0; i--) if (list[i].y1 - list[i].y0 <= 1) list.splice(i, 1);
  }
  for (const j of joints) {
    if (!j.line || j.side === 0) continue;
    const y = clampToLine(j.line, j.at[1]);
    const found = byKey
      .get(`${j.line.id}|${j.side}`)
      ?.find((p) => p.y0 - half <= y && y <= p.y1 + half);
    j.pair = found ?? null;
  }
  return made;
}

function slopeShift(ctx: FrameContext, edgeIndex: number, dx: number): number {
  if (edgeIndex < 0) return 0;
  const e = ctx.edges[edgeIndex];
  if (Math.abs(e.ux) < 1e-9) return 0;
  return (dx * e.uy) / e.ux;
}

/** A rim of an edge that crosses the joists, as a band: centreline a -> b, half-width h. */
interface RimBand {
  id: string;
  corners: Pt[];
  yLo: number;
  yHi: number;
}

/** Bands covered by the rims of edges that cross the joists (edge joists are lines already). */
function rimBands(ctx: FrameContext): RimBand[] {
  const h = ctx.w / 2;
  const out: RimBand[] = [];
  for (const e of ctx.edges) {
    if (e.kind === 'parallel') continue;
    const nx = -e.uy * h;
    const ny = e.ux * h;
    const corners: Pt[] = [
      [e.rimA[0] - nx, e.rimA[1] - ny],
      [e.rimB[0] - nx, e.rimB[1] - ny],
      [e.rimB[0] + nx, e.rimB[1] + ny],
      [e.rimA[0] + nx, e.rimA[1] + ny],
    ];
    let yLo = Infinity;
    let yHi = -Infinity;
    for (const c of corners) {
      if (c[1] < yLo) yLo = c[1];
      if (c[1] > yHi) yHi = c[1];
    }
    out.push({ id: `R${e.index + 1}`, corners, yLo, yHi });
  }
  return out;
}

/** One gap along a course between neighbouring supports. */
export interface BoardGap {
  x: number;
  y: number;
  /** Clear gap + one joist width (mm). */
  span: number;
  /** Clear gap between the supports' faces (mm). */
  clear: number;
  left: string;
  right: string;
}

/**
 * Board spans along each course: the clear gap between neighbouring supports plus one joist width
 * (the centre-to-centre span for square crossings; measured along the board, so an angled support
 * gives centres / sin(angle)). Returns those longer than \`over\`. Lines must be sorted by x.
 */
export function boardSpans(
  ctx: FrameContext,
  courses: CourseRaw[],
  lines: JoistLine[],
  over: number,
): BoardGap[] {
  const w = ctx.w;
  const h = w / 2;
  const bands = rimBands(ctx);
  const out: BoardGap[] = [];
  const rimFeet: { a: number; b: number; id: string }[] = [];
  for (const c of courses) {
    rimFeet.length = 0;
    for (const r of bands) {
      if (c.y < r.yLo || c.y > r.yHi) continue;
      const ivs = scanRing(r.corners, c.y);
      for (const [a, b] of ivs) rimFeet.push({ a, b, id: r.id });
    }
    rimFeet.sort((p, q) => p.a - q.a);
    let reach = -Infinity;
    let reachId = '';
    let ri = 0;
    let li = 0;
    // Merge the two x-sorted streams: joist footprints and rim footprints.
    for (;;) {
      while (li < lines.length && !(lines[li].y0 <= c.y && c.y <= lines[li].y1)) li++;
      const lineA = li < lines.length ? lines[li].x - h : Infinity;
      const rimA = ri < rimFeet.length ? rimFeet[ri].a : Infinity;
      if (lineA === Infinity && rimA === Infinity) break;
      let a: number;
      let b: number;
      let id: string;
      if (lineA <= rimA) {
        a = lineA;
        b = lines[li].x + h;
        id = lines[li].id;
        li++;
      } else {
        a = rimA;
        b = rimFeet[ri].b;
        id = rimFeet[ri].id;
        ri++;
      }
      if (b < c.xa || a > c.xb) continue;
      if (reach > -Infinity && a > reach) {
        const span = a - reach + w;
        if (span > over) {
          out.push({
            x: (a + reach) / 2,
            y: c.y,
            span,
            clear: a - reach,
            left: reachId,
            right: id,
          });
        }
      }
      if (b > reach) {
        reach = b;
        reachId = id;
      }
    }
  }
  return out;
}
