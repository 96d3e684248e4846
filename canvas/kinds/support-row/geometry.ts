// Support row: hit test on its two ends (drag to stretch) and its length (drag to move across the joists).
import type { Pt } from '@/engine/types';
import { closestOnSegment, dist } from '../../geometry';
import type { PlanKind } from '../types';

export const supportRowKind: PlanKind = {
  kind: 'support',
  label: 'Support row',
  readOnly: true,
  hitTest({ supports, world, radiusMm }) {
    for (let i = supports.length - 1; i >= 0; i--) {
      const row = supports[i];
      if (dist(row.a, world) <= radiusMm * 0.8) return { kind: 'support', index: i, part: 'a' };
      if (dist(row.b, world) <= radiusMm * 0.8) return { kind: 'support', index: i, part: 'b' };
    }
    for (let i = supports.length - 1; i >= 0; i--) {
      const row = supports[i];
      if (closestOnSegment(world, row.a, row.b).d <= radiusMm) {
        return { kind: 'support', index: i, part: 'body' };
      }
    }
    return null;
  },
};

/** Moves a row across itself only (along its normal): rows slide between joist ends, not along themselves. */
export function slideRow(a: Pt, b: Pt, by: Pt): { a: Pt; b: Pt } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  const nx = -dy / len;
  const ny = dx / len;
  const along = by[0] * nx + by[1] * ny;
  return {
    a: [a[0] + nx * along, a[1] + ny * along],
    b: [b[0] + nx * along, b[1] + ny * along],
  };
}
