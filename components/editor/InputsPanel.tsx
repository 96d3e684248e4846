'use client';
// Frame inputs: board direction, joist centres, border courses, height, support rows, steps, products.
import { useState } from 'react';
import { setInputs, patchDocument, type InputsPatch } from '@/canvas/commands/inputs';
import { addStep, deleteStep, updateStep } from '@/canvas/commands/steps';
import {
  autoSupports,
  deleteSupport,
  setSupportKind,
  visibleSupports,
} from '@/canvas/commands/supports';
import { setTool } from '@/canvas/commands/view';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import { dist, sideOf } from '@/canvas/geometry';
import { controlClasses } from '@/components/ui/controlClasses';
import { formatLength } from '@/lib/units';
import { LengthInput } from './LengthInput';
import { ProductsPicker } from './ProductsPicker';

function Row({
  label,
  children,
  error,
}: {
  label: string;
  children: React.ReactNode;
  error?: string | null;
}) {
  return (
    <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
      {label}
      {children}
      {error ? <span className="text-sm font-medium text-clay-700">{error}</span> : null}
    </label>
  );
}

const kindLabels = { blocks: 'Blocks', beam: 'Beam', wall: 'Wall' } as const;

export function InputsPanel() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.doc);
  const plan = useEditor((s) => s.plan.plan);
  const meta = useEditor((s) => s.meta);
  const selection = useEditor((s) => s.ui.selection);
  const ro = meta.readOnly;
  const units = meta.units;
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [stepEdge, setStepEdge] = useState(0);
  const supports = visibleSupports({ doc, plan: { plan, planDoc: null, error: null, ms: null } });

  const apply = (patch: InputsPatch) => {
    const r = patchDocument(store.getState().doc, patch);
    if ('errors' in r) {
      setErrors(r.errors);
      return;
    }
    setErrors({});
    store.getState().run(setInputs, patch);
  };
  const sideLabel = (i: number) => {
    const [a, b] = sideOf(doc.outline, i);
    return `Side ${i + 1} (${formatLength(dist(a, b), units)})`;
  };

  return (
    <div className="flex flex-col gap-4" data-testid="inputs-panel">
      <fieldset disabled={ro} className="grid grid-cols-2 gap-3">
        <Row label="Board direction (°)" error={errors.boardAngleDeg}>
          <input
            type="number"
            inputMode="decimal"
            step={5}
            className={controlClasses}
            defaultValue={doc.boardAngleDeg}
            key={`angle-${doc.boardAngleDeg}`}
            onBlur={(e) => apply({ boardAngleDeg: Number(e.target.value) })}
            onKeyDown={(e) =>
              e.key === 'Enter' && apply({ boardAngleDeg: Number(e.currentTarget.value) })
            }
          />
        </Row>
        <Row label="Joist centres" error={errors.joistCentresMm}>
          <LengthInput
            units={units}
            valueMm={doc.joistCentresMm}
            onCommit={(mm) => apply({ joistCentresMm: mm })}
          />
        </Row>
        <Row label="Border courses" error={errors.borderCourses}>
          <select
            className={controlClasses}
            value={doc.borderCourses}
            onChange={(e) => apply({ borderCourses: Number(e.target.value) })}
          >
            {[0, 1, 2, 3].map((n) => (
              <option key={n} value={n}>
                {n === 0 ? 'None' : n}
              </option>
            ))}
          </select>
        </Row>
        <Row label="Deck height" error={errors.heightMm}>
          <LengthInput
            units={units}
            valueMm={doc.heightMm}
            onCommit={(mm) => apply({ heightMm: mm })}
          />
        </Row>
      </fieldset>

      <section aria-labelledby="rows-h" className="flex flex-col gap-2">
        <div className="flex items-center justify-between gap-2">
          <h3 id="rows-h" className="text-sm font-bold text-ash-900">
            Support rows{' '}
            {supports.placed ? (
              <span className="font-normal text-ash-600">(placed for you)</span>
            ) : null}
          </h3>
          {ro ? null : (
            <div className="flex gap-1">
              {doc.supports.length ? (
                <button
                  type="button"
                  className="min-h-11 rounded-lg px-2 text-sm font-semibold text-spruce-800 hover:bg-spruce-50"
                  onClick={() => store.getState().run(autoSupports, undefined)}
                >
                  Place for me
                </button>
              ) : null}
              <button
                type="button"
                className="min-h-11 rounded-lg px-2 text-sm font-semibold text-spruce-800 hover:bg-spruce-50"
                onClick={() => store.getState().run(setTool, { tool: 'support' })}
              >
                Add row
              </button>
            </div>
          )}
        </div>
        <ul className="flex flex-col gap-1.5">
          {supports.rows.map((row, i) => (
            <li
              key={i}
              className={`flex items-center gap-2 rounded-lg border px-2 py-1 ${selection?.kind === 'support' && selection.index === i ? 'border-larch-500 bg-larch-50' : 'border-ash-200'}`}
            >
              <button
                type="button"
                className="min-h-11 min-w-0 flex-1 text-left text-sm"
                onClick={() => store.getState().setUi({ selection: { kind: 'support', index: i } })}
              >
                Row {i + 1} · {formatLength(dist(row.a, row.b), units)}
              </button>
              <select
                aria-label={`Row ${i + 1} kind`}
                disabled={ro}
                className={`${controlClasses} !w-28 shrink-0`}
                value={row.kind}
                onChange={(e) =>
                  store.getState().run(setSupportKind, {
                    index: i,
                    kind: e.target.value as keyof typeof kindLabels,
                  })
                }
              >
                {Object.entries(kindLabels).map(([k, l]) => (
                  <option key={k} value={k}>
                    {l}
                  </option>
                ))}
              </select>
              {ro ? null : (
                <button
                  type="button"
                  aria-label={`Delete row ${i + 1}`}
                  className="min-h-11 min-w-11 rounded-lg text-clay-700 hover:bg-clay-50"
                  onClick={() => store.getState().run(deleteSupport, { index: i })}
                >
                  ✕
                </button>
              )}
            </li>
          ))}
          {supports.rows.length === 0 ? (
            <li className="text-sm text-ash-600">No rows yet.</li>
          ) : null}
        </ul>
      </section>

      <section aria-labelledby="steps-h" className="flex flex-col gap-2">
        <h3 id="steps-h" className="text-sm font-bold text-ash-900">
          Steps
        </h3>
        <ul className="flex flex-col gap-2">
          {doc.steps.map((st, i) => {
            const sp = plan?.steps.find((p) => p.index === i);
            return (
              <li key={i} className="rounded-lg border border-ash-200 p-2">
                <div className="flex items-center justify-between">
                  <span className="text-sm font-semibold">{sideLabel(st.edge)}</span>
                  {ro ? null : (
                    <button
                      type="button"
                      aria-label={`Delete steps ${i + 1}`}
                      className="min-h-11 min-w-11 rounded-lg text-clay-700 hover:bg-clay-50"
                      onClick={() => store.getState().run(deleteStep, { index: i })}
                    >
                      ✕
                    </button>
                  )}
                </div>
                <fieldset disabled={ro} className="grid grid-cols-2 gap-2">
                  <Row label="Steps">
                    <input
                      type="number"
                      min={1}
                      max={20}
                      className={controlClasses}
                      value={st.count}
                      onChange={(e) =>
                        store
                          .getState()
                          .run(updateStep, { index: i, patch: { count: Number(e.target.value) } })
                      }
                    />
                  </Row>
                  <Row label="Tread boards">
                    <input
                      type="number"
                      min={1}
                      max={6}
                      className={controlClasses}
                      value={st.treadBoards}
                      onChange={(e) =>
                        store.getState().run(updateStep, {
                          index: i,
                          patch: { treadBoards: Number(e.target.value) },
                        })
                      }
                    />
                  </Row>
                </fieldset>
                {sp ? (
                  <p className="mt-1 text-sm text-ash-700">
                    Rise {formatLength(sp.riseMm, units)} · going {formatLength(sp.goingMm, units)}
                  </p>
                ) : null}
              </li>
            );
          })}
        </ul>
        {ro ? null : (
          <div className="flex gap-2">
            <select
              aria-label="Side for new steps"
              className={controlClasses}
              value={Math.min(stepEdge, doc.outline.length - 1)}
              onChange={(e) => setStepEdge(Number(e.target.value))}
            >
              {doc.outline.map((_, i) => (
                <option key={i} value={i}>
                  {sideLabel(i)}
                </option>
              ))}
            </select>
            <button
              type="button"
              className="min-h-11 shrink-0 rounded-lg border border-ash-300 px-3 text-sm font-semibold hover:bg-ash-50"
              onClick={() =>
                store.getState().run(addStep, { edge: Math.min(stepEdge, doc.outline.length - 1) })
              }
            >
              Add steps
            </button>
          </div>
        )}
      </section>

      <ProductsPicker />
    </div>
  );
}
