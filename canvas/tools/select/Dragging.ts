// Select tool, dragging: a corner or support row follows the finger (snapped); pointer-up makes one undo step.
import { moveCorner } from '../../commands/outline';
import { moveSupport, visibleSupports } from '../../commands/supports';
import { sub } from '../../geometry';
import type { HitTarget } from '../../kinds/types';
import { slideRow } from '../../kinds/support-row/geometry';
import type { SupportRowInput } from '@/engine/schema';
import type { ToolStateDef } from '../types';

export const draggingState: ToolStateDef = {
  id: 'dragging',
  onEnter(ctx) {
    const t = ctx.info.target as HitTarget;
    const s = ctx.get();
    if (t.kind === 'support') {
      // Remember the row as it was, so every move is measured from the start (no drift).
      ctx.info.row = visibleSupports(s).rows[t.index];
    }
    s.setUi({
      selection:
        t.kind === 'corner' || t.kind === 'support' ? { kind: t.kind, index: t.index } : null,
    });
  },
  onPointerMove(ctx, e) {
    const s = ctx.get();
    const t = ctx.info.target as HitTarget;
    if (t.kind === 'corner') {
      const o = s.doc.outline;
      const n = o.length;
      const prev = o[(t.index - 1 + n) % n];
      const snapped = ctx.snap(e.world, { from: prev, exclude: [o[t.index]] });
      s.setUi({ snapHint: snapped.to });
      s.run(moveCorner, { index: t.index, to: snapped.pt });
    } else if (t.kind === 'support') {
      const row = ctx.info.row as SupportRowInput;
      const origin = ctx.info.origin as [number, number];
      if (t.part === 'body') {
        const moved = slideRow(row.a, row.b, sub(e.world, origin));
        // Snap the row's first end to the grid so rows land on round positions.
        const snapA = ctx.snap(moved.a, { exclude: [row.a, row.b] }).pt;
        const fixed = slideRow(row.a, row.b, sub(snapA, row.a));
        s.run(moveSupport, { index: t.index, a: fixed.a, b: fixed.b });
      } else {
        const other = t.part === 'a' ? row.b : row.a;
        const end = ctx.snap(e.world, { from: other }).pt;
        s.run(moveSupport, {
          index: t.index,
          a: t.part === 'a' ? end : row.a,
          b: t.part === 'b' ? end : row.b,
        });
      }
    }
  },
  onPointerUp(ctx) {
    const s = ctx.get();
    s.commit();
    s.setUi({ snapHint: null });
    ctx.transition('idle');
  },
  onCancel(ctx) {
    const s = ctx.get();
    s.bail();
    s.setUi({ snapHint: null });
    ctx.transition('idle');
  },
};
