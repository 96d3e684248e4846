'use client';
// Save state in plain words: saved, unsaved changes, saving, offline (kept on this device), conflict, error.
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import type { SaveStatus as Status } from '@/canvas/store/types';

const look: Record<Status, { text: string; dot: string }> = {
  saved: { text: 'Saved', dot: 'bg-moss-500' },
  unsaved: { text: 'Unsaved changes', dot: 'bg-larch-400' },
  saving: { text: 'Saving…', dot: 'bg-tarn-500 animate-pulse' },
  offline: { text: 'Offline: kept on this device', dot: 'bg-ash-500' },
  conflict: { text: 'Someone else saved', dot: 'bg-clay-600' },
  error: { text: 'Not saved', dot: 'bg-clay-600' },
};

export function SaveStatus() {
  const store = useEditorStore();
  const save = useEditor((s) => s.save);
  const l = look[save.status];
  return (
    <button
      type="button"
      data-testid="save-status"
      data-status={save.status}
      title={save.error ?? undefined}
      onClick={() => {
        if (save.status === 'conflict') store.getState().setSave({ ...save });
      }}
      className="inline-flex min-h-11 items-center gap-2 rounded-lg px-2 text-sm font-medium text-ash-800"
      aria-live="polite"
    >
      <span aria-hidden="true" className={`size-2.5 rounded-full ${l.dot}`} />
      <span className="whitespace-nowrap">{l.text}</span>
    </button>
  );
}
