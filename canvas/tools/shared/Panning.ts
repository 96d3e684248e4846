// Shared state: one finger (or mouse) dragging the empty plan moves the view; a tap clears the selection.
import { panBy } from '../../spaces';
import type { ToolStateDef } from '../types';

export const panningState: ToolStateDef = {
  id: 'panning',
  onEnter(ctx) {
    // Entered with where the finger went down and where it is now: apply that first stretch too.
    const from = ctx.info.from as [number, number] | undefined;
    const to = ctx.info.last as [number, number];
    if (from) {
      const s = ctx.get();
      s.setUi({ view: panBy(s.ui.view, to[0] - from[0], to[1] - from[1]) });
    }
  },
  onPointerMove(ctx, e) {
    const last = ctx.info.last as [number, number];
    const s = ctx.get();
    s.setUi({ view: panBy(s.ui.view, e.screen[0] - last[0], e.screen[1] - last[1]) });
    ctx.info.last = [e.screen[0], e.screen[1]];
  },
  onPointerUp(ctx) {
    ctx.transition('idle');
  },
  onCancel(ctx) {
    ctx.transition('idle');
  },
};
