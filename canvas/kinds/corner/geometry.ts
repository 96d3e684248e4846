// Corner of the deck outline: hit test (the nearest corner within the touch radius).
import { dist } from '../../geometry';
import type { PlanKind } from '../types';

export const cornerKind: PlanKind = {
  kind: 'corner',
  label: 'Corner',
  readOnly: false,
  hitTest({ s, world, radiusMm }) {
    let best = -1;
    let bestD = radiusMm;
    s.doc.outline.forEach((p, i) => {
      const d = dist(p, world);
      if (d <= bestD) {
        best = i;
        bestD = d;
      }
    });
    return best >= 0 ? { kind: 'corner', index: best } : null;
  },
};
