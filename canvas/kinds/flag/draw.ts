// Flag markers where the engine found a problem: a disc (error), a diamond (warning), a ring (info).
import type { Flag } from '@/engine/types';
import type { View } from '../../spaces';
import { sx, sy, type Ctx } from '../../layers/paint';
import { palette, severityColor } from '../member/style';

const R = 11;

export function drawFlags(ctx: Ctx, v: View, flags: Flag[], selected: number | null) {
  // Errors last so they sit on top.
  const order = { info: 0, warning: 1, error: 2 } as const;
  const list = flags
    .map((f, i) => ({ f, i }))
    .filter(({ f }) => f.code !== 'caution')
    .sort((a, b) => order[a.f.severity] - order[b.f.severity]);
  for (const { f, i } of list) {
    const x = sx(v, f.at);
    const y = sy(v, f.at);
    const c = severityColor(f.severity);
    if (i === selected) {
      ctx.beginPath();
      ctx.arc(x, y, R + 7, 0, Math.PI * 2);
      ctx.strokeStyle = palette.selected;
      ctx.lineWidth = 3;
      ctx.stroke();
    }
    ctx.beginPath();
    if (f.severity === 'warning') {
      ctx.moveTo(x, y - R - 2);
      ctx.lineTo(x + R + 2, y);
      ctx.lineTo(x, y + R + 2);
      ctx.lineTo(x - R - 2, y);
      ctx.closePath();
    } else {
      ctx.arc(x, y, R, 0, Math.PI * 2);
    }
    ctx.fillStyle = f.severity === 'info' ? '#ffffff' : c;
    ctx.fill();
    ctx.strokeStyle = f.severity === 'info' ? c : '#ffffff';
    ctx.lineWidth = 2;
    ctx.stroke();
    ctx.fillStyle = f.severity === 'info' ? c : '#ffffff';
    ctx.font = '700 13px Inter, ui-sans-serif, system-ui, sans-serif';
    ctx.textAlign = 'center';
    ctx.textBaseline = 'middle';
    ctx.fillText(f.severity === 'info' ? 'i' : '!', x, y + 0.5);
  }
}
