// Frame members: joists (one, two or three strokes by ply), rims, noggins, pads and posts.
import type { Member } from '@/engine/types';
import type { View } from '../../spaces';
import { segment, sx, sy, widthPx, type Ctx } from '../../layers/paint';
import { memberKey, memberStyle, palette } from './style';

export function drawMembers(ctx: Ctx, v: View, members: Member[]) {
  const groups = new Map<string, Member[]>();
  const points: Member[] = [];
  for (const m of members) {
    if (m.kind === 'pad' || m.kind === 'post') {
      points.push(m);
      continue;
    }
    const k = memberKey(m);
    const g = groups.get(k);
    if (g) g.push(m);
    else groups.set(k, [m]);
  }
  // Rims under joists, noggins on top: draw order by kind.
  const order = ['support', 'rim', 'joist', 'noggin'];
  const keys = [...groups.keys()].sort(
    (a, b) => order.indexOf(a.split(':')[0]) - order.indexOf(b.split(':')[0]),
  );
  ctx.lineCap = 'butt';
  for (const key of keys) {
    const list = groups.get(key)!;
    const st = memberStyle(list[0].kind, list[0].ply);
    const w = widthPx(v, st.widthMm, st.minPx);
    // Laminated joists: n strokes side by side, each as wide as one joist (at least 1.25 px, 1 px apart).
    const gap = st.strokes > 1 ? Math.max(w, 2.5) : 0;
    ctx.beginPath();
    for (const m of list) {
      for (let i = 0; i < st.strokes; i++)
        segment(ctx, v, m.a, m.b, (i - (st.strokes - 1) / 2) * gap);
    }
    ctx.strokeStyle = st.color;
    ctx.lineWidth = st.strokes > 1 ? Math.min(w, Math.max(1.25, gap - 1)) : w;
    ctx.setLineDash(st.dash ?? []);
    ctx.stroke();
    ctx.setLineDash([]);
  }
  drawPadsAndPosts(ctx, v, points);
}

function drawPadsAndPosts(ctx: Ctx, v: View, points: Member[]) {
  if (!points.length) return;
  const pad = memberStyle('pad');
  const post = memberStyle('post');
  const padPx = widthPx(v, pad.widthMm, pad.minPx);
  const postPx = widthPx(v, post.widthMm, post.minPx);
  ctx.beginPath();
  for (const m of points) {
    if (m.kind !== 'pad') continue;
    const x = sx(v, m.a);
    const y = sy(v, m.a);
    ctx.rect(x - padPx / 2, y - padPx / 2, padPx, padPx);
  }
  ctx.fillStyle = palette.pad;
  ctx.fill();
  ctx.strokeStyle = palette.padEdge;
  ctx.lineWidth = 1;
  ctx.stroke();
  ctx.beginPath();
  for (const m of points) {
    if (m.kind !== 'post') continue;
    const x = sx(v, m.a);
    const y = sy(v, m.a);
    ctx.moveTo(x + postPx / 2, y);
    ctx.arc(x, y, postPx / 2, 0, Math.PI * 2);
  }
  ctx.fillStyle = palette.post;
  ctx.fill();
  // A pale cross marks a post from a pad at a glance.
  ctx.beginPath();
  for (const m of points) {
    if (m.kind !== 'post') continue;
    const x = sx(v, m.a);
    const y = sy(v, m.a);
    const r = postPx * 0.3;
    ctx.moveTo(x - r, y);
    ctx.lineTo(x + r, y);
    ctx.moveTo(x, y - r);
    ctx.lineTo(x, y + r);
  }
  ctx.strokeStyle = '#f6f3ec';
  ctx.lineWidth = 1.25;
  ctx.stroke();
}
