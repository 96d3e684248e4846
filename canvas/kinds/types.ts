// What a tap on the plan can land on, and the shape of a kind's hit test.
import type { SupportRowInput } from '@/engine/schema';
import type { Pt } from '@/engine/types';
import type { EditorData } from '../store/types';

export type HitTarget =
  | { kind: 'corner'; index: number }
  | { kind: 'side-handle'; index: number }
  | { kind: 'side'; index: number; at: Pt }
  | { kind: 'support'; index: number; part: 'a' | 'b' | 'body' }
  | { kind: 'step'; index: number }
  | { kind: 'flag'; index: number };

export interface HitInput {
  s: EditorData;
  world: Pt;
  /** Touch radius in world mm at the current zoom (22 px: half of a 44 px target). */
  radiusMm: number;
  /** Support rows as shown (the document's, or the engine's when the document has none). */
  supports: SupportRowInput[];
}

/** A kind of thing on the plan that can be tapped: its hit test and a label for screen readers. */
export interface PlanKind {
  kind: HitTarget['kind'];
  label: string;
  /** Whether read-only viewers can pick it (they may look at flags, not move corners). */
  readOnly: boolean;
  hitTest(input: HitInput): HitTarget | null;
}
