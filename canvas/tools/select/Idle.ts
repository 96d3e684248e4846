// Select tool, idle: a press on a corner, row end, handle or flag starts pointing at it; elsewhere pans.
import { insertCorner } from '../../commands/outline';
import type { ToolStateDef } from '../types';

export const idleState: ToolStateDef = {
  id: 'idle',
  onPointerDown(ctx, e) {
    const s = ctx.get();
    const t = e.target;
    if (t && t.kind === 'side-handle' && !s.meta.readOnly) {
      // Insert and drag in one gesture, one undo step.
      s.mark('Insert corner');
      ctx.get().run(insertCorner, { side: t.index });
      ctx.transition('pointing', {
        target: { kind: 'corner', index: t.index + 1 },
        down: [e.screen[0], e.screen[1]],
        origin: e.world,
        marked: true,
      });
      return;
    }
    const draggable = !s.meta.readOnly && t && (t.kind === 'corner' || t.kind === 'support');
    if (draggable) s.mark(t.kind === 'corner' ? 'Move corner' : 'Move support row');
    ctx.transition('pointing', {
      target: t,
      down: [e.screen[0], e.screen[1]],
      origin: e.world,
      marked: Boolean(draggable),
    });
  },
};
