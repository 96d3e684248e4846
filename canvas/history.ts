// Undo history of design documents: top-level key diffs, marks that fold a whole drag into one entry.
import type { DesignDocument } from '@/engine/schema';

type Key = keyof DesignDocument;

/** One undoable step: the changed top-level keys before and after. */
export interface HistoryEntry {
  label: string;
  before: Partial<DesignDocument>;
  after: Partial<DesignDocument>;
}

export interface HistoryState {
  undos: HistoryEntry[];
  redos: HistoryEntry[];
  /** Set on pointer-down: the document before the gesture; edits until commit fold into one entry. */
  mark: { label: string; base: DesignDocument } | null;
}

export const MAX_HISTORY = 200;

export const emptyHistory = (): HistoryState => ({ undos: [], redos: [], mark: null });

/** The keys whose values differ (documents are immutable, so reference equality is enough). */
export function diffDocs(
  prev: DesignDocument,
  next: DesignDocument,
): Pick<HistoryEntry, 'before' | 'after'> | null {
  const before: Record<string, unknown> = {};
  const after: Record<string, unknown> = {};
  let changed = false;
  const keys = new Set([...Object.keys(prev), ...Object.keys(next)] as Key[]);
  for (const k of keys) {
    if (prev[k] !== next[k]) {
      before[k] = prev[k];
      after[k] = next[k];
      changed = true;
    }
  }
  return changed
    ? { before: before as Partial<DesignDocument>, after: after as Partial<DesignDocument> }
    : null;
}

/** Records prev → next. While a mark is open the edit folds into the gesture and nothing is pushed. */
export function record(
  h: HistoryState,
  prev: DesignDocument,
  next: DesignDocument,
  label: string,
): HistoryState {
  if (h.mark || prev === next) return h;
  const d = diffDocs(prev, next);
  if (!d) return h;
  const undos = [...h.undos, { label, ...d }];
  if (undos.length > MAX_HISTORY) undos.shift();
  return { undos, redos: [], mark: null };
}

/** Opens a gesture (pointer-down). */
export function mark(h: HistoryState, base: DesignDocument, label: string): HistoryState {
  return { ...h, mark: { label, base } };
}

/** Closes the gesture (pointer-up): one entry from the marked document to the current one. */
export function commitMark(h: HistoryState, current: DesignDocument): HistoryState {
  if (!h.mark) return h;
  const { base, label } = h.mark;
  return record({ ...h, mark: null }, base, current, label);
}

/** Abandons the gesture (Escape): the document to go back to, and the history without the mark. */
export function bailToMark(h: HistoryState): { history: HistoryState; doc: DesignDocument | null } {
  if (!h.mark) return { history: h, doc: null };
  return { history: { ...h, mark: null }, doc: h.mark.base };
}

/** Steps back one entry; returns null when there is nothing to undo. */
export function undo(
  h: HistoryState,
  doc: DesignDocument,
): { history: HistoryState; doc: DesignDocument } | null {
  const entry = h.undos[h.undos.length - 1];
  if (!entry || h.mark) return null;
  return {
    doc: { ...doc, ...entry.before },
    history: { undos: h.undos.slice(0, -1), redos: [...h.redos, entry], mark: null },
  };
}

/** Steps forward one entry; returns null when there is nothing to redo. */
export function redo(
  h: HistoryState,
  doc: DesignDocument,
): { history: HistoryState; doc: DesignDocument } | null {
  const entry = h.redos[h.redos.length - 1];
  if (!entry || h.mark) return null;
  return {
    doc: { ...doc, ...entry.after },
    history: { undos: [...h.undos, entry], redos: h.redos.slice(0, -1), mark: null },
  };
}
