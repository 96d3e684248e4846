'use client';
// Shown when a save is refused because someone else saved first: load theirs, or keep this as a copy.
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { httpDesignApi } from '@/canvas/persistence/api';
import { clearDrafts } from '@/canvas/persistence/drafts';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import { Button } from '@/components/ui/Button';

export function ConflictDialog() {
  const store = useEditorStore();
  const router = useRouter();
  const save = useEditor((s) => s.save);
  const meta = useEditor((s) => s.meta);
  const [busy, setBusy] = useState<'reload' | 'copy' | null>(null);
  const [error, setError] = useState<string | null>(null);
  if (save.status !== 'conflict') return null;
  const who = save.conflict?.updatedBy ?? 'Someone else';
  const when = save.conflict?.updatedAt ? new Date(save.conflict.updatedAt) : null;

  const reload = async () => {
    setBusy('reload');
    setError(null);
    try {
      const d = await httpDesignApi.load(meta.designId);
      clearDrafts(meta.designId);
      store.getState().load(d.document, d.version, { name: d.name });
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Could not load the saved design');
    } finally {
      setBusy(null);
    }
  };
  const copy = async () => {
    setBusy('copy');
    setError(null);
    try {
      const d = await httpDesignApi.copy(
        meta.jobId,
        `${meta.name} (copy)`.slice(0, 120),
        store.getState().doc,
      );
      clearDrafts(meta.designId);
      router.push(`/designs/${d.id}`);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Could not save the copy');
      setBusy(null);
    }
  };

  return (
    <div
      className="fixed inset-0 z-50 flex items-end justify-center bg-spruce-950/55 p-3 sm:items-center"
      role="presentation"
    >
      <div
        role="alertdialog"
        aria-modal="true"
        aria-labelledby="conflict-title"
        aria-describedby="conflict-body"
        data-testid="conflict-dialog"
        className="w-full max-w-md rounded-2xl bg-white p-5 shadow-lift"
      >
        <h2 id="conflict-title" className="text-lg font-bold text-ash-950">
          {who} saved this design
        </h2>
        <p id="conflict-body" className="mt-2 text-sm text-ash-800">
          {who} saved a newer version
          {save.conflict && save.conflict.version > 0 ? ` (version ${save.conflict.version})` : ''}
          {when
            ? ` at ${when.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}`
            : ''}{' '}
          while you were editing. Your changes are not lost: they are kept on this device until you
          choose.
        </p>
        {error ? <p className="mt-2 text-sm font-medium text-clay-700">{error}</p> : null}
        <div className="mt-4 flex flex-col gap-2 sm:flex-row-reverse">
          <Button variant="primary" busy={busy === 'copy'} disabled={busy !== null} onClick={copy}>
            Keep mine as a copy
          </Button>
          <Button
            variant="secondary"
            busy={busy === 'reload'}
            disabled={busy !== null}
            onClick={reload}
          >
            Load their version
          </Button>
        </div>
      </div>
    </div>
  );
}
