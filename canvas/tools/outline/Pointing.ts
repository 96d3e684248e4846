// Outline tool, pointing: a tap places a corner (on the first corner it closes the shape); a drag pans.
import { addDrawingCorner, closeOutline } from '../../commands/outline';
import { dist } from '../../geometry';
import { pxToMm } from '../../spaces';
import type { ToolStateDef } from '../types';

/** Touch radius around the first corner that closes the outline, in px. */
const CLOSE_PX = 22;

export const pointingState: ToolStateDef = {
  id: 'pointing',
  onPointerMove(ctx, e) {
    const down = ctx.info.down as [number, number];
    if (Math.hypot(e.screen[0] - down[0], e.screen[1] - down[1]) >= ctx.slopPx) {
      ctx.transition('panning', { from: down, last: [e.screen[0], e.screen[1]] });
    }
  },
  onPointerUp(ctx, e) {
    const s = ctx.get();
    const d = s.ui.drawing;
    const first = d[0];
    if (first && d.length >= 3 && dist(first, e.world) <= pxToMm(s.ui.view, CLOSE_PX)) {
      s.run(closeOutline, undefined);
      ctx.transition('idle');
      return;
    }
    const snapped = ctx.snap(e.world, { from: d[d.length - 1] ?? null });
    s.run(addDrawingCorner, { at: snapped.pt });
    s.setUi({ cursor: snapped.pt, snapHint: null });
    ctx.transition('idle');
  },
  onCancel(ctx) {
    ctx.transition('idle');
  },
};
