// Sides: length labels outside each side, the selected side highlighted, insert-corner handles.
import type { Pt } from '@/engine/types';
import { formatLength, type UnitSystem } from '@/lib/units';
import { dist, signedArea } from '../../geometry';
import type { View } from '../../spaces';
import { label, readableAngle, sx, sy, type Ctx } from '../../layers/paint';
import { palette } from '../member/style';
import { sideHandleAt } from './geometry';

export function drawSides(
  ctx: Ctx,
  v: View,
  outline: Pt[],
  opts: { units: UnitSystem; selected: number | null; handles: boolean },
) {
  const n = outline.length;
  if (n < 2) return;
  const ccw = signedArea(outline) > 0;
  for (let i = 0; i < n; i++) {
    const a = outline[i];
    const b = outline[(i + 1) % n];
    const ax = sx(v, a);
    const ay = sy(v, a);
    const bx = sx(v, b);
    const by = sy(v, b);
    const len = Math.hypot(bx - ax, by - ay);
    if (i === opts.selected) {
      ctx.beginPath();
      ctx.moveTo(ax, ay);
      ctx.lineTo(bx, by);
      ctx.strokeStyle = palette.selected;
      ctx.lineWidth = 5;
      ctx.stroke();
    }
    if (len < 40) continue;
    // Outward normal on screen. A counter-clockwise plan (y up) is clockwise on screen (y down);
    // e.g. its bottom side runs left to right on screen and its outside is below: (0, +1).
    const nx = ((ay - by) / len) * (ccw ? 1 : -1);
    const ny = ((bx - ax) / len) * (ccw ? 1 : -1);
    const mx = (ax + bx) / 2 + nx * 16;
    const my = (ay + by) / 2 + ny * 16;
    label(ctx, formatLength(dist(a, b), opts.units), mx, my, {
      angle: readableAngle(Math.atan2(by - ay, bx - ax)),
      color: i === opts.selected ? '#6a3e21' : palette.dimension,
    });
    if (opts.handles && len >= 4 * 22) {
      const h = sideHandleAt(outline, i);
      const hx = sx(v, h);
      const hy = sy(v, h);
      ctx.beginPath();
      ctx.arc(hx, hy, 7, 0, Math.PI * 2);
      ctx.fillStyle = 'rgba(255, 255, 255, 0.9)';
      ctx.fill();
      ctx.strokeStyle = palette.handleEdge;
      ctx.lineWidth = 1.5;
      ctx.stroke();
      ctx.beginPath();
      ctx.moveTo(hx - 3.5, hy);
      ctx.lineTo(hx + 3.5, hy);
      ctx.moveTo(hx, hy - 3.5);
      ctx.lineTo(hx, hy + 3.5);
      ctx.stroke();
    }
  }
}
