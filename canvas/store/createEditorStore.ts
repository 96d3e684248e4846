// One zustand store per editor instance (vanilla factory; the provider holds it in a ref).
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { DesignDocument } from '@/engine/schema';
import type { FramePlan } from '@/engine/types';
import type { Command, CommandResult } from '../commands/types';
import { bailToMark, commitMark, emptyHistory, mark, record } from '../history';
import type { Planner } from '../planner';
import type { EditorData, EditorMeta, SaveState, UiState } from './types';

export interface EditorActions {
  /** Runs a registered command if its predicate allows; returns whether it did anything. */
  run<A>(command: Command<A>, args: A): boolean;
  /** Opens a gesture: every edit until commit folds into one undo step. */
  mark(label: string): void;
  /** Closes the gesture (pointer-up). */
  commit(): void;
  /** Abandons the gesture and puts the document back (Escape, a second finger). */
  bail(): void;
  /** View and tool state that never enters history. */
  setUi(patch: Partial<UiState>): void;
  setSave(patch: Partial<SaveState>): void;
  /** Replaces the document from the server: no history, not an edit. */
  load(doc: DesignDocument, version: number, meta?: Partial<EditorMeta>): void;
  /** Replaces the document with a local draft: an edit (it needs saving) but history starts afresh. */
  restoreDraft(doc: DesignDocument, version: number): void;
  setPlan(
    plan: FramePlan | null,
    forDoc: DesignDocument,
    ms: number | null,
    error?: string | null,
    via?: 'worker' | 'main',
  ): void;
}

export type EditorState = EditorData & EditorActions;
export type EditorStore = StoreApi<EditorState>;

export interface EditorInit {
  meta: EditorMeta;
  doc: DesignDocument;
  version: number;
  planner?: Planner | null;
  ui?: Partial<UiState>;
}

export function defaultUi(): UiState {
  return {
    tool: 'select',
    toolState: 'idle',
    selection: null,
    drawing: [],
    cursor: null,
    creating: null,
    snapHint: null,
    snap: { grid: true, angle: true, points: true },
    layers: { boards: false, dimensions: true, frame: true },
    view: { scale: 0.1, x: 100, y: 500 },
    viewport: { width: 800, height: 600 },
    panel: 'inputs',
  };
}

/** Creates an editor store; with a planner, every document change asks it for a new frame plan. */
export function createEditorStore(init: EditorInit): EditorStore {
  const store = createStore<EditorState>()((set, get) => {
    const apply = (result: CommandResult, label: string) => {
      const s = get();
      const patch: Partial<EditorData> = {};
      if (result.ui) patch.ui = { ...s.ui, ...result.ui };
      if (result.doc && result.doc !== s.doc) {
        patch.doc = result.doc;
        patch.editSeq = s.editSeq + 1;
        if (typeof result.history === 'object') patch.history = result.history;
        else if (result.history !== 'ignore')
          patch.history = record(s.history, s.doc, result.doc, label);
      } else if (typeof result.history === 'object') {
        patch.history = result.history;
      }
      set(patch);
    };

    return {
      meta: init.meta,
      doc: init.doc,
      history: emptyHistory(),
      ui: { ...defaultUi(), ...init.ui },
      plan: { plan: null, planDoc: null, error: null, ms: null },
      save: {
        status: 'saved',
        version: init.version,
        lastSavedAt: null,
        conflict: null,
        error: null,
      },
      editSeq: 0,

      run(command, args) {
        const s = get();
        if (command.edits && s.meta.readOnly) return false;
        if (command.predicate && !command.predicate(s, args)) return false;
        const result = command.perform(s, args);
        if (!result) return false;
        apply(result, command.label);
        return true;
      },
      mark(label) {
        const s = get();
        if (s.meta.readOnly) return;
        set({ history: mark(s.history, s.doc, label) });
      },
      commit() {
        const s = get();
        set({ history: commitMark(s.history, s.doc) });
      },
      bail() {
        const s = get();
        const r = bailToMark(s.history);
        if (!r.doc) return;
        const back = r.doc !== s.doc;
        set({
          history: r.history,
          ...(back ? { doc: r.doc, editSeq: s.editSeq + 1 } : {}),
        });
      },
      setUi(patch) {
        set({ ui: { ...get().ui, ...patch } });
      },
      setSave(patch) {
        set({ save: { ...get().save, ...patch } });
      },
      load(doc, version, meta) {
        const s = get();
        set({
          doc,
          history: emptyHistory(),
          meta: meta ? { ...s.meta, ...meta } : s.meta,
          save: { ...s.save, version, status: 'saved', conflict: null, error: null },
          ui: { ...s.ui, selection: null, drawing: [], creating: null },
        });
      },
      restoreDraft(doc, version) {
        const s = get();
        set({
          doc,
          history: emptyHistory(),
          editSeq: s.editSeq + 1,
          save: { ...s.save, version, status: 'unsaved' },
        });
      },
      setPlan(plan, forDoc, ms, error = null, via) {
        set({ plan: { plan, planDoc: forDoc, ms, error, via } });
      },
    };
  });

  const planner = init.planner;
  if (planner) {
    planner.onResult((r) => {
      const cur = store.getState().plan;
      // A failed recompute keeps the last good plan on screen and says why.
      if (r.ok) store.getState().setPlan(r.plan, r.doc, r.ms, null, r.via);
      else store.getState().setPlan(cur.plan, r.doc, r.ms, r.error, r.via);
    });
    planner.request(init.doc);
    store.subscribe((s, prev) => {
      if (s.doc !== prev.doc) planner.request(s.doc);
    });
  }
  return store;
}
