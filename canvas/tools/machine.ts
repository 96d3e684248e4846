// Runs the active tool's state machine: routes pointer events to the current state's handlers.
import type { Pt } from '@/engine/types';
import { visibleSupports } from '../commands/supports';
import { hitTest } from '../kinds/registry';
import { gridPitchFor, snapPoint } from '../snap';
import { pxToMm, toWorld, type ScreenPt } from '../spaces';
import type { EditorStore } from '../store/createEditorStore';
import { tools } from './registry';
import type { ToolContext, ToolPointerEvent, ToolStateDef } from './types';

/** Half of a 44 px touch target. */
export const TOUCH_RADIUS_PX = 22;

export interface ToolMachine {
  pointerDown(screen: ScreenPt, pointerType: ToolPointerEvent['pointerType']): void;
  pointerMove(screen: ScreenPt, pointerType: ToolPointerEvent['pointerType']): void;
  pointerUp(screen: ScreenPt, pointerType: ToolPointerEvent['pointerType']): void;
  cancel(): void;
  /** Name of the current state, e.g. "dragging". */
  state(): string;
  dispose(): void;
}

export function createToolMachine(store: EditorStore): ToolMachine {
  let toolId = store.getState().ui.tool;
  let current: ToolStateDef = findState(toolId, tools[toolId].initial);
  let info: Record<string, unknown> = {};

  function findState(tool: keyof typeof tools, id: string): ToolStateDef {
    const st = tools[tool].states.find((x) => x.id === id);
    if (!st) throw new Error(`Tool ${tool} has no state ${id}`);
    return st;
  }

  const ctx: ToolContext = {
    store,
    get: () => store.getState(),
    get info() {
      return info;
    },
    set info(v) {
      info = v;
    },
    transition(state, next) {
      current = findState(toolId, state);
      info = { ...(next ?? {}) };
      current.onEnter?.(ctx);
      if (store.getState().ui.toolState !== state) store.getState().setUi({ toolState: state });
    },
    snap(p: Pt, opts = {}) {
      const s = store.getState();
      const exclude = opts.exclude ?? [];
      const isExcluded = (q: Pt) => exclude.some((x) => x[0] === q[0] && x[1] === q[1]);
      const points = [...s.doc.outline, ...s.ui.drawing].filter((q) => !isExcluded(q));
      return snapPoint(p, s.ui.snap, {
        gridMm: gridPitchFor(s.ui.view.scale),
        from: opts.from ?? null,
        points,
        radiusMm: pxToMm(s.ui.view, TOUCH_RADIUS_PX / 2),
      });
    },
    slopPx: 8,
  };

  // Switching tool (a button, a shortcut, closing an outline) resets the machine.
  const unsub = store.subscribe((s, prev) => {
    if (s.ui.tool !== prev.ui.tool) {
      toolId = s.ui.tool;
      current = findState(toolId, tools[toolId].initial);
      info = {};
    }
  });

  const event = (
    screen: ScreenPt,
    pointerType: ToolPointerEvent['pointerType'],
  ): ToolPointerEvent => {
    const s = store.getState();
    const world = toWorld(s.ui.view, screen);
    const target = hitTest({
      s,
      world,
      radiusMm: pxToMm(s.ui.view, TOUCH_RADIUS_PX),
      supports: visibleSupports(s).rows,
    });
    return { world, screen, target, pointerType };
  };

  return {
    pointerDown: (screen, type) => current.onPointerDown?.(ctx, event(screen, type)),
    pointerMove: (screen, type) => current.onPointerMove?.(ctx, event(screen, type)),
    pointerUp: (screen, type) => current.onPointerUp?.(ctx, event(screen, type)),
    cancel: () => current.onCancel?.(ctx),
    state: () => current.id,
    dispose: unsub,
  };
}
