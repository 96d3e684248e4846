// The engine invariants the property tests check on random designs and the regression tests on saved ones. Test support: vitest's expect and engine modules only.
import { expect } from 'vitest';
import type { DesignDocument } from '../schema';
import { layoutFrame } from '../plan';
import type { FramePlan, FramePlanCore, Member, Pt } from '../types';
import { distToRing, distToSegment, pointInRing, scanRing } from '../geometry';

/** Into the layout frame (boards along +x), computed here from the plan output alone. */
function framer(design: DesignDocument) {
  const rad = (design.boardAngleDeg * Math.PI) / 180;
  const c = Math.cos(rad);
  const s = Math.sin(rad);
  return (p: Pt): Pt => [p[0] * c + p[1] * s, -p[0] * s + p[1] * c];
}

/** Float noise allowance (mm) for a footprint edge lying on a board's centreline. */
const EDGE = 1e-6;

const isFrame = (m: Member) => m.step === undefined;
const isJoistLike = (m: Member) => (m.kind === 'joist' || m.kind === 'rim') && isFrame(m);

/** The layout (the take-off has its own tests and is only run in the first property). */
export function planOf(design: DesignDocument): FramePlanCore | null {
  const plan = layoutFrame(design);
  // An outline that rounding made non-simple is flagged and framed as nothing: skip it.
  if (plan.flags.some((f) => f.code === 'outline-invalid' && f.severity === 'error')) return null;
  return plan;
}

/** Clear gaps along a horizontal board between member footprints (layout frame). */
function footprintAt(a: Pt, b: Pt, w: number, y: number): [number, number][] {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const L = Math.hypot(dx, dy) || 1;
  const nx = (-dy / L) * (w / 2);
  const ny = (dx / L) * (w / 2);
  return scanRing(
    [
      [a[0] - nx, a[1] - ny],
      [b[0] - nx, b[1] - ny],
      [b[0] + nx, b[1] + ny],
      [a[0] + nx, a[1] + ny],
    ],
    y,
  );
}

/** Invariant: never throws on valid input and always carries the standing caution. */
export function caution(design: DesignDocument, plan: FramePlan): void {
  expect(plan.flags.some((f) => f.code === 'caution' && f.severity === 'info')).toBe(true);
}

/** Invariant: keeps every frame member and deck board inside the outline. */
export function insideOutline(design: DesignDocument, plan: FramePlanCore): void {
  const inside = (p: Pt) => pointInRing(p, plan.outline) || distToRing(p, plan.outline) <= 1;
  // The user's own support rows are kept as drawn, even where they run past the deck edge.
  const userRows = new Set(plan.supportRows.filter((r) => !r.placed).map((r) => r.id));
  for (const m of plan.members.filter((x) => isFrame(x) && !userRows.has(x.id))) {
    const mid: Pt = [(m.a[0] + m.b[0]) / 2, (m.a[1] + m.b[1]) / 2];
    expect(inside(m.a) && inside(m.b) && inside(mid), `${m.id} ${m.kind}`).toBe(true);
  }
  for (const b of plan.boards.filter((x) => x.step === undefined)) {
    expect(inside(b.a) && inside(b.b), b.id).toBe(true);
  }
}

/** Invariant: cuts no joist, rim or board piece longer than its stock. */
export function stockLengths(design: DesignDocument, plan: FramePlanCore): void {
  for (const m of plan.members.filter(isJoistLike)) {
    expect(m.lengthMm).toBeLessThanOrEqual(design.joist.stockMm + 1e-6);
  }
  for (const b of plan.boards) expect(b.lengthMm).toBeLessThanOrEqual(design.board.stockMm + 1e-6);
}

// Common practice: boards need a joist at no more than the set centres.
/** Invariant: never leaves a field board over a clear gap wider than the joist centres. */
export function boardGaps(design: DesignDocument, plan: FramePlanCore): void {
  const F = framer(design);
  const w = design.joist.widthMm;
  // Rims meet mitred at the corners: lengthen each by half a joist width at both ends so
  // this square-cut footprint covers the mitre.
  const supports = plan.members.filter(isJoistLike).map((m) => {
    const a = F(m.a);
    const b = F(m.b);
    if (m.kind !== 'rim') return { a, b };
    const L = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    const ex = ((b[0] - a[0]) / L) * (w / 2);
    const ey = ((b[1] - a[1]) / L) * (w / 2);
    return { a: [a[0] - ex, a[1] - ey] as Pt, b: [b[0] + ex, b[1] + ey] as Pt };
  });
  for (const bd of plan.boards.filter((x) => x.step === undefined && !x.border)) {
    const a = F(bd.a);
    const b = F(bd.b);
    const y = a[1];
    const lo = Math.min(a[0], b[0]);
    const hi = Math.max(a[0], b[0]);
    const feet: [number, number][] = [];
    // A footprint is a closed band: one whose edge lies on the board's centreline carries it.
    // A single scan at y is half-open, so a joist end or rim face exactly at y would count or not
    // by float noise in the rotation (about 1e-12 mm): scan just either side and take both.
    for (const s of supports) {
      feet.push(...footprintAt(s.a, s.b, w, y - EDGE), ...footprintAt(s.a, s.b, w, y + EDGE));
    }
    feet.sort((p, q) => p[0] - q[0]);
    let reach = -Infinity;
    for (const [fa, fb] of feet) {
      if (fb < lo || fa > hi) continue;
      if (reach > -Infinity && fa > reach) {
        expect(fa - reach, `${bd.id} gap at x=${reach}`).toBeLessThanOrEqual(
          design.joistCentresMm + 2,
        );
      }
      reach = Math.max(reach, fb);
    }
  }
}

// Common practice: joist span and cantilever limits from the joist settings.
/** Invariant: keeps every joist span and cantilever within its limit, or flags it on that joist. */
export function joistSpans(design: DesignDocument, plan: FramePlanCore): void {
  const F = framer(design);
  const w = design.joist.widthMm;
  const rows = plan.supportRows.map((r) => ({ a: F(r.a), b: F(r.b) }));
  const padPts = plan.members
    .filter((m) => (m.kind === 'pad' || m.kind === 'post') && isFrame(m))
    .map((m) => F(m.a));
  // A rim carries joist ends when it stands on pads, or on rows at both its ends.
  const onCarrier = (p: Pt) =>
    padPts.some((q) => Math.hypot(q[0] - p[0], q[1] - p[1]) <= w + 1) ||
    rows.some((r) => distToSegment(p, r.a, r.b) <= w + 1);
  // Whole rims (their stock pieces joined back up, in order).
  const rimLines = new Map<string, { a: Pt; b: Pt }>();
  for (const m of plan.members) {
    if (m.kind !== 'rim' || m.role === 'edge' || !isFrame(m) || !m.lineId) continue;
    const cur = rimLines.get(m.lineId);
    rimLines.set(m.lineId, { a: cur ? cur.a : F(m.a), b: F(m.b) });
  }
  const paddedRims = [...rimLines.values()].filter(
    (r) => padPts.some((p) => distToSegment(p, r.a, r.b) < 1) || (onCarrier(r.a) && onCarrier(r.b)),
  );
  const byLine = new Map<string, Member[]>();
  for (const m of plan.members.filter(isJoistLike)) {
    const a = F(m.a);
    const b = F(m.b);
    if (Math.abs(a[0] - b[0]) > 1e-3 || !m.lineId) continue; // only lines along the joists
    byLine.set(m.lineId, [...(byLine.get(m.lineId) ?? []), m]);
  }
  for (const [lineId, ms] of byLine) {
    const ys = ms.flatMap((m) => [F(m.a)[1], F(m.b)[1]]);
    const x = F(ms[0].a)[0];
    const y0 = Math.min(...ys);
    const y1 = Math.max(...ys);
    const flagged = (code: string) =>
      plan.flags.some((f) => f.code === code && ms.some((m) => m.id === f.memberId));
    const stops: number[] = [];
    for (const r of rows) {
      if ((r.a[0] - x) * (r.b[0] - x) > 0 || r.a[0] === r.b[0]) continue;
      const y = r.a[1] + ((x - r.a[0]) * (r.b[1] - r.a[1])) / (r.b[0] - r.a[0]);
      if (y > y0 + 1 && y < y1 - 1) stops.push(y);
    }
    const endOk = (p: Pt) =>
      rows.some((r) => distToSegment(p, r.a, r.b) <= w + 1) ||
      paddedRims.some((r) => distToSegment(p, r.a, r.b) <= w + 1);
    const e0 = endOk([x, y0]);
    const e1 = endOk([x, y1]);
    const all = [...(e0 ? [y0] : []), ...stops, ...(e1 ? [y1] : [])].sort((p, q) => p - q);
    if (all.length === 0) {
      expect(flagged('joist-span'), `${lineId} has no support`).toBe(true);
      continue;
    }
    for (let i = 0; i + 1 < all.length; i++) {
      // Ends bear on the row just beyond them, so allow half a joist at each end.
      if (all[i + 1] - all[i] > design.joist.maxSpanMm + w + 1) {
        expect(flagged('joist-span'), `${lineId} span ${all[i + 1] - all[i]}`).toBe(true);
      }
    }
    if (!e0 && all[0] - y0 > design.joist.maxCantileverMm + 1) {
      expect(flagged('joist-cantilever'), `${lineId} overhang`).toBe(true);
    }
    if (!e1 && y1 - all[all.length - 1] > design.joist.maxCantileverMm + 1) {
      expect(flagged('joist-cantilever'), `${lineId} overhang`).toBe(true);
    }
  }
}

// Common practice: each board end at a butt joint has its own joist (a pair).
/** Invariant: puts every field butt joint over a pair of joists, staggered course to course. */
export function buttJoints(design: DesignDocument, plan: FramePlanCore): void {
  const byId = new Map(plan.members.map((m) => [m.id, m]));
  const w = design.joist.widthMm;
  const linesOf = new Map<number, string[]>();
  let pairs = 0;
  for (const j of plan.buttJoints) {
    // A joint that cannot have a pair must be flagged where it is: a border run crossing
    // no joist within a board length (a sliver narrower than its border courses), or a
    // pair that would stick out past a sharp corner of the deck.
    const flagged = plan.flags.some(
      (f) => f.code === 'butt-joint-unsupported' && f.at[0] === j.at[0] && f.at[1] === j.at[1],
    );
    expect(j.onPair || flagged, `joint at ${j.at}`).toBe(true);
    if (j.course < 0 || !j.onPair) continue;
    pairs++;
    expect(j.memberIds).toHaveLength(2);
    const [m1, m2] = j.memberIds.map((id) => byId.get(id)!);
    expect(m1.kind === 'joist' || m1.kind === 'rim').toBe(true);
    expect(m2.role).toBe('butt-pair');
    // The two joists lie side by side, touching, and the joint sits over them.
    const ux = m1.b[0] - m1.a[0];
    const uy = m1.b[1] - m1.a[1];
    const d = Math.abs((m2.a[0] - m1.a[0]) * uy - (m2.a[1] - m1.a[1]) * ux) / Math.hypot(ux, uy);
    expect(Math.abs(d - w)).toBeLessThan(1);
    // (a course lying over the joist ends bears on them within half a board width)
    const reach = Math.hypot(w / 2, design.board.widthMm / 2) + 1;
    expect(distToSegment(j.at, m1.a, m1.b)).toBeLessThanOrEqual(reach);
    expect(distToSegment(j.at, m2.a, m2.b)).toBeLessThanOrEqual(reach);
    linesOf.set(j.course, [...(linesOf.get(j.course) ?? []), m1.lineId!]);
  }
  // Nearly every field joint gets its pair.
  const field = plan.buttJoints.filter((j) => j.course >= 0).length;
  expect(field - pairs).toBeLessThanOrEqual(Math.max(1, Math.ceil(field * 0.1)));
  for (const [course, lines] of linesOf) {
    const next = linesOf.get(course + 1) ?? [];
    for (const l of lines) expect(next.includes(l), `courses ${course}/${course + 1}`).toBe(false);
  }
}

// Common practice: joist joins land over a support row.
/** Invariant: lands every joist join over a support, or flags it. */
export function joistJoins(design: DesignDocument, plan: FramePlanCore): void {
  const w = design.joist.widthMm;
  const carriers = plan.members.filter(
    (m) => m.kind === 'support' || m.kind === 'pad' || m.kind === 'post',
  );
  for (const j of plan.joins) {
    if (j.onSupport) {
      const near = carriers.some((c) => distToSegment(j.at, c.a, c.b) <= w + 1);
      expect(near, `join at ${j.at}`).toBe(true);
    } else {
      expect(
        plan.flags.some(
          (f) => f.code === 'joist-join-off-support' && j.memberIds.includes(f.memberId!),
        ),
      ).toBe(true);
    }
  }
}
