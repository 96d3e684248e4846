// Boards: each piece as a strip of its real width, border pieces darker, butt joints visible as gaps.
import type { BoardPiece } from '@/engine/types';
import type { View } from '../../spaces';
import { segment, widthPx, type Ctx } from '../../layers/paint';
import { palette } from '../member/style';

export function drawBoards(ctx: Ctx, v: View, boards: BoardPiece[], boardWidthMm: number) {
  if (!boards.length) return;
  const w = widthPx(v, boardWidthMm, 1);
  ctx.lineCap = 'butt';
  for (const border of [false, true]) {
    ctx.beginPath();
    for (const b of boards) if (b.border === border) segment(ctx, v, b.a, b.b);
    ctx.strokeStyle = border ? palette.borderBoard : palette.board;
    ctx.lineWidth = w;
    ctx.stroke();
  }
  // Thin edge lines make the courses readable when zoomed in.
  if (w >= 6) {
    ctx.beginPath();
    for (const b of boards) {
      segment(ctx, v, b.a, b.b, w / 2);
      segment(ctx, v, b.a, b.b, -w / 2);
    }
    ctx.strokeStyle = palette.boardEdge;
    ctx.lineWidth = 0.75;
    ctx.stroke();
  }
}
