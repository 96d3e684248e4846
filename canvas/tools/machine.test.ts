import { describe, expect, it } from 'vitest';
import { undo } from '../commands/history';
import { outlineTool, supportTool } from '../commands/view';
import { screenPt, toScreen } from '../spaces';
import { makeStore, tinyPlan } from '../test-support/fixtures';
import { createToolMachine } from './machine';
import type { Pt } from '@/engine/types';

function setup() {
  const store = makeStore();
  const m = createToolMachine(store);
  const at = (p: Pt) => toScreen(store.getState().ui.view, p);
  return { store, m, at, s: () => store.getState() };
}

describe('tool machines', () => {
  it('dragging a corner moves it and makes one undo step', () => {
    const { m, at, s } = setup();
    m.pointerDown(at([6000, 4000]), 'touch');
    expect(m.state()).toBe('pointing');
    const from = at([6000, 4000]);
    for (let i = 1; i <= 10; i++) m.pointerMove(screenPt(from[0] + i * 10, from[1]), 'touch');
    expect(m.state()).toBe('dragging');
    m.pointerUp(screenPt(from[0] + 100, from[1]), 'touch');
    // 100 px at 0.1 px/mm = 1000 mm, snapped to the grid.
    expect(s().doc.outline[2]).toEqual([7000, 4000]);
    expect(s().history.undos).toHaveLength(1);
    s().run(undo, undefined);
    expect(s().doc.outline[2]).toEqual([6000, 4000]);
  });

  it('a second finger during a drag cancels it', () => {
    const { m, at, s } = setup();
    const from = at([0, 4000]);
    m.pointerDown(from, 'touch');
    m.pointerMove(screenPt(from[0] - 60, from[1] - 60), 'touch');
    m.cancel();
    expect(s().doc.outline[3]).toEqual([0, 4000]);
    expect(m.state()).toBe('idle');
  });

  it('a tap on a side selects it for typed length entry', () => {
    const { m, at, s } = setup();
    m.pointerDown(at([2000, 0]), 'touch');
    m.pointerUp(at([2000, 0]), 'touch');
    expect(s().ui.selection).toEqual({ kind: 'side', index: 0 });
    expect(s().ui.panel).toBe('side');
  });

  it('dragging the empty plan pans the view and keeps the document', () => {
    const { m, at, s } = setup();
    const before = s().ui.view;
    const p = at([3000, 2000]);
    m.pointerDown(p, 'touch');
    m.pointerMove(screenPt(p[0] + 30, p[1] + 40), 'touch');
    m.pointerUp(screenPt(p[0] + 30, p[1] + 40), 'touch');
    expect(s().ui.view.x - before.x).toBeCloseTo(30 - 0, 0);
    expect(s().history.undos).toHaveLength(0);
  });

  it('taps draw an outline and tapping the first corner closes it', () => {
    const { m, at, s } = setup();
    s().run(outlineTool, undefined);
    const pts: Pt[] = [
      [10000, 10000],
      [16000, 10000],
      [16000, 14000],
      [10000, 14000],
      [10000, 10000],
    ];
    for (const p of pts) {
      m.pointerDown(at(p), 'touch');
      m.pointerUp(at(p), 'touch');
    }
    expect(s().doc.outline).toEqual(pts.slice(0, 4));
    expect(s().ui.tool).toBe('select');
  });

  it('the support tool lays a row by dragging across the deck', () => {
    const { m, at, s } = setup();
    s().run(supportTool, undefined);
    m.pointerDown(at([3000, 0]), 'touch');
    m.pointerMove(at([3000, 2000]), 'touch');
    m.pointerUp(at([3000, 4000]), 'touch');
    expect(s().doc.supports).toEqual([{ a: [3000, 0], b: [3000, 4000], kind: 'blocks' }]);
    expect(s().ui.tool).toBe('select');
  });

  it('dragging a support row body slides it across the joists only', () => {
    const { m, at, s } = setup();
    s().setPlan(tinyPlan(), s().doc, 1);
    const p = at([2000, 1500]);
    m.pointerDown(p, 'touch');
    m.pointerMove(screenPt(p[0] - 50, p[1] - 37), 'touch');
    m.pointerMove(screenPt(p[0] - 100, p[1] - 37), 'touch');
    m.pointerUp(screenPt(p[0] - 100, p[1] - 37), 'touch');
    expect(s().doc.supports[0]).toEqual({ a: [1000, 0], b: [1000, 4000], kind: 'blocks' });
    expect(s().history.undos).toHaveLength(1);
  });

  it('read-only viewers pan but cannot drag corners', () => {
    const store = makeStore({
      meta: { designId: 'd', jobId: 'j', name: 'n', readOnly: true, units: 'imperial' },
    });
    const m = createToolMachine(store);
    const p = toScreen(store.getState().ui.view, [6000, 4000]);
    m.pointerDown(p, 'touch');
    m.pointerMove(screenPt(p[0] + 50, p[1]), 'touch');
    m.pointerUp(screenPt(p[0] + 50, p[1]), 'touch');
    expect(store.getState().doc.outline[2]).toEqual([6000, 4000]);
    expect(store.getState().ui.view.x).toBe(150);
  });
});
