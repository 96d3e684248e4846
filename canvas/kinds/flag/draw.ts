// Flag markers where the engine found a problem: a disc (error), a diamond (warning), a ring (info).
// Markers closer than a marker's width merge into one (worst first) with a count.
import type { Flag, Severity } from '@/engine/types';
import type { View } from '../../spaces';
import { sx, sy, type Ctx } from '../../layers/paint';
import { palette, severityColor } from '../member/style';

const R = 11;
const MERGE_PX = R * 2.2;

export function drawFlags(ctx: Ctx, v: View, flags: Flag[], selected: number | null) {
  const rank = { error: 0, warning: 1, info: 2 } as const;
  const list = flags
    .map((f, i) => ({ f, i }))
    .filter(({ f, i }) => f.code !== 'caution' && i !== selected)
    .sort((a, b) => rank[a.f.severity] - rank[b.f.severity]);
  // Spatial hash of markers already placed, so merging stays linear on big decks.
  const cells = new Map<string, { x: number; y: number; n: number; sev: Severity }[]>();
  const placed: { x: number; y: number; n: number; sev: Severity }[] = [];
  for (const { f } of list) {
    const x = sx(v, f.at);
    const y = sy(v, f.at);
    const cx = Math.floor(x / MERGE_PX);
    const cy = Math.floor(y / MERGE_PX);
    let near: (typeof placed)[number] | undefined;
    for (let dx = -1; dx <= 1 && !near; dx++) {
      for (let dy = -1; dy <= 1 && !near; dy++) {
        near = cells
          .get(`${cx + dx},${cy + dy}`)
          ?.find((m) => Math.hypot(m.x - x, m.y - y) < MERGE_PX);
      }
    }
    if (near) {
      near.n += 1;
      continue;
    }
    const m = { x, y, n: 1, sev: f.severity };
    placed.push(m);
    const key = `${cx},${cy}`;
    const cell = cells.get(key);
    if (cell) cell.push(m);
    else cells.set(key, [m]);
  }
  // Worst on top.
  for (let k = placed.length - 1; k >= 0; k--) {
    const m = placed[k];
    drawMarker(ctx, m.x, m.y, m.sev, m.n, false);
  }
  const sel = selected !== null ? flags[selected] : null;
  if (sel && sel.code !== 'caution')
    drawMarker(ctx, sx(v, sel.at), sy(v, sel.at), sel.severity, 1, true);
}

function drawMarker(
  ctx: Ctx,
  x: number,
  y: number,
  severity: Severity,
  n: number,
  selected: boolean,
) {
  const c = severityColor(severity);
  if (selected) {
    ctx.beginPath();
    ctx.arc(x, y, R + 7, 0, Math.PI * 2);
    ctx.strokeStyle = palette.selected;
    ctx.lineWidth = 3;
    ctx.stroke();
  }
  ctx.beginPath();
  if (severity === 'warning') {
    ctx.moveTo(x, y - R - 2);
    ctx.lineTo(x + R + 2, y);
    ctx.lineTo(x, y + R + 2);
    ctx.lineTo(x - R - 2, y);
    ctx.closePath();
  } else {
    ctx.arc(x, y, R, 0, Math.PI * 2);
  }
  ctx.fillStyle = severity === 'info' ? '#ffffff' : c;
  ctx.fill();
  ctx.strokeStyle = severity === 'info' ? c : '#ffffff';
  ctx.lineWidth = 2;
  ctx.stroke();
  ctx.fillStyle = severity === 'info' ? c : '#ffffff';
  ctx.font = '700 13px Inter, ui-sans-serif, system-ui, sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(severity === 'info' ? 'i' : '!', x, y + 0.5);
  if (n > 1) {
    const t = String(n);
    ctx.font = '700 10px Inter, ui-sans-serif, system-ui, sans-serif';
    const w = Math.max(15, ctx.measureText(t).width + 7);
    ctx.beginPath();
    ctx.roundRect(x + R - 5, y - R - 7, w, 15, 7.5);
    ctx.fillStyle = '#1a1714';
    ctx.fill();
    ctx.fillStyle = '#ffffff';
    ctx.fillText(t, x + R - 5 + w / 2, y - R + 0.5);
  }
}
