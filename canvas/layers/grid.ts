// Background: the grid (minor and major lines), a scale bar and the plan-north / axis marker, in screen space.
import { formatLength, type UnitSystem } from '@/lib/units';
import { gridPitchFor } from '../snap';
import type { View } from '../spaces';
import { palette } from '../kinds/member/style';
import type { Ctx } from './paint';

export function drawGrid(ctx: Ctx, v: View, w: number, h: number) {
  ctx.fillStyle = palette.paper;
  ctx.fillRect(0, 0, w, h);
  const pitch = gridPitchFor(v.scale);
  const major = pitch * 5;
  const x0 = Math.floor(-v.x / v.scale / pitch) * pitch;
  const x1 = (w - v.x) / v.scale;
  const y0 = Math.floor(-(h - v.y) / v.scale / pitch) * pitch;
  const y1 = v.y / v.scale;
  for (const [step, color] of [
    [pitch, palette.gridMinor],
    [major, palette.gridMajor],
  ] as const) {
    ctx.beginPath();
    for (let x = Math.floor(x0 / step) * step; x <= x1; x += step) {
      const px = Math.round(x * v.scale + v.x) + 0.5;
      ctx.moveTo(px, 0);
      ctx.lineTo(px, h);
    }
    for (let y = Math.floor(y0 / step) * step; y <= y1; y += step) {
      const py = Math.round(-y * v.scale + v.y) + 0.5;
      ctx.moveTo(0, py);
      ctx.lineTo(w, py);
    }
    ctx.strokeStyle = color;
    ctx.lineWidth = 1;
    ctx.stroke();
  }
}

/** A round length between about 70 and 170 px long at this zoom. */
export function scaleBarLength(scale: number, units: UnitSystem): number {
  const nice =
    units === 'metric'
      ? [100, 200, 500, 1000, 2000, 5000, 10000, 20000, 50000]
      : [1, 2, 5, 10, 20, 50, 100, 200].map((ft) => ft * 304.8);
  for (const mm of nice) if (mm * scale >= 70) return mm;
  return nice[nice.length - 1];
}

export function drawScaleBar(ctx: Ctx, v: View, h: number, units: UnitSystem, bottomInset: number) {
  const mm = scaleBarLength(v.scale, units);
  const len = mm * v.scale;
  const x = 16;
  const y = h - bottomInset - 20;
  ctx.fillStyle = 'rgba(255, 255, 255, 0.85)';
  ctx.beginPath();
  ctx.roundRect(x - 8, y - 24, len + 16, 36, 6);
  ctx.fill();
  ctx.fillStyle = palette.dimension;
  ctx.fillRect(x, y, len / 2, 5);
  ctx.strokeStyle = palette.dimension;
  ctx.lineWidth = 1;
  ctx.strokeRect(x + 0.5, y + 0.5, len - 1, 5);
  ctx.font = '600 12px Inter, ui-sans-serif, system-ui, sans-serif';
  ctx.textAlign = 'left';
  ctx.textBaseline = 'alphabetic';
  ctx.fillText(formatLength(mm, units, { metricAs: 'm' }), x, y - 7);
}

/** Plan north (the plan's +y) and the x axis, top right; boards' direction shown as a short tick. */
export function drawAxisMarker(ctx: Ctx, w: number, boardAngleDeg: number) {
  const cx = w - 40;
  const cy = 48;
  ctx.fillStyle = 'rgba(255, 255, 255, 0.85)';
  ctx.beginPath();
  ctx.arc(cx, cy, 28, 0, Math.PI * 2);
  ctx.fill();
  ctx.strokeStyle = palette.dimension;
  ctx.lineWidth = 1;
  ctx.stroke();
  // North arrow (plan up).
  ctx.beginPath();
  ctx.moveTo(cx, cy - 20);
  ctx.lineTo(cx + 7, cy + 4);
  ctx.lineTo(cx, cy);
  ctx.lineTo(cx - 7, cy + 4);
  ctx.closePath();
  ctx.fillStyle = palette.dimension;
  ctx.fill();
  ctx.font = '700 11px Inter, ui-sans-serif, system-ui, sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText('N', cx, cy + 14);
  // Board direction tick on the rim of the marker.
  const r = (boardAngleDeg * Math.PI) / 180;
  ctx.beginPath();
  ctx.moveTo(cx + Math.cos(r) * 22, cy - Math.sin(r) * 22);
  ctx.lineTo(cx - Math.cos(r) * 22, cy + Math.sin(r) * 22);
  ctx.strokeStyle = palette.larchAccent;
  ctx.lineWidth = 2;
  ctx.setLineDash([3, 3]);
  ctx.stroke();
  ctx.setLineDash([]);
}
