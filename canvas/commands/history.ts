// Undo, redo and delete-selection: the history commands (while drawing, undo takes back a corner).
import { redo as redoHistory, undo as undoHistory } from '../history';
import { deleteCorner } from './outline';
import { deleteStep } from './steps';
import { deleteSupport } from './supports';
import { defineCommand, mod } from './types';
import { exhaustive } from '../exhaustive';
import type { EditorData, Selection } from '../store/types';

export const undo = defineCommand({
  id: 'history.undo',
  label: 'Undo',
  edits: true,
  keyHint: 'Ctrl+Z',
  keyTest: (e) => mod(e) && !e.shiftKey && (e.key === 'z' || e.key === 'Z'),
  predicate: (s) =>
    (s.ui.tool === 'outline' && s.ui.drawing.length > 0) || s.history.undos.length > 0,
  perform: (s) => {
    if (s.ui.tool === 'outline' && s.ui.drawing.length > 0) {
      return { ui: { drawing: s.ui.drawing.slice(0, -1) } };
    }
    const r = undoHistory(s.history, s.doc);
    return r
      ? { doc: r.doc, history: r.history, ui: { selection: keepSelection(s, r.doc) } }
      : null;
  },
});

export const redo = defineCommand({
  id: 'history.redo',
  label: 'Redo',
  edits: true,
  keyHint: 'Ctrl+Shift+Z',
  keyTest: (e) =>
    mod(e) && ((e.shiftKey && (e.key === 'z' || e.key === 'Z')) || e.key === 'y' || e.key === 'Y'),
  predicate: (s) => s.history.redos.length > 0,
  perform: (s) => {
    const r = redoHistory(s.history, s.doc);
    return r
      ? { doc: r.doc, history: r.history, ui: { selection: keepSelection(s, r.doc) } }
      : null;
  },
});

/** Drops a selection that points past the end of what the document now holds. */
function keepSelection(s: EditorData, doc: EditorData['doc']): Selection | null {
  const sel = s.ui.selection;
  if (!sel) return null;
  switch (sel.kind) {
    case 'corner':
    case 'side':
      return sel.index < doc.outline.length ? sel : null;
    case 'support':
      return sel.index < doc.supports.length ? sel : null;
    case 'step':
      return sel.index < doc.steps.length ? sel : null;
    case 'flag':
      return null;
    default:
      return exhaustive(sel);
  }
}

export const deleteSelection = defineCommand({
  id: 'edit.delete',
  label: 'Delete',
  edits: true,
  keyHint: 'Del',
  keyTest: (e) => !mod(e) && (e.key === 'Delete' || e.key === 'Backspace'),
  predicate: (s) => {
    const sel = s.ui.selection;
    if (!sel) return false;
    switch (sel.kind) {
      case 'corner':
        return deleteCorner.predicate!(s, { index: sel.index });
      case 'support':
        return deleteSupport.predicate!(s, { index: sel.index });
      case 'step':
        return deleteStep.predicate!(s, { index: sel.index });
      case 'side':
      case 'flag':
        return false;
      default:
        return exhaustive(sel);
    }
  },
  perform: (s) => {
    const sel = s.ui.selection;
    if (!sel) return null;
    switch (sel.kind) {
      case 'corner':
        return deleteCorner.perform(s, { index: sel.index });
      case 'support':
        return deleteSupport.perform(s, { index: sel.index });
      case 'step':
        return deleteStep.perform(s, { index: sel.index });
      case 'side':
      case 'flag':
        return null;
      default:
        return exhaustive(sel);
    }
  },
});

export const historyCommands = [undo, redo, deleteSelection] as const;
