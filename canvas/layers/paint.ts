// Low-level painting helpers: world → screen on the native 2D context, batched strokes, labels.
import type { Pt } from '@/engine/types';
import type { View } from '../spaces';

export type Ctx = CanvasRenderingContext2D;

export const sx = (v: View, p: Pt) => p[0] * v.scale + v.x;
export const sy = (v: View, p: Pt) => -p[1] * v.scale + v.y;

/** Stroke width in px for a width in mm, never thinner than minPx. */
export const widthPx = (v: View, mm: number, minPx: number) => Math.max(minPx, mm * v.scale);

/** Adds a segment to the current path, offset sideways by `off` px (for laminated members). */
export function segment(ctx: Ctx, v: View, a: Pt, b: Pt, off = 0) {
  let ax = sx(v, a);
  let ay = sy(v, a);
  let bx = sx(v, b);
  let by = sy(v, b);
  if (off) {
    const dx = bx - ax;
    const dy = by - ay;
    const len = Math.hypot(dx, dy) || 1;
    const nx = (-dy / len) * off;
    const ny = (dx / len) * off;
    ax += nx;
    ay += ny;
    bx += nx;
    by += ny;
  }
  ctx.moveTo(ax, ay);
  ctx.lineTo(bx, by);
}

export const FONT = '600 12px Inter, ui-sans-serif, system-ui, sans-serif';
export const SMALL_FONT = '500 11px Inter, ui-sans-serif, system-ui, sans-serif';

/** A text label on a pale rounded box, centred at (x, y), optionally rotated. */
export function label(
  ctx: Ctx,
  text: string,
  x: number,
  y: number,
  opts: { angle?: number; color?: string; bg?: string; font?: string } = {},
) {
  ctx.save();
  ctx.translate(x, y);
  if (opts.angle) ctx.rotate(opts.angle);
  ctx.font = opts.font ?? FONT;
  const w = ctx.measureText(text).width + 8;
  const h = 17;
  ctx.fillStyle = opts.bg ?? 'rgba(255, 255, 255, 0.88)';
  ctx.beginPath();
  ctx.roundRect(-w / 2, -h / 2, w, h, 4);
  ctx.fill();
  ctx.fillStyle = opts.color ?? '#1d3a33';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(text, 0, 0.5);
  ctx.restore();
}

/** Keeps text upright: an angle in (-90°, 90°]. */
export function readableAngle(a: number): number {
  let r = a;
  while (r > Math.PI / 2) r -= Math.PI;
  while (r <= -Math.PI / 2) r += Math.PI;
  return r;
}
