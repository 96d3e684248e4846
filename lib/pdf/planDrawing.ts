// Draws the frame plan to scale on a jspdf page: members, supports, steps, flags and dimension chains.
import type { jsPDF } from 'jspdf';
import type { DesignDocument } from '@/engine/schema';
import type { FramePlan, Member } from '@/engine/types';
import type { UnitSystem } from '@/lib/units';
import { numberedChecks, orderedSupportRows } from './schedules';
import { dimText, pdfText } from './text';

export type V2 = [number, number];
/** A box; on paper y grows downwards, in the world y grows upwards. */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Unit vectors in world mm: j along the joists, p across them (the board direction). */
export interface FrameAxes {
  j: V2;
  p: V2;
}

/** The plan's axes, with j turned to point up (or right) so chains land on predictable sides. */
export function frameAxes(design: DesignDocument): FrameAxes {
  const a = (design.boardAngleDeg * Math.PI) / 180;
  const clean = (v: number) => (Math.abs(v) < 1e-9 ? 0 : v);
  let j: V2 = [clean(-Math.sin(a)), clean(Math.cos(a))];
  if (j[1] < 0 || (j[1] === 0 && j[0] < 0)) j = [-j[0] || 0, -j[1] || 0];
  return { j, p: [j[1], -j[0] || 0] };
}

const dot = (a: V2, b: V2) => a[0] * b[0] + a[1] * b[1];
const neg = (a: V2): V2 => [-a[0], -a[1]];

/** A dimension chain: ticks at positions measured along dir, drawn on the normal side of the plan. */
export interface Chain {
  kind: 'overall' | 'joists' | 'supports' | 'noggins' | 'step';
  dir: V2;
  normal: V2;
  positions: number[];
  /** Small marks beside ticks (index -> text), e.g. "x2" for a paired joist. */
  marks?: Map<number, string>;
  /** Paper offset from the geometry, set by placeChains. */
  offset?: number;
}

/** The plan's geometry points: the outline and the step footprints (what dimensions sit outside). */
export function geometryPoints(plan: FramePlan): V2[] {
  return [...plan.outline, ...plan.steps.flatMap((s) => s.outline)] as V2[];
}

interface ClusterItem {
  at: number;
  main: boolean;
  member?: Member;
}

function cluster(values: ClusterItem[], tol: number) {
  const sorted = [...values].sort((a, b) => a.at - b.at);
  const out: { at: number; items: ClusterItem[] }[] = [];
  let group: ClusterItem[] = [];
  const flush = () => {
    if (!group.length) return;
    const mains = group.filter((g) => g.main);
    const use = mains.length ? mains : group;
    out.push({ at: use.reduce((s, g) => s + g.at, 0) / use.length, items: group });
    group = [];
  };
  for (const v of sorted) {
    if (group.length && v.at - group[group.length - 1].at > tol) flush();
    group.push(v);
  }
  flush();
  return out;
}

/** Joists standing side by side in one group: the most pieces over any point along the joists. */
function piecesSideBySide(members: Member[], j: V2): number {
  let best = 0;
  for (const m of members) {
    const t = dot(mid(m), j);
    const sum = members.filter((o) => {
      const a = dot(o.a as V2, j);
      const b = dot(o.b as V2, j);
      return t >= Math.min(a, b) - 1 && t <= Math.max(a, b) + 1;
    }).length;
    best = Math.max(best, sum);
  }
  return best;
}

const mid = (m: Member): V2 => [(m.a[0] + m.b[0]) / 2, (m.a[1] + m.b[1]) / 2];

function dedupe(values: number[], tol = 1): number[] {
  const s = [...values].sort((a, b) => a - b);
  return s.filter((v, i) => i === 0 || v - s[i - 1] > tol);
}

/** The dimension chains of a plan: overall sizes, joist centres, support rows, noggin rows, steps. */
export function planChains(plan: FramePlan, design: DesignDocument, axes: FrameAxes): Chain[] {
  const { j, p } = axes;
  const outline = plan.outline as V2[];
  const along = (d: V2) => outline.map((pt) => dot(pt, d));
  const chains: Chain[] = [];

  // Steps first: they sit nearest the plan on their side.
  for (const step of plan.steps) {
    const pts = step.outline as V2[];
    if (pts.length < 2) continue;
    // The flight's top edge is the one nearest the deck: take the first edge and its direction.
    const e0 = pts[0];
    const e1 = pts[1];
    const l = Math.hypot(e1[0] - e0[0], e1[1] - e0[1]);
    if (l < 1) continue;
    const dir: V2 = [(e1[0] - e0[0]) / l, (e1[1] - e0[1]) / l];
    const centre = pts.reduce<V2>(
      (s, q) => [s[0] + q[0] / pts.length, s[1] + q[1] / pts.length],
      [0, 0],
    );
    let normal: V2 = [dir[1], -dir[0]];
    if (dot(normal, centre) < dot(normal, e0)) normal = neg(normal);
    const extent = along(dir);
    chains.push({
      kind: 'step',
      dir,
      normal,
      positions: dedupe([Math.min(...extent), dot(e0, dir), dot(e1, dir), Math.max(...extent)]),
    });
  }

  // Every joist or rim running with the joists (edge rims included), outside the step frames.
  const joists = plan.members.filter((m) => {
    if ((m.kind !== 'joist' && m.kind !== 'rim') || m.step !== undefined || m.role === 'stair')
      return false;
    const l = Math.hypot(m.b[0] - m.a[0], m.b[1] - m.a[1]);
    return l > 0 && Math.abs(((m.b[0] - m.a[0]) * j[0] + (m.b[1] - m.a[1]) * j[1]) / l) > 0.99;
  });
  // Pieces closer than about two joist widths read as one group on the chain ("x2", "x3").
  const jc = cluster(
    joists.map((m) => ({ at: dot(mid(m), p), main: true, member: m })),
    2 * design.joist.widthMm + 10,
  ).map((c) => ({
    at: c.at,
    weight: piecesSideBySide(
      c.items.map((i) => i.member as Member),
      j,
    ),
  }));
  if (jc.length) {
    const ext = along(p);
    const positions = dedupe([Math.min(...ext), ...jc.map((c) => c.at), Math.max(...ext)]);
    const marks = new Map<number, string>();
    for (const c of jc) {
      if (c.weight < 2) continue;
      const i = positions.findIndex((v) => Math.abs(v - c.at) <= 1);
      if (i >= 0) marks.set(i, `x${c.weight}`);
    }
    chains.push({ kind: 'joists', dir: p, normal: j, positions, marks });
  }

  const ext = along(j);
  const datum = Math.min(...ext);
  if (plan.supportRows.length) {
    const rows = orderedSupportRows(plan, j).map((r) => r.atMm + datum);
    chains.push({
      kind: 'supports',
      dir: j,
      normal: p,
      positions: dedupe([datum, ...rows, Math.max(...ext)]),
    });
  }
  const noggins = plan.members.filter((m) => m.kind === 'noggin' && m.step === undefined);
  if (noggins.length) {
    const rows = cluster(
      noggins.map((m) => ({ at: dot(mid(m), j), main: true })),
      60,
    ).map((c) => c.at);
    chains.push({
      kind: 'noggins',
      dir: j,
      normal: neg(p),
      positions: dedupe([datum, ...rows, Math.max(...ext)]),
    });
  }
  const xs = outline.map((q) => q[0]);
  const ys = outline.map((q) => q[1]);
  chains.push({
    kind: 'overall',
    dir: [1, 0],
    normal: [0, -1],
    positions: [Math.min(...xs), Math.max(...xs)],
  });
  chains.push({
    kind: 'overall',
    dir: [0, 1],
    normal: [-1, 0],
    positions: [Math.min(...ys), Math.max(...ys)],
  });
  placeChains(chains);
  return chains;
}

/** Spacing between stacked chains on one side, and from the geometry to the first, in paper mm. */
export const CHAIN_GAP = 7;
export const CHAIN_FIRST = 6;

/** Stacks chains that share a side so none overlaps another. */
function placeChains(chains: Chain[]) {
  const sides: { n: V2; count: number }[] = [];
  for (const c of chains) {
    let side = sides.find((s) => dot(s.n, c.normal) > 0.99);
    if (!side) {
      side = { n: c.normal, count: 0 };
      sides.push(side);
    }
    c.offset = CHAIN_FIRST + side.count * CHAIN_GAP;
    side.count += 1;
  }
}

/** World to paper mapping for one view of the plan. */
export interface View {
  /** Scale denominator: 50 means 1:50. */
  scale: number;
  /** Paper position of world (0, 0). */
  cx: number;
  cy: number;
  /** The world window shown (all of the plan, or one part of it). */
  window: Box;
  /** Whether this view shows only part of the plan. */
  part: boolean;
}

/** Paper position of a world point. */
export function toPaper(v: View, pt: V2): V2 {
  return [v.cx + pt[0] / v.scale, v.cy - pt[1] / v.scale];
}

/** Paper bounding box of the geometry and the chains, for a view with cx = cy = 0. */
export function paperExtent(points: V2[], chains: Chain[], scale: number): Box {
  const v: View = { scale, cx: 0, cy: 0, window: { x0: 0, y0: 0, x1: 0, y1: 0 }, part: false };
  const box: Box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  const add = (q: V2) => {
    box.x0 = Math.min(box.x0, q[0]);
    box.y0 = Math.min(box.y0, q[1]);
    box.x1 = Math.max(box.x1, q[0]);
    box.y1 = Math.max(box.y1, q[1]);
  };
  points.forEach((q) => add(toPaper(v, q)));
  for (const c of chains) {
    const line = chainLine(v, c, points);
    if (!line) continue;
    const np: V2 = [c.normal[0], -c.normal[1]];
    // Text sits up to 4.5 mm beyond the chain line; labels hanging off its ends add a little more.
    for (const q of [line.a, line.b]) {
      add([q[0] + np[0] * 4.5, q[1] + np[1] * 4.5]);
      const d: V2 = [line.b[0] - line.a[0], line.b[1] - line.a[1]];
      const dl = Math.hypot(d[0], d[1]) || 1;
      add([
        q[0] + (d[0] / dl) * (q === line.a ? -6 : 6),
        q[1] + (d[1] / dl) * (q === line.a ? -6 : 6),
      ]);
    }
  }
  return box;
}

function chainLine(
  v: View,
  c: Chain,
  points: V2[],
  clip?: { lo: number; hi: number; base: number },
) {
  let positions = c.positions;
  let base = Math.max(...points.map((q) => dot(q, c.normal)));
  if (clip) {
    positions = positions.filter((t) => t >= clip.lo - 1 && t <= clip.hi + 1);
    base = Math.min(base, clip.base);
  }
  if (positions.length < 2) return null;
  const np: V2 = [c.normal[0], -c.normal[1]];
  const off = c.offset ?? CHAIN_FIRST;
  const at = (t: number): V2 => {
    const w: V2 = [t * c.dir[0] + base * c.normal[0], t * c.dir[1] + base * c.normal[1]];
    const q = toPaper(v, w);
    return [q[0] + np[0] * off, q[1] + np[1] * off];
  };
  return { positions, at, a: at(positions[0]), b: at(positions[positions.length - 1]), np };
}

/** Style settings that depend on the paper size. */
export interface DrawStyle {
  dimFont: number;
  labelFont: number;
}

/** Writes text centred on a point along a paper direction, kept the right way up. */
function textAlong(
  doc: jsPDF,
  s: string,
  at: V2,
  dir: V2,
  side: V2,
  gap: number,
  align: 'center' | 'left' | 'right' = 'center',
) {
  let u = dir;
  let angle = (Math.atan2(-u[1], u[0]) * 180) / Math.PI;
  if (angle > 90.5 || angle <= -89.5) {
    u = neg(u);
    angle = (Math.atan2(-u[1], u[0]) * 180) / Math.PI;
    if (align !== 'center') align = align === 'left' ? 'right' : 'left';
  }
  const up: V2 = [u[1], -u[0]];
  const w = doc.getTextWidth(s);
  const h = (doc.getFontSize() * 25.4) / 72;
  const capH = h * 0.72;
  // Baseline sits gap beyond the line on the requested side.
  const toSide = dot(up, side) >= 0 ? gap : -(gap + capH);
  const shift = align === 'center' ? -w / 2 : align === 'right' ? -w : 0;
  const x = at[0] + up[0] * toSide + u[0] * shift;
  const y = at[1] + up[1] * toSide + u[1] * shift;
  doc.text(s, x, y, { angle: Math.abs(angle) < 0.01 ? 0 : angle });
}

/** Draws one dimension chain: line, ticks, extension stubs and the gap sizes. */
export function drawChain(
  doc: jsPDF,
  v: View,
  c: Chain,
  points: V2[],
  units: UnitSystem,
  style: DrawStyle,
  clip?: { lo: number; hi: number; base: number },
) {
  const line = chainLine(v, c, points, clip);
  if (!line) return;
  const { positions, at, np } = line;
  const d: V2 = [line.b[0] - line.a[0], line.b[1] - line.a[1]];
  const dl = Math.hypot(d[0], d[1]);
  if (dl < 0.5) return;
  const u: V2 = [d[0] / dl, d[1] / dl];
  doc.setDrawColor(0);
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.15);
  doc.line(
    line.a[0] - u[0] * 1.5,
    line.a[1] - u[1] * 1.5,
    line.b[0] + u[0] * 1.5,
    line.b[1] + u[1] * 1.5,
  );
  const ticks = positions.map(at);
  for (const t of ticks) {
    doc.setLineWidth(0.12);
    doc.line(t[0] - np[0] * 2.2, t[1] - np[1] * 2.2, t[0] + np[0] * 1, t[1] + np[1] * 1);
    doc.setLineWidth(0.3);
    const sl: V2 = [(u[0] + np[0]) * 0.6, (u[1] + np[1]) * 0.6];
    doc.line(t[0] - sl[0], t[1] - sl[1], t[0] + sl[0], t[1] + sl[1]);
  }
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(style.dimFont);
  doc.setTextColor(0);
  if (c.kind === 'overall' || positions.length === 2) {
    const total = positions[positions.length - 1] - positions[0];
    doc.setFont('helvetica', 'bold');
    textAlong(
      doc,
      dimText(total, units),
      [(line.a[0] + line.b[0]) / 2, (line.a[1] + line.b[1]) / 2],
      u,
      np,
      0.8,
    );
    doc.setFont('helvetica', 'normal');
    return;
  }
  const gaps = positions.slice(1).map((t, i) => t - positions[i]);
  // Runs of equal gaps (to the mm) that would not fit one label each get "n @ size".
  let i = 0;
  let raised = false;
  while (i < gaps.length) {
    let k = i + 1;
    while (k < gaps.length && Math.abs(gaps[k] - gaps[i]) < 0.5) k++;
    const runLen = k - i;
    const paperGap = gaps[i] / v.scale;
    const single = dimText(gaps[i], units);
    const fitsSingle = doc.getTextWidth(single) + 0.8 < paperGap;
    if (runLen >= 2 && !fitsSingle) {
      const label = `${runLen} @ ${single}`;
      const mid0 = ticks[i];
      const mid1 = ticks[k];
      const centre: V2 = [(mid0[0] + mid1[0]) / 2, (mid0[1] + mid1[1]) / 2];
      textAlong(doc, label, centre, u, np, 0.8);
      i = k;
      continue;
    }
    for (let g = i; g < k; g++) {
      const s = dimText(gaps[g], units);
      const centre: V2 = [(ticks[g][0] + ticks[g + 1][0]) / 2, (ticks[g][1] + ticks[g + 1][1]) / 2];
      if (doc.getTextWidth(s) + 0.8 < gaps[g] / v.scale) {
        textAlong(doc, s, centre, u, np, 0.8);
        raised = false;
      } else if (g === 0) {
        textAlong(
          doc,
          s,
          [ticks[0][0] - u[0] * 1.2, ticks[0][1] - u[1] * 1.2],
          u,
          np,
          0.8,
          'right',
        );
      } else if (g === gaps.length - 1) {
        textAlong(
          doc,
          s,
          [ticks[g + 1][0] + u[0] * 1.2, ticks[g + 1][1] + u[1] * 1.2],
          u,
          np,
          0.8,
          'left',
        );
      } else {
        // Too tight: lift alternate labels onto a second row.
        textAlong(doc, s, centre, u, np, raised ? 3.2 : 0.8);
        raised = !raised;
      }
    }
    i = k;
  }
  if (c.marks?.size) {
    doc.setFontSize(style.dimFont - 1);
    doc.setTextColor(30, 60, 140);
    for (const [idx, text] of c.marks) {
      if (idx >= ticks.length) continue;
      textAlong(doc, text, ticks[idx], u, neg(np), 2.6);
    }
    doc.setTextColor(0);
  }
}

/** Draws a closed polygon given in paper mm. */
export function polygon(doc: jsPDF, pts: V2[], style: 'S' | 'F' | 'FD') {
  if (pts.length < 2) return;
  const deltas = pts.slice(1).map((q, i) => [q[0] - pts[i][0], q[1] - pts[i][1]]);
  doc.lines(deltas, pts[0][0], pts[0][1], [1, 1], style, true);
}

function band(v: View, a: V2, b: V2, widthMm: number, minPaper: number): V2[] {
  const l = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  const half = Math.max(widthMm / v.scale, minPaper) / 2;
  const pa = toPaper(v, a);
  const pb = toPaper(v, b);
  const n: V2 = [-(pb[1] - pa[1]) / (l / v.scale || 1), (pb[0] - pa[0]) / (l / v.scale || 1)];
  return [
    [pa[0] + n[0] * half, pa[1] + n[1] * half],
    [pb[0] + n[0] * half, pb[1] + n[1] * half],
    [pb[0] - n[0] * half, pb[1] - n[1] * half],
    [pa[0] - n[0] * half, pa[1] - n[1] * half],
  ];
}

/** Line styles of the plan, shared with the legend so the two always agree. */
export const STYLES = {
  joist: { width: 0.3, color: [0, 0, 0] as const },
  pair: { width: 0.3, color: [20, 70, 170] as const },
  triple: { width: 0.3, color: [140, 70, 20] as const },
  rim: { width: 0.55, color: [0, 0, 0] as const },
  noggin: { width: 0.35, color: [70, 70, 70] as const, dash: [0.9, 0.6] },
  outline: { width: 0.2, color: [110, 110, 110] as const },
} as const;

/**
 * Draws one joist piece in its ply's style: black for single joists, blue for pieces of a pair,
 * brown for pieces of a triple. With copies > 1 (legend samples) draws that many side by side.
 */
export function drawJoistLine(doc: jsPDF, pa: V2, pb: V2, ply: number, copies = 1) {
  const l = Math.hypot(pb[0] - pa[0], pb[1] - pa[1]) || 1;
  const n: V2 = [-(pb[1] - pa[1]) / l, (pb[0] - pa[0]) / l];
  const s = ply >= 3 ? STYLES.triple : ply === 2 ? STYLES.pair : STYLES.joist;
  doc.setLineDashPattern([], 0);
  doc.setDrawColor(s.color[0], s.color[1], s.color[2]);
  doc.setLineWidth(s.width);
  for (let k = 0; k < copies; k++) {
    const o = (k - (copies - 1) / 2) * 0.75;
    doc.line(pa[0] + n[0] * o, pa[1] + n[1] * o, pb[0] + n[0] * o, pb[1] + n[1] * o);
  }
}

/** Draws a noggin as a short dashed bar. */
export function drawNogginLine(doc: jsPDF, pa: V2, pb: V2) {
  doc.setDrawColor(...STYLES.noggin.color);
  doc.setLineWidth(STYLES.noggin.width);
  doc.setLineDashPattern([...STYLES.noggin.dash], 0);
  doc.line(pa[0], pa[1], pb[0], pb[1]);
  doc.setLineDashPattern([], 0);
}

/** Draws a support row band in paper mm. */
export function drawSupportBand(doc: jsPDF, pts: V2[], kind: 'blocks' | 'beam' | 'wall') {
  const fill = kind === 'blocks' ? 222 : kind === 'beam' ? 175 : 130;
  doc.setFillColor(fill, fill, fill);
  doc.setDrawColor(120);
  doc.setLineWidth(0.15);
  doc.setLineDashPattern(kind === 'blocks' ? [1.2, 0.6] : [], 0);
  polygon(doc, pts, 'FD');
  doc.setLineDashPattern([], 0);
}

/** Draws a pad (block laid flat) centred on a paper point. */
export function drawPad(doc: jsPDF, c: V2, w: number, h: number, along: V2) {
  const u = along;
  const n: V2 = [-u[1], u[0]];
  const pts: V2[] = [
    [c[0] + (u[0] * w) / 2 + (n[0] * h) / 2, c[1] + (u[1] * w) / 2 + (n[1] * h) / 2],
    [c[0] - (u[0] * w) / 2 + (n[0] * h) / 2, c[1] - (u[1] * w) / 2 + (n[1] * h) / 2],
    [c[0] - (u[0] * w) / 2 - (n[0] * h) / 2, c[1] - (u[1] * w) / 2 - (n[1] * h) / 2],
    [c[0] + (u[0] * w) / 2 - (n[0] * h) / 2, c[1] + (u[1] * w) / 2 - (n[1] * h) / 2],
  ];
  doc.setFillColor(165, 165, 165);
  doc.setDrawColor(0);
  doc.setLineWidth(0.15);
  doc.setLineDashPattern([], 0);
  polygon(doc, pts, 'FD');
  doc.line(pts[0][0], pts[0][1], pts[2][0], pts[2][1]);
  doc.line(pts[1][0], pts[1][1], pts[3][0], pts[3][1]);
}

/** Draws a post: a solid square inside its concrete hole. */
export function drawPost(doc: jsPDF, c: V2, side: number) {
  doc.setDrawColor(0);
  doc.setLineWidth(0.2);
  doc.setLineDashPattern([], 0);
  doc.setFillColor(255, 255, 255);
  doc.circle(c[0], c[1], side * 0.95, 'FD');
  doc.setFillColor(0, 0, 0);
  doc.rect(c[0] - side / 2, c[1] - side / 2, side, side, 'F');
}

/** Draws a numbered flag marker: filled red for errors, outlined orange for warnings. */
export function drawFlagMarker(
  doc: jsPDF,
  c: V2,
  n: number,
  severity: 'error' | 'warning' | 'info',
) {
  const r = 1.9;
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.3);
  if (severity === 'error') {
    doc.setFillColor(200, 30, 30);
    doc.setDrawColor(200, 30, 30);
  } else if (severity === 'warning') {
    doc.setFillColor(255, 255, 255);
    doc.setDrawColor(220, 120, 0);
  } else {
    doc.setFillColor(255, 255, 255);
    doc.setDrawColor(60, 60, 200);
  }
  doc.circle(c[0], c[1], r, 'FD');
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(6);
  if (severity === 'error') doc.setTextColor(255, 255, 255);
  else doc.setTextColor(0);
  const s = String(n);
  doc.text(s, c[0] - doc.getTextWidth(s) / 2, c[1] + 0.75);
  doc.setTextColor(0);
  doc.setFont('helvetica', 'normal');
}

/** The part of segment ab inside the box (Liang-Barsky), or null when it misses. */
function clipSegment(a: V2, b: V2, box: Box): [V2, V2] | null {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const checks: [number, number][] = [
    [-dx, a[0] - box.x0],
    [dx, box.x1 - a[0]],
    [-dy, a[1] - box.y0],
    [dy, box.y1 - a[1]],
  ];
  for (const [p, q] of checks) {
    if (p === 0) {
      if (q < 0) return null;
    } else {
      const r = q / p;
      if (p < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 > t1) return null;
    }
  }
  return [
    [a[0] + dx * t0, a[1] + dy * t0],
    [a[0] + dx * t1, a[1] + dy * t1],
  ];
}

function planSegments(plan: FramePlan): [V2, V2][] {
  const segs: [V2, V2][] = plan.members.map((m) => [m.a as V2, m.b as V2]);
  const rings = [plan.outline, ...plan.steps.map((s) => s.outline)] as V2[][];
  for (const ring of rings) ring.forEach((q, i) => segs.push([q, ring[(i + 1) % ring.length]]));
  return segs;
}

/** Whether any of the plan's members, outline or steps falls inside a world box. */
export function planTouches(plan: FramePlan, box: Box): boolean {
  return planSegments(plan).some(([a, b]) => clipSegment(a, b, box) !== null);
}

/** The bounding box of what the plan draws inside a world box, or null when it draws nothing there. */
export function planBoundsWithin(plan: FramePlan, box: Box): Box | null {
  const out: Box = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  for (const [a, b] of planSegments(plan)) {
    const c = clipSegment(a, b, box);
    if (!c) continue;
    for (const q of c) {
      out.x0 = Math.min(out.x0, q[0]);
      out.y0 = Math.min(out.y0, q[1]);
      out.x1 = Math.max(out.x1, q[0]);
      out.y1 = Math.max(out.y1, q[1]);
    }
  }
  return Number.isFinite(out.x0) ? out : null;
}

export interface DrawPlanOptions {
  plan: FramePlan;
  design: DesignDocument;
  units: UnitSystem;
  view: View;
  axes: FrameAxes;
  chains: Chain[];
  style: DrawStyle;
  /** Skip fine detail (joins, row labels) on small-scale overview sheets. */
  overview?: boolean;
}

/** Draws the plan into the view: supports, members, steps, markers, then the dimension chains. */
export function drawPlan(doc: jsPDF, o: DrawPlanOptions): void {
  const { plan, design, view: v, axes, units, style } = o;
  const P = (q: V2) => toPaper(v, q);
  const points = geometryPoints(plan);
  const win = v.window;
  const pw = {
    x0: v.cx + win.x0 / v.scale,
    x1: v.cx + win.x1 / v.scale,
    y0: v.cy - win.y1 / v.scale,
    y1: v.cy - win.y0 / v.scale,
  };
  if (v.part) {
    doc.saveGraphicsState();
    doc.rect(pw.x0 - 0.5, pw.y0 - 0.5, pw.x1 - pw.x0 + 1, pw.y1 - pw.y0 + 1, null);
    doc.clip();
    doc.discardPath();
  }
  // Deck area, lightly shaded.
  doc.setFillColor(246, 244, 238);
  doc.setDrawColor(...STYLES.outline.color);
  doc.setLineWidth(STYLES.outline.width);
  doc.setLineDashPattern([], 0);
  polygon(doc, (plan.outline as V2[]).map(P), 'FD');

  for (const r of plan.supportRows)
    drawSupportBand(doc, band(v, r.a as V2, r.b as V2, 215, 1.0), r.kind);

  // Steps: footprint and tread lines.
  plan.steps.forEach((s) => {
    const pts = (s.outline as V2[]).map(P);
    if (pts.length < 3) return;
    doc.setFillColor(250, 250, 250);
    doc.setDrawColor(0);
    doc.setLineWidth(0.3);
    polygon(doc, pts, 'FD');
    if (pts.length === 4 && s.count > 1) {
      doc.setLineWidth(0.18);
      for (let k = 1; k < s.count; k++) {
        const t = k / s.count;
        const a: V2 = [
          pts[0][0] + (pts[3][0] - pts[0][0]) * t,
          pts[0][1] + (pts[3][1] - pts[0][1]) * t,
        ];
        const b: V2 = [
          pts[1][0] + (pts[2][0] - pts[1][0]) * t,
          pts[1][1] + (pts[2][1] - pts[1][1]) * t,
        ];
        doc.line(a[0], a[1], b[0], b[1]);
      }
    }
  });

  // Members: noggins, then joists, then rims on top; posts and pads last.
  // Part sheets skip what lies wholly outside their window (a large deck has thousands of pieces).
  const m0 = v.part ? 300 : Infinity;
  const members = plan.members.filter(
    (m) =>
      !v.part ||
      !(
        Math.max(m.a[0], m.b[0]) < win.x0 - m0 ||
        Math.min(m.a[0], m.b[0]) > win.x1 + m0 ||
        Math.max(m.a[1], m.b[1]) < win.y0 - m0 ||
        Math.min(m.a[1], m.b[1]) > win.y1 + m0
      ),
  );
  for (const m of members) if (m.kind === 'noggin') drawNogginLine(doc, P(m.a as V2), P(m.b as V2));
  for (const m of members)
    if (m.kind === 'joist') drawJoistLine(doc, P(m.a as V2), P(m.b as V2), m.ply);
  for (const m of members)
    if (m.kind === 'rim') {
      if (m.ply > 1) drawJoistLine(doc, P(m.a as V2), P(m.b as V2), m.ply);
      else {
        doc.setDrawColor(...STYLES.rim.color);
        doc.setLineWidth(STYLES.rim.width);
        doc.setLineDashPattern([], 0);
        const a = P(m.a as V2);
        const b = P(m.b as V2);
        doc.line(a[0], a[1], b[0], b[1]);
      }
    }
  const jp: V2 = [axes.j[0], -axes.j[1]];
  for (const m of members) {
    if (m.kind === 'pad')
      drawPad(doc, P(m.a as V2), Math.max(440 / v.scale, 2), Math.max(215 / v.scale, 1.1), jp);
    if (m.kind === 'post') drawPost(doc, P(m.a as V2), Math.max(100 / v.scale, 1.1));
  }
  if (!o.overview) {
    doc.setLineWidth(0.2);
    for (const jn of plan.joins) {
      const c = P(jn.at as V2);
      doc.setDrawColor(jn.onSupport ? 0 : 200, jn.onSupport ? 0 : 30, jn.onSupport ? 0 : 30);
      doc.setFillColor(255, 255, 255);
      doc.circle(c[0], c[1], 0.55, 'FD');
    }
    // Support row names at the row's start, matching the footing schedule.
    doc.setFont('helvetica', 'normal');
    doc.setFontSize(style.dimFont - 0.5);
    doc.setTextColor(80);
    orderedSupportRows(plan, axes.j).forEach(({ row: r }, i) => {
      const a = P(r.a as V2);
      const b = P(r.b as V2);
      const start = a[0] <= b[0] ? a : b;
      const end = start === a ? b : a;
      const d = Math.hypot(end[0] - start[0], end[1] - start[1]) || 1;
      const u: V2 = [(end[0] - start[0]) / d, (end[1] - start[1]) / d];
      textAlong(
        doc,
        `Row ${i + 1}`,
        [start[0] + u[0] * 2, start[1] + u[1] * 2],
        u,
        [0, -1],
        1.2,
        'left',
      );
    });
    doc.setTextColor(0);
  }
  // Step labels.
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(style.dimFont);
  plan.steps.forEach((s, i) => {
    const pts = (s.outline as V2[]).map(P);
    if (!pts.length) return;
    const c: V2 = [
      pts.reduce((t, q) => t + q[0], 0) / pts.length,
      pts.reduce((t, q) => t + q[1], 0) / pts.length,
    ];
    const l1 = pdfText(`Step ${i + 1}: ${s.count} tread${s.count === 1 ? '' : 's'}`);
    const l2 = pdfText(`rise ${dimText(s.riseMm, units)}, going ${dimText(s.goingMm, units)}`);
    const bw = Math.max(...pts.map((q) => q[0])) - Math.min(...pts.map((q) => q[0]));
    const bh = Math.max(...pts.map((q) => q[1])) - Math.min(...pts.map((q) => q[1]));
    const w = Math.max(doc.getTextWidth(l1), doc.getTextWidth(l2)) + 1.6;
    doc.setFillColor(255, 255, 255);
    if (w <= bw && bh >= 6) {
      doc.rect(c[0] - w / 2, c[1] - 3.1, w, 5.4, 'F');
      doc.text(l1, c[0] - doc.getTextWidth(l1) / 2, c[1] - 0.6);
      doc.text(l2, c[0] - doc.getTextWidth(l2) / 2, c[1] + 1.8);
    } else {
      // Too small on this sheet for the full label: a short mark; the notes give the rest.
      const short = `S${i + 1}`;
      const sw = doc.getTextWidth(short) + 1;
      doc.rect(c[0] - sw / 2, c[1] - 1.6, sw, 2.6, 'F');
      doc.text(short, c[0] - doc.getTextWidth(short) / 2, c[1] + 0.6);
    }
  });
  // Edge lengths where the outline is more than a square-on rectangle (the chains give those).
  const ring = plan.outline as V2[];
  const squareRect =
    ring.length === 4 &&
    ring.every((q, i) => {
      const r = ring[(i + 1) % 4];
      return Math.abs(q[0] - r[0]) < 0.5 || Math.abs(q[1] - r[1]) < 0.5;
    });
  if (!squareRect && ring.length >= 3) {
    const ob = {
      x0: Math.min(...ring.map((q) => q[0])),
      x1: Math.max(...ring.map((q) => q[0])),
      y0: Math.min(...ring.map((q) => q[1])),
      y1: Math.max(...ring.map((q) => q[1])),
    };
    const ccw =
      ring.reduce((a, q, i) => {
        const r = ring[(i + 1) % ring.length];
        return a + q[0] * r[1] - r[0] * q[1];
      }, 0) > 0;
    doc.setFont('helvetica', 'bold');
    doc.setFontSize(style.dimFont);
    doc.setTextColor(40, 40, 40);
    ring.forEach((q, i) => {
      const r = ring[(i + 1) % ring.length];
      const l = Math.hypot(r[0] - q[0], r[1] - q[1]);
      if (l < 1) return;
      // An edge spanning the whole width or height is already on an overall chain.
      const full =
        (Math.abs(l - (ob.x1 - ob.x0)) < 1 && Math.abs(q[1] - r[1]) < 0.5) ||
        (Math.abs(l - (ob.y1 - ob.y0)) < 1 && Math.abs(q[0] - r[0]) < 0.5);
      if (full) return;
      // A third of the way along, clear of the flag markers the checks put at edge midpoints.
      const m: V2 = [q[0] + (r[0] - q[0]) * 0.33, q[1] + (r[1] - q[1]) * 0.33];
      if (m[0] < win.x0 - 1 || m[0] > win.x1 + 1 || m[1] < win.y0 - 1 || m[1] > win.y1 + 1) return;
      const outward: V2 = ccw
        ? [(r[1] - q[1]) / l, -(r[0] - q[0]) / l]
        : [-(r[1] - q[1]) / l, (r[0] - q[0]) / l];
      const a = P(q);
      const b = P(r);
      const d = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
      textAlong(
        doc,
        dimText(l, units),
        P(m),
        [(b[0] - a[0]) / d, (b[1] - a[1]) / d],
        [outward[0], -outward[1]],
        1.6,
      );
    });
    doc.setTextColor(0);
    doc.setFont('helvetica', 'normal');
  }

  // Flag markers, numbered as in "Checks to resolve"; markers on one spot step sideways.
  const placed: V2[] = [];
  for (const { n, places } of numberedChecks(plan)) {
    for (const f of places) {
      if (f.severity === 'info') continue;
      const inWin =
        f.at[0] >= win.x0 - 1 &&
        f.at[0] <= win.x1 + 1 &&
        f.at[1] >= win.y0 - 1 &&
        f.at[1] <= win.y1 + 1;
      if (!inWin) continue;
      const c = P(f.at as V2);
      while (placed.some((q) => Math.hypot(q[0] - c[0], q[1] - c[1]) < 3.6)) c[0] += 4;
      placed.push([c[0], c[1]]);
      drawFlagMarker(doc, c, n, f.severity);
    }
  }
  if (v.part) doc.restoreGraphicsState();

  // Dimension chains.
  for (const c of o.chains) {
    if (v.part && c.kind === 'overall') continue;
    if (o.overview && (c.kind === 'noggins' || c.kind === 'joists')) continue;
    let clip: { lo: number; hi: number; base: number } | undefined;
    if (v.part) {
      const corners: V2[] = [
        [win.x0, win.y0],
        [win.x1, win.y0],
        [win.x1, win.y1],
        [win.x0, win.y1],
      ];
      const t = corners.map((q) => dot(q, c.dir));
      const n = corners.map((q) => dot(q, c.normal));
      clip = { lo: Math.min(...t), hi: Math.max(...t), base: Math.max(...n) };
    }
    drawChain(doc, v, c, points, units, style, clip);
  }
  void design;
}
