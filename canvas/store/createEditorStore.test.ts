import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/engine/schema';
import { redo, undo, deleteSelection } from '../commands/history';
import { setInputs } from '../commands/inputs';
import { moveCorner, setSide } from '../commands/outline';
import { moveSupport } from '../commands/supports';
import { createSyncPlanner } from '../planner';
import { makeStore, tinyPlan } from '../test-support/fixtures';

describe('editor store', () => {
  it('records an edit, undoes and redoes it', () => {
    const store = makeStore();
    const s = () => store.getState();
    expect(s().run(setInputs, { heightMm: 800 })).toBe(true);
    expect(s().doc.heightMm).toBe(800);
    expect(s().editSeq).toBe(1);
    s().run(undo, undefined);
    expect(s().doc.heightMm).toBe(450);
    s().run(redo, undefined);
    expect(s().doc.heightMm).toBe(800);
    expect(s().editSeq).toBe(3);
  });

  it('refuses invalid inputs through the shared schema', () => {
    const store = makeStore();
    expect(store.getState().run(setInputs, { joistCentresMm: 50 })).toBe(false);
    expect(store.getState().doc.joistCentresMm).toBe(400);
    expect(store.getState().history.undos).toHaveLength(0);
  });

  it('folds a whole drag into one undo step', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().mark('Move corner');
    for (let x = 6010; x <= 6500; x += 10) s().run(moveCorner, { index: 1, to: [x, 0] });
    s().commit();
    expect(s().doc.outline[1]).toEqual([6500, 0]);
    expect(s().history.undos).toHaveLength(1);
    s().run(undo, undefined);
    expect(s().doc.outline[1]).toEqual([6000, 0]);
  });

  it('Escape during a drag puts the corner back and records nothing', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().mark('Move corner');
    s().run(moveCorner, { index: 2, to: [7000, 5000] });
    s().bail();
    expect(s().doc.outline[2]).toEqual([6000, 4000]);
    expect(s().history.undos).toHaveLength(0);
  });

  it('loading from the server never enters history and is not an edit', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(setInputs, { heightMm: 800 });
    s().load({ ...exampleDesign(), heightMm: 999 }, 7);
    expect(s().doc.heightMm).toBe(999);
    expect(s().save.version).toBe(7);
    expect(s().history.undos).toHaveLength(0);
    expect(s().editSeq).toBe(1);
  });

  it('read-only viewers cannot edit, but can change the view', () => {
    const store = makeStore({
      meta: { designId: 'd', jobId: 'j', name: 'n', readOnly: true, units: 'metric' },
    });
    const s = () => store.getState();
    expect(s().run(moveCorner, { index: 0, to: [10, 10] })).toBe(false);
    expect(s().doc.outline[0]).toEqual([0, 0]);
  });

  it('dragging an engine-placed support row makes the rows the user’s, undo hands them back', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().setPlan(tinyPlan(), s().doc, 1);
    s().mark('Move support row');
    s().run(moveSupport, { index: 0, a: [1200, 0], b: [1200, 4000] });
    s().run(moveSupport, { index: 0, a: [1000, 0], b: [1000, 4000] });
    s().commit();
    expect(s().doc.supports).toEqual([
      { a: [1000, 0], b: [1000, 4000], kind: 'blocks' },
      { a: [4000, 0], b: [4000, 4000], kind: 'blocks' },
    ]);
    s().run(undo, undefined);
    expect(s().doc.supports).toEqual([]);
  });

  it('deletes the selected corner', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().setUi({ selection: { kind: 'corner', index: 2 } });
    s().run(deleteSelection, undefined);
    expect(s().doc.outline).toHaveLength(3);
    expect(s().ui.selection).toBeNull();
  });

  it('asks the planner for a plan on every document change and stores the result', () => {
    const seen: number[] = [];
    const queue: (() => void)[] = [];
    const planner = createSyncPlanner(
      (doc) => {
        seen.push(doc.outline[1][0]);
        return tinyPlan(doc);
      },
      (fn) => queue.push(fn),
    );
    const store = makeStore({ planner });
    const s = () => store.getState();
    s().run(setSide, { index: 0, lengthMm: 7000 });
    s().run(setSide, { index: 0, lengthMm: 8000 });
    while (queue.length) queue.shift()!();
    // Requests coalesce: the engine ran once, with the latest document.
    expect(seen).toEqual([8000]);
    expect(s().plan.plan?.flags[0].code).toBe('joist-span');
    expect(s().plan.planDoc).toBe(s().doc);
  });

  it('keeps the last good plan and reports the error when the engine throws', () => {
    const queue: (() => void)[] = [];
    let fail = false;
    const planner = createSyncPlanner(
      (doc) => {
        if (fail) throw new Error('outline crosses itself');
        return tinyPlan(doc);
      },
      (fn) => queue.push(fn),
    );
    const store = makeStore({ planner });
    while (queue.length) queue.shift()!();
    fail = true;
    store.getState().run(setInputs, { heightMm: 500 });
    while (queue.length) queue.shift()!();
    expect(store.getState().plan.plan).not.toBeNull();
    expect(store.getState().plan.error).toBe('outline crosses itself');
  });
});
