// Support rows: a band as wide as the blocks (or beam, or wall), end handles when editable.
import type { SupportRowInput } from '@/engine/schema';
import type { View } from '../../spaces';
import { segment, sx, sy, widthPx, type Ctx } from '../../layers/paint';
import { palette, supportRowStyle } from '../member/style';

export function drawSupportRows(
  ctx: Ctx,
  v: View,
  rows: SupportRowInput[],
  opts: { selected: number | null; placed: boolean; handles: boolean },
) {
  ctx.lineCap = 'butt';
  rows.forEach((row, i) => {
    const st = supportRowStyle(row.kind);
    ctx.beginPath();
    segment(ctx, v, row.a, row.b);
    ctx.strokeStyle = st.color;
    ctx.lineWidth = widthPx(v, st.widthMm, st.minPx);
    ctx.setLineDash(st.dash ?? []);
    ctx.stroke();
    ctx.setLineDash(opts.placed ? [4, 4] : []);
    ctx.beginPath();
    segment(ctx, v, row.a, row.b);
    ctx.strokeStyle = i === opts.selected ? palette.selected : palette.supportBeam;
    ctx.lineWidth = i === opts.selected ? 2.5 : 1;
    ctx.stroke();
    ctx.setLineDash([]);
  });
  if (!opts.handles) return;
  const sel = opts.selected !== null ? rows[opts.selected] : null;
  if (!sel) return;
  for (const p of [sel.a, sel.b]) {
    ctx.beginPath();
    ctx.arc(sx(v, p), sy(v, p), 8, 0, Math.PI * 2);
    ctx.fillStyle = palette.handle;
    ctx.fill();
    ctx.strokeStyle = palette.selected;
    ctx.lineWidth = 2.5;
    ctx.stroke();
  }
}
