// Every kind of thing on the plan, in one place, in the order a tap tries them.
import { cornerKind } from './corner/geometry';
import { flagKind } from './flag/geometry';
import { sideHandleKind, sideKind } from './side/geometry';
import { stepKind } from './step/geometry';
import { supportRowKind } from './support-row/geometry';
import type { HitInput, HitTarget, PlanKind } from './types';

/** Tap priority: small handles before the long things they sit on. */
export const planKinds: readonly PlanKind[] = [
  cornerKind,
  flagKind,
  supportRowKind,
  sideHandleKind,
  stepKind,
  sideKind,
];

/** What is under the finger, or null for empty plan. */
export function hitTest(input: HitInput): HitTarget | null {
  const readOnly = input.s.meta.readOnly;
  for (const k of planKinds) {
    if (readOnly && !k.readOnly) continue;
    const hit = k.hitTest(input);
    if (hit) return hit;
  }
  return null;
}
