// Test fixtures: a store on the 6 m x 4 m example and a tiny hand-built frame plan (tests only; not an engine).
import { exampleDesign, type DesignDocument } from '@/engine/schema';
import type { FramePlan } from '@/engine/types';
import { createEditorStore, type EditorInit } from '../store/createEditorStore';

export function makeStore(over: Partial<EditorInit> = {}) {
  return createEditorStore({
    meta: { designId: 'd1', jobId: 'j1', name: 'Back garden', readOnly: false, units: 'metric' },
    doc: exampleDesign(),
    version: 3,
    ui: { viewport: { width: 800, height: 600 }, view: { scale: 0.1, x: 100, y: 500 } },
    ...over,
  });
}

/** Two support rows across a 6 m deck and one span flag, written by hand for the editor's tests. */
export function tinyPlan(doc: DesignDocument = exampleDesign()): FramePlan {
  return {
    version: 1,
    members: [
      {
        id: 'j1',
        kind: 'joist',
        ply: 1,
        a: [0, 200],
        b: [6000, 200],
        lengthMm: 6000,
        role: 'field',
      },
      { id: 'r1', kind: 'rim', ply: 1, a: [0, 0], b: [0, 4000], lengthMm: 4000 },
    ],
    boards: [],
    flags: [
      {
        code: 'joist-span',
        severity: 'error',
        at: [3000, 2000],
        memberId: 'j1',
        valueMm: 2000,
        limitMm: 1500,
        message: 'Joist span 2000 mm is over 1500 mm',
        source: 'common practice',
        explain: 'span between rows 2000 mm > 1500 mm',
      },
    ],
    supportRows: [
      { id: 's1', a: [2000, 0], b: [2000, 4000], kind: 'blocks', placed: true },
      { id: 's2', a: [4000, 0], b: [4000, 4000], kind: 'blocks', placed: true },
    ],
    steps: [],
    joins: [],
    buttJoints: [],
    quantities: [],
    cutList: {
      joists: { count: 0, stock: [], lowerBound: 0, optimal: true },
      boards: { count: 0, stock: [], lowerBound: 0, optimal: true },
    },
    outline: doc.outline,
    bounds: { minX: 0, minY: 0, maxX: 6000, maxY: 4000 },
    areaM2: 24,
  };
}
