'use client';
// Offers back unsaved work kept on this device after a reload or a crash.
import { clearDrafts, type Draft } from '@/canvas/persistence/drafts';
import { useEditorStore } from '@/canvas/store/EditorStoreProvider';

export function DraftBanner({ draft, onDone }: { draft: Draft; onDone: () => void }) {
  const store = useEditorStore();
  const at = new Date(draft.savedAt);
  return (
    <div
      role="status"
      data-testid="draft-banner"
      className="flex flex-wrap items-center gap-2 border-b border-larch-200 bg-larch-50 px-3 py-2 text-sm text-larch-900"
    >
      <span className="flex-1">
        Changes from {at.toLocaleString([], { dateStyle: 'short', timeStyle: 'short' })} were not
        saved and are kept on this device.
      </span>
      <button
        type="button"
        className="min-h-11 rounded-lg bg-larch-600 px-3 font-semibold text-white"
        onClick={() => {
          store.getState().restoreDraft(draft.doc, draft.version);
          onDone();
        }}
      >
        Restore them
      </button>
      <button
        type="button"
        className="min-h-11 rounded-lg px-3 font-semibold text-larch-900 hover:bg-larch-100"
        onClick={() => {
          clearDrafts(draft.designId);
          onDone();
        }}
      >
        Discard
      </button>
    </div>
  );
}
