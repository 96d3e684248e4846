import { describe, expect, it } from 'vitest';
import { undo } from './history';
import {
  addDrawingCorner,
  addDrawingSide,
  closeOutline,
  deleteCorner,
  insertCorner,
  setSide,
} from './outline';
import { outlineTool } from './view';
import { makeStore } from '../test-support/fixtures';

describe('outline commands', () => {
  it('draws a 6 m x 4 m outline from one tap and typed sides, as one undo step', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(outlineTool, undefined);
    s().run(addDrawingCorner, { at: [1000, 1000] });
    s().run(addDrawingSide, { lengthMm: 6000, angleDeg: 0 });
    s().run(addDrawingSide, { lengthMm: 4000, angleDeg: 90 });
    s().run(addDrawingSide, { lengthMm: 6000, angleDeg: 180 });
    expect(s().ui.drawing).toEqual([
      [1000, 1000],
      [7000, 1000],
      [7000, 5000],
      [1000, 5000],
    ]);
    // The last side typed back onto the first corner closes the shape.
    s().run(addDrawingSide, { lengthMm: 4000, angleDeg: 270 });
    expect(s().doc.outline).toHaveLength(4);
    expect(s().doc.outline[2]).toEqual([7000, 5000]);
    expect(s().ui.tool).toBe('select');
    expect(s().history.undos).toHaveLength(1);
    s().run(undo, undefined);
    expect(s().doc.outline[0]).toEqual([0, 0]);
  });

  it('will not close a shape whose sides cross', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(outlineTool, undefined);
    for (const p of [
      [0, 0],
      [1000, 1000],
      [1000, 0],
      [0, 1000],
    ] as [number, number][])
      s().run(addDrawingCorner, { at: p });
    expect(s().run(closeOutline, undefined)).toBe(false);
  });

  it('undo while drawing takes back the last corner, not the last saved edit', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(outlineTool, undefined);
    s().run(addDrawingCorner, { at: [0, 0] });
    s().run(addDrawingCorner, { at: [1000, 0] });
    s().run(undo, undefined);
    expect(s().ui.drawing).toEqual([[0, 0]]);
  });

  it('setting a side length pushes the far side out, keeping a rectangle square', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(setSide, { index: 0, lengthMm: 7200 });
    expect(s().doc.outline).toEqual([
      [0, 0],
      [7200, 0],
      [7200, 4000],
      [0, 4000],
    ]);
  });

  it('setting a side angle turns it about its first corner', () => {
    const store = makeStore();
    const s = () => store.getState();
    s().run(setSide, { index: 0, angleDeg: 45, moveNext: false });
    const [x, y] = s().doc.outline[1];
    expect(x).toBeCloseTo(6000 * Math.SQRT1_2, 1);
    expect(y).toBeCloseTo(6000 * Math.SQRT1_2, 1);
    expect(s().doc.outline[2]).toEqual([6000, 4000]);
  });

  it('rejects a zero or negative side length', () => {
    const store = makeStore();
    expect(store.getState().run(setSide, { index: 0, lengthMm: 0 })).toBe(false);
    expect(store.getState().run(setSide, { index: 0, lengthMm: -5 })).toBe(false);
  });

  it('inserts a corner mid-side and renumbers steps on later sides', () => {
    const store = makeStore();
    const s = () => store.getState();
    store.setState({
      doc: { ...s().doc, steps: [{ edge: 2, offsetMm: 0, widthMm: 0, count: 2, treadBoards: 3 }] },
    });
    s().run(insertCorner, { side: 0 });
    expect(s().doc.outline[1]).toEqual([3000, 0]);
    expect(s().doc.steps[0].edge).toBe(3);
    expect(s().ui.selection).toEqual({ kind: 'corner', index: 1 });
  });

  it('deletes a corner, dropping steps on the side that disappears', () => {
    const store = makeStore();
    const s = () => store.getState();
    store.setState({
      doc: {
        ...s().doc,
        steps: [
          { edge: 1, offsetMm: 0, widthMm: 0, count: 2, treadBoards: 3 },
          { edge: 3, offsetMm: 0, widthMm: 0, count: 1, treadBoards: 3 },
        ],
      },
    });
    s().run(deleteCorner, { index: 1 });
    expect(s().doc.outline).toEqual([
      [0, 0],
      [6000, 4000],
      [0, 4000],
    ]);
    expect(s().doc.steps.map((st) => st.edge)).toEqual([2]);
    expect(s().run(deleteCorner, { index: 0 })).toBe(false);
  });
});
