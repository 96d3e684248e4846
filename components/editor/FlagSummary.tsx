'use client';
// The always-visible count of flags by severity; tapping opens the flags list.
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';

export function FlagSummary() {
  const store = useEditorStore();
  const flags = useEditor((s) => s.plan.plan?.flags);
  const pending = useEditor((s) => !s.plan.plan);
  const count = (sev: string) =>
    (flags ?? []).filter((f) => f.severity === sev && f.code !== 'caution').length;
  const errors = count('error');
  const warnings = count('warning');
  return (
    <button
      type="button"
      data-testid="flag-summary"
      onClick={() => store.getState().setUi({ panel: 'flags' })}
      className="inline-flex min-h-11 items-center gap-2 rounded-lg border border-ash-200 px-2.5 text-sm font-semibold text-ash-800 hover:bg-ash-50"
      aria-label={
        pending ? 'Checking the frame' : `${errors} errors, ${warnings} warnings: show flags`
      }
    >
      {pending ? (
        <span className="text-ash-600">Checking…</span>
      ) : (
        <>
          <span className="inline-flex items-center gap-1" data-testid="flag-count-error">
            <span
              aria-hidden="true"
              className={`size-3 rounded-full ${errors ? 'bg-clay-600' : 'bg-ash-300'}`}
            />
            {errors}
          </span>
          <span className="inline-flex items-center gap-1" data-testid="flag-count-warning">
            <span
              aria-hidden="true"
              className={`size-3 rotate-45 ${warnings ? 'bg-larch-500' : 'bg-ash-300'}`}
            />
            {warnings}
          </span>
        </>
      )}
    </button>
  );
}
