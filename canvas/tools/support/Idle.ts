// Support tool, idle: a press starts a new row at the snapped point.
import type { ToolStateDef } from '../types';

export const idleState: ToolStateDef = {
  id: 'idle',
  onPointerDown(ctx, e) {
    const a = ctx.snap(e.world).pt;
    ctx.get().setUi({ creating: { a, b: a } });
    ctx.transition('creating', { a, down: [e.screen[0], e.screen[1]] });
  },
};
