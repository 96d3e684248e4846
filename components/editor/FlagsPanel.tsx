'use client';
// The flags the engine raised, grouped by severity (identical ones folded with a count); tapping one
// zooms the plan to it and explains it: message, working, source, and the standing caution.
import { focusFlag } from '@/canvas/commands/flags';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import type { Flag, Severity } from '@/engine/types';
import { STANDING_CAUTION } from '@/engine/codes';
import { formatLength } from '@/lib/units';

const groups: { severity: Severity; title: string; tone: string; mark: string }[] = [
  {
    severity: 'error',
    title: 'Over the limit',
    tone: 'border-clay-200 bg-clay-50 text-clay-800',
    mark: 'bg-clay-600',
  },
  {
    severity: 'warning',
    title: 'Check these',
    tone: 'border-larch-200 bg-larch-50 text-larch-900',
    mark: 'bg-larch-500 rotate-45',
  },
  {
    severity: 'info',
    title: 'For information',
    tone: 'border-tarn-100 bg-tarn-100/40 text-tarn-800',
    mark: 'border-2 border-tarn-500',
  },
];

interface Folded {
  first: number;
  indices: number[];
  flag: Flag;
}

function fold(flags: Flag[], severity: Severity): Folded[] {
  const map = new Map<string, Folded>();
  flags.forEach((f, i) => {
    if (f.severity !== severity || f.code === 'caution') return;
    const k = `${f.code}|${f.message}`;
    const g = map.get(k);
    if (g) g.indices.push(i);
    else map.set(k, { first: i, indices: [i], flag: f });
  });
  return [...map.values()];
}

export function FlagsPanel() {
  const store = useEditorStore();
  const plan = useEditor((s) => s.plan.plan);
  const error = useEditor((s) => s.plan.error);
  const selection = useEditor((s) => s.ui.selection);
  const units = useEditor((s) => s.meta.units);
  if (!plan) return <p className="text-sm text-ash-600">Checking the frame…</p>;
  const selected = selection?.kind === 'flag' ? plan.flags[selection.index] : null;
  const total = plan.flags.filter((f) => f.code !== 'caution').length;

  return (
    <div className="flex flex-col gap-4" data-testid="flags-panel">
      {error ? (
        <p className="rounded-lg border border-clay-200 bg-clay-50 p-2 text-sm text-clay-800">
          The frame could not be worked out for the latest change: {error}
        </p>
      ) : null}
      {selected ? (
        <article
          data-testid="flag-detail"
          className="rounded-xl border-2 border-larch-400 bg-white p-3 text-sm shadow-card"
        >
          <h3 className="font-bold text-ash-950">{selected.message}</h3>
          {selected.valueMm !== undefined && selected.limitMm !== undefined ? (
            <p className="mt-1 font-semibold">
              {formatLength(selected.valueMm, units)} against a limit of{' '}
              {formatLength(selected.limitMm, units)}
            </p>
          ) : null}
          {selected.explain ? (
            <p className="mt-2 whitespace-pre-line text-ash-800">{selected.explain}</p>
          ) : null}
          {selected.source ? (
            <p className="mt-2 text-ash-700">
              <span className="font-semibold">Source:</span> {selected.source}
            </p>
          ) : null}
          <p className="mt-2 rounded-md bg-larch-50 p-2 text-xs text-larch-900">
            {STANDING_CAUTION}
          </p>
          <button
            type="button"
            className="mt-2 min-h-11 rounded-lg px-2 text-sm font-semibold text-spruce-800 hover:bg-spruce-50"
            onClick={() => store.getState().setUi({ selection: null })}
          >
            Close
          </button>
        </article>
      ) : null}
      {total === 0 ? (
        <p
          className="rounded-lg border border-moss-100 bg-moss-100/50 p-3 text-sm text-moss-800"
          data-testid="no-flags"
        >
          Nothing over its limit. The checks cover spans, cantilevers, board spans, joints, pads and
          steps.
        </p>
      ) : null}
      {groups.map((g) => {
        const items = fold(plan.flags, g.severity);
        if (!items.length) return null;
        const count = items.reduce((n, it) => n + it.indices.length, 0);
        return (
          <section
            key={g.severity}
            aria-label={`${g.title}: ${count}`}
            data-testid={`flags-${g.severity}`}
          >
            <h3 className="mb-1.5 flex items-center gap-2 text-sm font-bold text-ash-900">
              <span aria-hidden="true" className={`size-3 rounded-full ${g.mark}`} />
              {g.title} ({count})
            </h3>
            <ul className="flex flex-col gap-1.5">
              {items.map((it) => {
                const active = selection?.kind === 'flag' && it.indices.includes(selection.index);
                return (
                  <li key={it.first}>
                    <button
                      type="button"
                      data-testid="flag-item"
                      data-code={it.flag.code}
                      className={`min-h-11 w-full rounded-lg border px-3 py-2 text-left text-sm ${g.tone} ${active ? 'ring-2 ring-larch-500' : ''}`}
                      onClick={() => {
                        // Repeated taps step through the places this flag occurs.
                        const cur =
                          selection?.kind === 'flag' ? it.indices.indexOf(selection.index) : -1;
                        const next = it.indices[(cur + 1) % it.indices.length];
                        store.getState().run(focusFlag, { index: next });
                      }}
                    >
                      {it.flag.message}
                      {it.indices.length > 1 ? (
                        <span className="ml-1 font-semibold">· {it.indices.length} places</span>
                      ) : null}
                    </button>
                  </li>
                );
              })}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
