// Outline tool, idle: shows where the next corner would go; a press starts pointing.
import type { ToolStateDef } from '../types';

export const idleState: ToolStateDef = {
  id: 'idle',
  onPointerDown(ctx, e) {
    ctx.transition('pointing', { down: [e.screen[0], e.screen[1]] });
  },
  onPointerMove(ctx, e) {
    // Hover preview (mouse and pen only; fingers have no hover).
    if (e.pointerType === 'touch') return;
    const s = ctx.get();
    const last = s.ui.drawing[s.ui.drawing.length - 1] ?? null;
    const snapped = ctx.snap(e.world, { from: last });
    s.setUi({ cursor: snapped.pt, snapHint: snapped.to });
  },
};
