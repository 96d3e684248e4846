// Side of the deck outline: the side itself (select, type its length) and its mid-point insert handle.
import type { Pt } from '@/engine/types';
import { closestOnSegment, dist, mid, sideOf } from '../../geometry';
import type { PlanKind } from '../types';

/** Where the insert-corner handle of side i sits. */
export const sideHandleAt = (outline: Pt[], i: number): Pt => {
  const [a, b] = sideOf(outline, i);
  return mid(a, b);
};

export const sideHandleKind: PlanKind = {
  kind: 'side-handle',
  label: 'Insert corner',
  readOnly: false,
  hitTest({ s, world, radiusMm }) {
    const o = s.doc.outline;
    for (let i = 0; i < o.length; i++) {
      const [a, b] = sideOf(o, i);
      // Only sides long enough on screen to show a handle clear of both corners.
      if (dist(a, b) < radiusMm * 4) continue;
      if (dist(sideHandleAt(o, i), world) <= radiusMm * 0.8)
        return { kind: 'side-handle', index: i };
    }
    return null;
  },
};

export const sideKind: PlanKind = {
  kind: 'side',
  label: 'Side',
  readOnly: true,
  hitTest({ s, world, radiusMm }) {
    const o = s.doc.outline;
    let best: { i: number; d: number; at: Pt } | null = null;
    for (let i = 0; i < o.length; i++) {
      const [a, b] = sideOf(o, i);
      const c = closestOnSegment(world, a, b);
      if (c.d <= radiusMm && (!best || c.d < best.d)) best = { i, d: c.d, at: c.pt };
    }
    return best ? { kind: 'side', index: best.i, at: best.at } : null;
  },
};
