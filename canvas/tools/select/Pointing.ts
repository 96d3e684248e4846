// Select tool, pointing: released in place it selects; moved past the slop it drags (or pans empty plan).
import { focusFlag } from '../../commands/flags';
import type { Selection } from '../../store/types';
import type { ToolStateDef } from '../types';

export const pointingState: ToolStateDef = {
  id: 'pointing',
  onPointerMove(ctx, e) {
    const down = ctx.info.down as [number, number];
    if (Math.hypot(e.screen[0] - down[0], e.screen[1] - down[1]) < ctx.slopPx) return;
    if (ctx.info.marked) {
      ctx.transition('dragging', { ...ctx.info });
      ctx.get().setUi({ toolState: 'dragging' });
    } else {
      ctx.transition('panning', { from: down, last: [e.screen[0], e.screen[1]] });
    }
  },
  onPointerUp(ctx) {
    const s = ctx.get();
    s.commit(); // an insert without a drag is still one step
    const t = ctx.info.target as import('../../kinds/types').HitTarget | null;
    let selection: Selection | null = null;
    if (t) {
      switch (t.kind) {
        case 'corner':
        case 'side':
        case 'step':
        case 'support':
          selection = { kind: t.kind, index: t.index };
          break;
        case 'side-handle':
          selection = { kind: 'corner', index: t.index + 1 };
          break;
        case 'flag':
          s.run(focusFlag, { index: t.index });
          ctx.transition('idle');
          return;
        default:
          t satisfies never;
      }
    }
    s.setUi({
      selection,
      panel: selection?.kind === 'side' ? 'side' : s.ui.panel === 'side' ? 'inputs' : s.ui.panel,
    });
    ctx.transition('idle');
  },
  onCancel(ctx) {
    ctx.get().bail();
    ctx.transition('idle');
  },
};
