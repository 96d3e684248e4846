// Flag marker: hit test on the markers drawn where the engine found a problem.
import { dist } from '../../geometry';
import type { PlanKind } from '../types';

export const flagKind: PlanKind = {
  kind: 'flag',
  label: 'Flag',
  readOnly: true,
  hitTest({ s, world, radiusMm }) {
    const flags = s.plan.plan?.flags ?? [];
    let best = -1;
    let bestD = radiusMm * 0.8;
    flags.forEach((f, i) => {
      if (f.code === 'caution') return;
      const d = dist(f.at, world);
      if (d <= bestD) {
        best = i;
        bestD = d;
      }
    });
    return best >= 0 ? { kind: 'flag', index: best } : null;
  },
};
