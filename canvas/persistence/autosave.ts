// Autosave: shortly after edits, PUT the document with the version last seen; keep a local draft until
// the server confirms; report saved / unsaved / saving / offline / conflict / error in the store.
import type { EditorStore } from '../store/createEditorStore';
import type { DesignApi } from './api';
import { clearDrafts, writeDraft } from './drafts';

export interface AutosaveOptions {
  delayMs?: number;
  retryMs?: number;
  /** Timers, replaceable in tests. */
  setTimer?: (fn: () => void, ms: number) => unknown;
  clearTimer?: (t: unknown) => void;
}

export interface Autosave {
  /** Saves now (e.g. the user pressed Save, or the page is hiding). */
  flush(): Promise<void>;
  dispose(): void;
}

export function startAutosave(
  store: EditorStore,
  api: DesignApi,
  opts: AutosaveOptions = {},
): Autosave {
  const delay = opts.delayMs ?? 800;
  const retry = opts.retryMs ?? 5000;
  const setTimer = opts.setTimer ?? ((fn, ms) => setTimeout(fn, ms));
  const clearTimer = opts.clearTimer ?? ((t) => clearTimeout(t as ReturnType<typeof setTimeout>));
  let timer: unknown = null;
  let inFlight: Promise<void> | null = null;
  let disposed = false;

  const schedule = (ms: number) => {
    if (timer) clearTimer(timer);
    timer = setTimer(() => {
      timer = null;
      void save();
    }, ms);
  };

  async function save(): Promise<void> {
    if (disposed) return;
    const s = store.getState();
    if (s.meta.readOnly || s.save.status === 'conflict' || s.save.status === 'saved') return;
    // Mid-gesture: wait for the finger to lift, the drag is one edit.
    if (s.history.mark) return schedule(delay);
    if (inFlight) {
      await inFlight;
      return save();
    }
    const seq = s.editSeq;
    const doc = s.doc;
    const version = s.save.version;
    s.setSave({ status: 'saving', error: null });
    inFlight = (async () => {
      const r = await api.save(s.meta.designId, { version, document: doc });
      const now = store.getState();
      switch (r.kind) {
        case 'saved': {
          const changedSince = now.editSeq !== seq;
          now.setSave({
            version: r.design.version,
            status: changedSince ? 'unsaved' : 'saved',
            lastSavedAt: Date.now(),
            error: null,
          });
          if (changedSince) {
            writeDraft(now.meta.designId, r.design.version, now.doc);
            schedule(delay);
          } else {
            clearDrafts(now.meta.designId);
          }
          break;
        }
        case 'conflict':
          now.setSave({
            status: 'conflict',
            conflict: {
              version: r.current.version,
              updatedAt: r.current.updatedAt,
              updatedBy: r.current.updatedBy?.name ?? null,
            },
            error: r.message,
          });
          break;
        case 'offline':
          now.setSave({ status: 'offline', error: r.message });
          schedule(retry);
          break;
        case 'error':
          now.setSave({ status: 'error', error: r.message });
          // A 5xx may pass; a 4xx will not until the document changes.
          if (r.status >= 500) schedule(retry);
          break;
        default:
          r satisfies never;
      }
    })();
    try {
      await inFlight;
    } finally {
      inFlight = null;
    }
  }

  const unsub = store.subscribe((s, prev) => {
    if (s.editSeq === prev.editSeq || s.meta.readOnly) return;
    writeDraft(s.meta.designId, s.save.version, s.doc);
    if (s.save.status !== 'conflict' && s.save.status !== 'saving')
      s.setSave({ status: 'unsaved' });
    schedule(delay);
  });

  const online = () => {
    if (store.getState().save.status === 'offline') schedule(0);
  };
  if (typeof window !== 'undefined') window.addEventListener('online', online);

  return {
    flush: () => {
      if (timer) clearTimer(timer);
      timer = null;
      return save();
    },
    dispose() {
      disposed = true;
      if (timer) clearTimer(timer);
      unsub();
      if (typeof window !== 'undefined') window.removeEventListener('online', online);
    },
  };
}
