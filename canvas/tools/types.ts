// The shape of a tool: a small state machine whose states only handle events.
import type { Pt } from '@/engine/types';
import type { HitTarget } from '../kinds/types';
import type { SnapResult } from '../snap';
import type { ScreenPt } from '../spaces';
import type { EditorState, EditorStore } from '../store/createEditorStore';
import type { ToolId } from '../store/types';

export interface ToolPointerEvent {
  world: Pt;
  screen: ScreenPt;
  /** What the pointer is over (kinds/registry.ts). */
  target: HitTarget | null;
  pointerType: 'mouse' | 'touch' | 'pen';
}

export interface ToolContext {
  store: EditorStore;
  get(): EditorState;
  /** Enters another state of this tool, handing it what it needs. */
  transition(state: string, info?: object): void;
  /** Scratch space the current state was entered with. */
  info: Record<string, unknown>;
  /** Snaps a world point (grid, 45°, existing points) per the user's switches. */
  snap(p: Pt, opts?: { from?: Pt | null; exclude?: Pt[] }): SnapResult;
  /** Screen distance the finger must move before a press becomes a drag. */
  slopPx: number;
}

export interface ToolStateDef {
  id: string;
  onEnter?(ctx: ToolContext): void;
  onPointerDown?(ctx: ToolContext, e: ToolPointerEvent): void;
  onPointerMove?(ctx: ToolContext, e: ToolPointerEvent): void;
  onPointerUp?(ctx: ToolContext, e: ToolPointerEvent): void;
  /** Escape, a second finger, or the tool being switched: put things back. */
  onCancel?(ctx: ToolContext): void;
}

export interface ToolDef {
  id: ToolId;
  initial: string;
  states: readonly ToolStateDef[];
}
