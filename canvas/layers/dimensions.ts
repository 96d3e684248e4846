// Dimension lines: the overall size, the chain of support row positions, and the joist centres.
import type { SupportRowInput } from '@/engine/schema';
import type { FramePlan, Pt } from '@/engine/types';
import { formatLength, type UnitSystem } from '@/lib/units';
import { boundsOf } from '../geometry';
import type { View } from '../spaces';
import { palette } from '../kinds/member/style';
import { label, readableAngle, sx, sy, type Ctx } from './paint';

const OFFSET_PX = 44;

/** A dimension line between screen points with ticks, its text centred on it. */
function dimLine(ctx: Ctx, ax: number, ay: number, bx: number, by: number, text: string) {
  ctx.beginPath();
  ctx.moveTo(ax, ay);
  ctx.lineTo(bx, by);
  const len = Math.hypot(bx - ax, by - ay) || 1;
  const tx = ((bx - ax) / len) * 5;
  const ty = ((by - ay) / len) * 5;
  for (const [x, y] of [
    [ax, ay],
    [bx, by],
  ]) {
    ctx.moveTo(x - ty - tx, y + tx - ty);
    ctx.lineTo(x + ty + tx, y - tx + ty);
  }
  ctx.strokeStyle = palette.dimension;
  ctx.lineWidth = 1;
  ctx.stroke();
  if (len > 36) {
    label(ctx, text, (ax + bx) / 2, (ay + by) / 2, {
      angle: readableAngle(Math.atan2(by - ay, bx - ax)),
    });
  }
}

/** Overall width under the deck and overall depth to its left. */
export function drawOverall(ctx: Ctx, v: View, outline: Pt[], units: UnitSystem) {
  const b = boundsOf(outline);
  if (!b) return;
  const y = sy(v, [0, b.minY]) + OFFSET_PX + 18;
  dimLine(
    ctx,
    sx(v, [b.minX, 0]),
    y,
    sx(v, [b.maxX, 0]),
    y,
    formatLength(b.maxX - b.minX, units, { metricAs: 'm' }),
  );
  const x = sx(v, [b.minX, 0]) - OFFSET_PX - 18;
  dimLine(
    ctx,
    x,
    sy(v, [0, b.maxY]),
    x,
    sy(v, [0, b.minY]),
    formatLength(b.maxY - b.minY, units, { metricAs: 'm' }),
  );
}

/**
 * Support row positions measured along the joists (across the rows), as a chain from deck edge to
 * deck edge, drawn above the deck.
 */
export function drawRowChain(
  ctx: Ctx,
  v: View,
  outline: Pt[],
  rows: SupportRowInput[],
  boardAngleDeg: number,
  units: UnitSystem,
) {
  if (!rows.length || outline.length < 3) return;
  // Joists run across the boards.
  const r = ((boardAngleDeg + 90) * Math.PI) / 180;
  const u: Pt = [Math.cos(r), Math.sin(r)];
  const w: Pt = [-u[1], u[0]];
  const dot = (p: Pt, d: Pt) => p[0] * d[0] + p[1] * d[1];
  const us = outline.map((p) => dot(p, u));
  const ws = outline.map((p) => dot(p, w));
  const stops = [
    Math.min(...us),
    ...rows.map((row) => (dot(row.a, u) + dot(row.b, u)) / 2),
    Math.max(...us),
  ].sort((a, b) => a - b);
  // The overall dimensions sit below and to the left: put the chain on the right or top side.
  const wTop = Math.max(...ws);
  const wBottom = Math.min(...ws);
  const at = (uu: number, ww: number): Pt => [u[0] * uu + w[0] * ww, u[1] * uu + w[1] * ww];
  const uMid = (Math.min(...us) + Math.max(...us)) / 2;
  const score = (p: Pt) => sx(v, p) - sy(v, p);
  const topFirst = score(at(uMid, wTop)) >= score(at(uMid, wBottom));
  const wLine = topFirst ? wTop : wBottom;
  const sign = topFirst ? 1 : -1;
  const off = (OFFSET_PX / v.scale) * sign;
  for (let i = 0; i + 1 < stops.length; i++) {
    const a = at(stops[i], wLine + off);
    const b = at(stops[i + 1], wLine + off);
    dimLine(
      ctx,
      sx(v, a),
      sy(v, a),
      sx(v, b),
      sy(v, b),
      formatLength(stops[i + 1] - stops[i], units),
    );
  }
}

/** The centres of two neighbouring field joists, near the middle of the deck. */
export function drawJoistCentres(ctx: Ctx, v: View, plan: FramePlan, units: UnitSystem) {
  const field = plan.members.filter(
    (m) => m.kind === 'joist' && m.ply === 1 && (m.role ?? 'field') === 'field',
  );
  if (field.length < 2) return;
  const cx = (plan.bounds.minX + plan.bounds.maxX) / 2;
  const cy = (plan.bounds.minY + plan.bounds.maxY) / 2;
  const d = (m: (typeof field)[number]) =>
    Math.hypot((m.a[0] + m.b[0]) / 2 - cx, (m.a[1] + m.b[1]) / 2 - cy);
  const sorted = [...field].sort((a, b) => d(a) - d(b));
  const j1 = sorted[0];
  const dir: Pt = [j1.b[0] - j1.a[0], j1.b[1] - j1.a[1]];
  const len = Math.hypot(dir[0], dir[1]) || 1;
  const n: Pt = [-dir[1] / len, dir[0] / len];
  // The nearest parallel neighbour.
  let best: { m: (typeof field)[number]; gap: number } | null = null;
  for (const m of sorted.slice(1, 12)) {
    const gap = (m.a[0] - j1.a[0]) * n[0] + (m.a[1] - j1.a[1]) * n[1];
    if (Math.abs(gap) > 1 && (!best || Math.abs(gap) < Math.abs(best.gap))) best = { m, gap };
  }
  if (!best) return;
  const mid: Pt = [(j1.a[0] + j1.b[0]) / 2, (j1.a[1] + j1.b[1]) / 2];
  const a = mid;
  const b: Pt = [mid[0] + n[0] * best.gap, mid[1] + n[1] * best.gap];
  const ax = sx(v, a);
  const ay = sy(v, a);
  const bx = sx(v, b);
  const by = sy(v, b);
  if (Math.hypot(bx - ax, by - ay) < 10) return;
  ctx.beginPath();
  ctx.moveTo(ax, ay);
  ctx.lineTo(bx, by);
  ctx.strokeStyle = palette.dimension;
  ctx.lineWidth = 1;
  ctx.stroke();
  label(
    ctx,
    `${formatLength(Math.abs(best.gap), units)} centres`,
    (ax + bx) / 2,
    (ay + by) / 2 - 14,
    {
      font: '500 11px Inter, ui-sans-serif, system-ui, sans-serif',
    },
  );
}
