// View commands: fit to deck, zoom, layer and snap toggles, tool choice. None of them enter history.
import { boundsOf } from '../geometry';
import { fitView, screenPt, zoomAt } from '../spaces';
import type { EditorData, ToolId, UiState } from '../store/types';
import { defineCommand, mod } from './types';

/** The view that shows the whole deck (and its steps) in the current viewport. */
export function fittedView(s: EditorData) {
  const pts = [...s.doc.outline, ...s.ui.drawing];
  for (const st of s.plan.plan?.steps ?? []) pts.push(...st.outline);
  const b = boundsOf(pts) ?? { minX: -1000, minY: -1000, maxX: 1000, maxY: 1000 };
  // Room around the deck for the side labels and dimension chains.
  const margin = Math.min(
    88,
    Math.max(56, Math.min(s.ui.viewport.width, s.ui.viewport.height) * 0.11),
  );
  return fitView(b, s.ui.viewport, margin);
}

export const fitToDeck = defineCommand({
  id: 'view.fit',
  label: 'Fit deck',
  edits: false,
  keyHint: 'F',
  keyTest: (e) => !mod(e) && (e.key === 'f' || e.key === 'F' || e.key === '0'),
  perform: (s) => ({ ui: { view: fittedView(s) }, history: 'ignore' }),
});

const zoomBy = (s: EditorData, f: number) =>
  zoomAt(s.ui.view, screenPt(s.ui.viewport.width / 2, s.ui.viewport.height / 2), f);

export const zoomIn = defineCommand({
  id: 'view.zoomIn',
  label: 'Zoom in',
  edits: false,
  keyHint: '+',
  keyTest: (e) => !mod(e) && (e.key === '+' || e.key === '='),
  perform: (s) => ({ ui: { view: zoomBy(s, 1.25) }, history: 'ignore' }),
});

export const zoomOut = defineCommand({
  id: 'view.zoomOut',
  label: 'Zoom out',
  edits: false,
  keyHint: '−',
  keyTest: (e) => !mod(e) && (e.key === '-' || e.key === '_'),
  perform: (s) => ({ ui: { view: zoomBy(s, 0.8) }, history: 'ignore' }),
});

export const toggleLayer = defineCommand<{ layer: keyof UiState['layers'] }>({
  id: 'view.toggleLayer',
  label: 'Show or hide',
  edits: false,
  perform: (s, { layer }) => ({
    ui: { layers: { ...s.ui.layers, [layer]: !s.ui.layers[layer] } },
    history: 'ignore',
  }),
});

export const toggleBoards = defineCommand({
  id: 'view.toggleBoards',
  label: 'Boards',
  edits: false,
  keyHint: 'B',
  keyTest: (e) => !mod(e) && (e.key === 'b' || e.key === 'B'),
  perform: (s) => toggleLayer.perform(s, { layer: 'boards' }),
});

export const toggleSnap = defineCommand<{ snap: keyof UiState['snap'] }>({
  id: 'view.toggleSnap',
  label: 'Snap',
  edits: false,
  perform: (s, { snap }) => ({
    ui: { snap: { ...s.ui.snap, [snap]: !s.ui.snap[snap] } },
    history: 'ignore',
  }),
});

/** Switches tool; starting the outline tool begins a new outline from scratch. */
export const setTool = defineCommand<{ tool: ToolId }>({
  id: 'tool.set',
  label: 'Tool',
  edits: false,
  predicate: (s, { tool }) => tool === 'select' || !s.meta.readOnly,
  perform: (s, { tool }) => ({
    ui: {
      tool,
      toolState: 'idle',
      drawing: [],
      cursor: null,
      creating: null,
      selection: tool === 'select' ? s.ui.selection : null,
      panel: tool === 'outline' ? 'side' : s.ui.panel,
    },
    history: 'ignore',
  }),
});

export const selectTool = defineCommand({
  id: 'tool.select',
  label: 'Select and move',
  edits: false,
  keyHint: 'V',
  keyTest: (e) => !mod(e) && (e.key === 'v' || e.key === 'V'),
  perform: (s) => setTool.perform(s, { tool: 'select' }),
});

export const outlineTool = defineCommand({
  id: 'tool.outline',
  label: 'Draw outline',
  edits: true,
  keyHint: 'O',
  keyTest: (e) => !mod(e) && (e.key === 'o' || e.key === 'O'),
  perform: (s) => setTool.perform(s, { tool: 'outline' }),
});

export const supportTool = defineCommand({
  id: 'tool.support',
  label: 'Add support row',
  edits: true,
  keyHint: 'S',
  keyTest: (e) => !mod(e) && (e.key === 's' || e.key === 'S'),
  perform: (s) => setTool.perform(s, { tool: 'support' }),
});

export const viewCommands = [
  fitToDeck,
  zoomIn,
  zoomOut,
  toggleLayer,
  toggleBoards,
  toggleSnap,
  setTool,
  selectTool,
  outlineTool,
  supportTool,
] as const;
