'use client';
// The Konva stage: draws grid, frame plan and overlays; turns pointer, wheel, pinch and keys into tool events.
import { useEffect, useMemo, useRef, useState } from 'react';
import { Layer, Shape, Stage } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { commandForKey } from './commands/registry';
import { fittedView } from './commands/view';
import { visibleSupports } from './commands/supports';
import { drawBoards } from './kinds/board/draw';
import { drawCornerHandles, drawDeckFill, drawDrawing, drawOutlineEdge } from './kinds/corner/draw';
import { drawFlags } from './kinds/flag/draw';
import { drawMembers } from './kinds/member/draw';
import { drawSides } from './kinds/side/draw';
import { drawSteps } from './kinds/step/draw';
import { drawSupportRows } from './kinds/support-row/draw';
import { drawOverall, drawJoistCentres, drawRowChain } from './layers/dimensions';
import { drawAxisMarker, drawGrid, drawScaleBar } from './layers/grid';
import type { Ctx } from './layers/paint';
import { panBy, screenPt, toScreen, zoomAt, type ScreenPt } from './spaces';
import { useEditor, useEditorStore } from './store/EditorStoreProvider';
import { createToolMachine } from './tools/machine';

const native = (c: Context) => (c as unknown as { _context: Ctx })._context;

export default function EditorStage({ bottomInset = 0 }: { bottomInset?: number }) {
  const store = useEditorStore();
  const wrap = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<{ width: number; height: number } | null>(null);
  const machine = useMemo(() => createToolMachine(store), [store]);
  useEffect(() => () => machine.dispose(), [machine]);

  // Size: follow the container; fit the deck the first time we know our size, and again when the
  // first frame plan arrives (steps stick out of the outline) unless the user has moved the view.
  useEffect(() => {
    const el = wrap.current;
    if (!el) return;
    let first = true;
    let autoView: unknown = null;
    const unsub = store.subscribe((s, prev) => {
      if (s.plan.plan && !prev.plan.plan && s.ui.view === autoView) {
        autoView = fittedView(s);
        s.setUi({ view: autoView as typeof s.ui.view });
      }
    });
    const ro = new ResizeObserver(() => {
      const r = el.getBoundingClientRect();
      const next = {
        width: Math.max(1, Math.round(r.width)),
        height: Math.max(1, Math.round(r.height)),
      };
      setSize(next);
      const s = store.getState();
      s.setUi({ viewport: next });
      if (first) {
        first = false;
        autoView = fittedView(store.getState());
        s.setUi({ view: autoView as typeof s.ui.view });
      }
    });
    ro.observe(el);
    return () => {
      ro.disconnect();
      unsub();
    };
  }, [store]);

  // Pointers: one finger drives the tool; two fingers pinch-zoom and pan (and cancel the tool's gesture).
  useEffect(() => {
    const el = wrap.current;
    if (!el) return;
    const pointers = new Map<number, ScreenPt>();
    let pinch: { dist: number; mid: ScreenPt } | null = null;
    const local = (e: PointerEvent | WheelEvent): ScreenPt => {
      const r = el.getBoundingClientRect();
      return screenPt(e.clientX - r.left, e.clientY - r.top);
    };
    const kind = (e: PointerEvent) =>
      e.pointerType === 'touch' || e.pointerType === 'pen' ? e.pointerType : 'mouse';
    const pinchInfo = () => {
      const [a, b] = [...pointers.values()];
      return {
        dist: Math.hypot(b[0] - a[0], b[1] - a[1]),
        mid: screenPt((a[0] + b[0]) / 2, (a[1] + b[1]) / 2),
      };
    };
    const down = (e: PointerEvent) => {
      if (e.pointerType === 'mouse' && e.button !== 0) return;
      el.setPointerCapture?.(e.pointerId);
      pointers.set(e.pointerId, local(e));
      if (pointers.size === 1) machine.pointerDown(local(e), kind(e));
      else if (pointers.size === 2) {
        machine.cancel();
        pinch = pinchInfo();
      }
      e.preventDefault();
    };
    const move = (e: PointerEvent) => {
      if (!pointers.has(e.pointerId)) {
        if (e.pointerType === 'mouse') machine.pointerMove(local(e), 'mouse');
        return;
      }
      pointers.set(e.pointerId, local(e));
      if (pointers.size === 1) machine.pointerMove(local(e), kind(e));
      else if (pointers.size === 2 && pinch) {
        const now = pinchInfo();
        const s = store.getState();
        let view = zoomAt(s.ui.view, now.mid, now.dist / (pinch.dist || 1));
        view = panBy(view, now.mid[0] - pinch.mid[0], now.mid[1] - pinch.mid[1]);
        s.setUi({ view });
        pinch = now;
      }
    };
    const up = (e: PointerEvent) => {
      if (!pointers.has(e.pointerId)) return;
      const wasSingle = pointers.size === 1 && !pinch;
      pointers.delete(e.pointerId);
      if (wasSingle) machine.pointerUp(local(e), kind(e));
      if (pointers.size === 0) pinch = null;
    };
    const cancel = (e: PointerEvent) => {
      pointers.delete(e.pointerId);
      machine.cancel();
      if (pointers.size < 2) pinch = null;
    };
    const wheel = (e: WheelEvent) => {
      e.preventDefault();
      const s = store.getState();
      // Pinch on a trackpad arrives as ctrl+wheel with small deltas; a mouse wheel as larger steps.
      const factor = Math.exp(-e.deltaY * (e.ctrlKey ? 0.01 : 0.0015));
      s.setUi({ view: zoomAt(s.ui.view, local(e), factor) });
    };
    el.addEventListener('pointerdown', down);
    el.addEventListener('pointermove', move);
    el.addEventListener('pointerup', up);
    el.addEventListener('pointercancel', cancel);
    el.addEventListener('wheel', wheel, { passive: false });
    return () => {
      el.removeEventListener('pointerdown', down);
      el.removeEventListener('pointermove', move);
      el.removeEventListener('pointerup', up);
      el.removeEventListener('pointercancel', cancel);
      el.removeEventListener('wheel', wheel);
    };
  }, [machine, store]);

  // Keyboard shortcuts on desktop (never while typing in a field).
  useEffect(() => {
    const key = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (t && (t.isContentEditable || /^(INPUT|TEXTAREA|SELECT)$/.test(t.tagName))) return;
      const s = store.getState();
      if (e.key === 'Escape') {
        if (machine.state() !== 'idle') machine.cancel();
        else if (s.ui.tool !== 'select')
          s.setUi({ tool: 'select', toolState: 'idle', drawing: [], cursor: null, creating: null });
        else s.setUi({ selection: null });
        return;
      }
      if (e.key === 'Enter' && s.ui.tool === 'outline') return;
      const cmd = commandForKey(e);
      if (cmd && s.run(cmd, undefined)) e.preventDefault();
    };
    window.addEventListener('keydown', key);
    return () => window.removeEventListener('keydown', key);
  }, [machine, store]);

  const doc = useEditor((s) => s.doc);
  const plan = useEditor((s) => s.plan.plan);
  const ui = useEditor((s) => s.ui);
  const meta = useEditor((s) => s.meta);
  const view = ui.view;
  const supports = visibleSupports({ doc, plan: { plan, planDoc: null, error: null, ms: null } });
  const selection = ui.selection;
  const sel = (k: string) => (selection && selection.kind === k ? selection.index : null);
  const editable = !meta.readOnly;
  const joists = plan ? plan.members.filter((m) => m.kind === 'joist').length : 0;
  const flagCount = plan ? plan.flags.filter((f) => f.code !== 'caution').length : 0;
  // Screen positions of row mid-points and corners: what a person sees, for assistive tech and tests.
  const rowsOnScreen = supports.rows.map((r) => {
    const m = toScreen(view, [(r.a[0] + r.b[0]) / 2, (r.a[1] + r.b[1]) / 2]);
    return [Math.round(m[0]), Math.round(m[1])];
  });
  const cornersOnScreen = doc.outline.map((p) => {
    const m = toScreen(view, p);
    return [Math.round(m[0]), Math.round(m[1])];
  });

  return (
    <div
      ref={wrap}
      data-testid="plan-canvas"
      data-tool={ui.tool}
      data-tool-state={ui.toolState}
      data-scale={view.scale.toFixed(5)}
      data-joists={joists}
      data-rows={JSON.stringify(rowsOnScreen)}
      data-corners={JSON.stringify(cornersOnScreen)}
      className="absolute inset-0 touch-none select-none overflow-hidden"
      style={{ touchAction: 'none', cursor: ui.tool === 'select' ? 'default' : 'crosshair' }}
    >
      <p className="sr-only" aria-live="polite" data-testid="plan-summary">
        {plan
          ? `Frame: ${joists} joists, ${supports.rows.length} support rows, ${flagCount} flags.`
          : 'Working out the frame.'}
      </p>
      {size ? (
        <Stage width={size.width} height={size.height} listening={false}>
          <Layer listening={false}>
            <Shape
              sceneFunc={(c) => {
                const ctx = native(c);
                drawGrid(ctx, view, size.width, size.height);
              }}
            />
          </Layer>
          <Layer listening={false}>
            <Shape
              sceneFunc={(c) => {
                const ctx = native(c);
                const outline = doc.outline;
                drawDeckFill(ctx, view, outline);
                if (plan && ui.layers.boards) drawBoards(ctx, view, plan.boards, doc.board.widthMm);
                if (plan) drawSteps(ctx, view, plan.steps, sel('step'));
                drawSupportRows(ctx, view, supports.rows, {
                  selected: sel('support'),
                  placed: supports.placed,
                  handles: false,
                });
                if (plan && ui.layers.frame) drawMembers(ctx, view, plan.members);
                drawOutlineEdge(ctx, view, outline, ui.tool === 'outline');
              }}
            />
          </Layer>
          <Layer listening={false}>
            <Shape
              sceneFunc={(c) => {
                const ctx = native(c);
                const outline = doc.outline;
                if (ui.layers.dimensions && ui.tool !== 'outline') {
                  drawOverall(ctx, view, outline, meta.units);
                  drawRowChain(ctx, view, outline, supports.rows, doc.boardAngleDeg, meta.units);
                  if (plan && ui.layers.frame) drawJoistCentres(ctx, view, plan, meta.units);
                }
                if (ui.tool !== 'outline') {
                  drawSides(ctx, view, outline, {
                    units: meta.units,
                    selected: sel('side'),
                    handles: editable && ui.tool === 'select',
                  });
                }
                drawSupportRows(ctx, view, supports.rows, {
                  selected: sel('support'),
                  placed: supports.placed,
                  handles: editable,
                });
                if (ui.creating) {
                  drawSupportRows(ctx, view, [{ ...ui.creating, kind: 'blocks' }], {
                    selected: 0,
                    placed: false,
                    handles: true,
                  });
                }
                if (plan) drawFlags(ctx, view, plan.flags, sel('flag'));
                if (editable && ui.tool === 'select')
                  drawCornerHandles(ctx, view, outline, sel('corner'));
                if (ui.tool === 'outline') drawDrawing(ctx, view, ui.drawing, ui.cursor);
                drawScaleBar(ctx, view, size.height, meta.units, bottomInset);
                drawAxisMarker(ctx, size.width, doc.boardAngleDeg);
              }}
            />
          </Layer>
        </Stage>
      ) : null}
    </div>
  );
}
