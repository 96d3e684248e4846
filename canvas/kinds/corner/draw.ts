// The deck outline and its corner handles (44 px targets, drawn smaller so the plan stays readable).
import type { Pt } from '@/engine/types';
import type { View } from '../../spaces';
import { sx, sy, type Ctx } from '../../layers/paint';
import { palette } from '../member/style';

export function traceOutline(ctx: Ctx, v: View, outline: Pt[], close = true) {
  ctx.beginPath();
  outline.forEach((p, i) => (i ? ctx.lineTo(sx(v, p), sy(v, p)) : ctx.moveTo(sx(v, p), sy(v, p))));
  if (close) ctx.closePath();
}

export function drawDeckFill(ctx: Ctx, v: View, outline: Pt[]) {
  if (outline.length < 3) return;
  traceOutline(ctx, v, outline);
  ctx.fillStyle = palette.deckFill;
  ctx.fill();
}

export function drawOutlineEdge(ctx: Ctx, v: View, outline: Pt[], faded: boolean) {
  if (outline.length < 2) return;
  traceOutline(ctx, v, outline);
  ctx.strokeStyle = faded ? 'rgba(61, 56, 51, 0.35)' : palette.outline;
  ctx.lineWidth = 2;
  ctx.lineJoin = 'round';
  ctx.stroke();
}

export function drawCornerHandles(ctx: Ctx, v: View, outline: Pt[], selected: number | null) {
  outline.forEach((p, i) => {
    const x = sx(v, p);
    const y = sy(v, p);
    const on = i === selected;
    ctx.beginPath();
    ctx.arc(x, y, on ? 10 : 8, 0, Math.PI * 2);
    ctx.fillStyle = on ? palette.selected : palette.handle;
    ctx.fill();
    ctx.strokeStyle = on ? '#ffffff' : palette.handleEdge;
    ctx.lineWidth = 2.5;
    ctx.stroke();
  });
}

/** The outline being drawn: placed corners, the rubber band to the finger, the first corner ringed. */
export function drawDrawing(ctx: Ctx, v: View, pts: Pt[], cursor: Pt | null) {
  if (!pts.length) {
    if (cursor) crosshair(ctx, sx(v, cursor), sy(v, cursor));
    return;
  }
  traceOutline(ctx, v, cursor ? [...pts, cursor] : pts, false);
  ctx.strokeStyle = palette.drawing;
  ctx.lineWidth = 2.5;
  ctx.setLineDash([]);
  ctx.stroke();
  pts.forEach((p, i) => {
    ctx.beginPath();
    ctx.arc(sx(v, p), sy(v, p), i === 0 ? 12 : 6, 0, Math.PI * 2);
    ctx.fillStyle = i === 0 ? 'rgba(166, 95, 38, 0.18)' : palette.drawing;
    ctx.fill();
    if (i === 0) {
      ctx.strokeStyle = palette.drawing;
      ctx.lineWidth = 2;
      ctx.stroke();
    }
  });
  if (cursor) crosshair(ctx, sx(v, cursor), sy(v, cursor));
}

function crosshair(ctx: Ctx, x: number, y: number) {
  ctx.beginPath();
  ctx.moveTo(x - 10, y);
  ctx.lineTo(x + 10, y);
  ctx.moveTo(x, y - 10);
  ctx.lineTo(x, y + 10);
  ctx.strokeStyle = palette.drawing;
  ctx.lineWidth = 1.5;
  ctx.stroke();
}
