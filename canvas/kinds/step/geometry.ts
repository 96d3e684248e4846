// Flight of steps: hit test on its footprint as the engine laid it out.
import { inside } from '../../geometry';
import type { PlanKind } from '../types';

export const stepKind: PlanKind = {
  kind: 'step',
  label: 'Steps',
  readOnly: true,
  hitTest({ s, world }) {
    const steps = s.plan.plan?.steps ?? [];
    for (const st of steps) {
      if (st.outline.length >= 3 && inside(world, st.outline) && st.index < s.doc.steps.length) {
        return { kind: 'step', index: st.index };
      }
    }
    return null;
  },
};
