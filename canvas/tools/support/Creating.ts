// Support tool, creating: drag from one end of the row to the other; release adds it (one undo step).
import type { Pt } from '@/engine/types';
import { addSupport } from '../../commands/supports';
import { dist } from '../../geometry';
import type { ToolStateDef } from '../types';

/** Rows shorter than this are taken as a mis-tap. */
const MIN_ROW_MM = 200;

export const creatingState: ToolStateDef = {
  id: 'creating',
  onPointerMove(ctx, e) {
    const a = ctx.info.a as Pt;
    const b = ctx.snap(e.world, { from: a }).pt;
    ctx.get().setUi({ creating: { a, b } });
  },
  onPointerUp(ctx, e) {
    const s = ctx.get();
    const a = ctx.info.a as Pt;
    const b = ctx.snap(e.world, { from: a }).pt;
    s.setUi({ creating: null });
    if (dist(a, b) >= MIN_ROW_MM) {
      s.run(addSupport, { a, b });
      s.setUi({ tool: 'select', toolState: 'idle' });
    }
    ctx.transition('idle');
  },
  onCancel(ctx) {
    ctx.get().setUi({ creating: null });
    ctx.transition('idle');
  },
};
