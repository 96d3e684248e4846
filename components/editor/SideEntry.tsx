'use client';
// Typed measurements: the next side while drawing (length and direction), or the chosen side's exact
// length and direction; corner actions. Lengths in mm or feet-inches, as taken with a tape.
import { useState } from 'react';
import {
  addDrawingSide,
  closeOutline,
  deleteCorner,
  insertCorner,
  removeDrawingCorner,
  setSide,
} from '@/canvas/commands/outline';
import { addStep } from '@/canvas/commands/steps';
import { angleOf, dist, sideOf } from '@/canvas/geometry';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import { controlClasses } from '@/components/ui/controlClasses';
import { formatLength } from '@/lib/units';
import { LengthInput } from './LengthInput';

const directions = [
  { deg: 0, label: '→', name: 'Right (0°)' },
  { deg: 90, label: '↑', name: 'Up (90°)' },
  { deg: 180, label: '←', name: 'Left (180°)' },
  { deg: 270, label: '↓', name: 'Down (270°)' },
];

const btn =
  'min-h-11 rounded-lg px-3 text-sm font-semibold disabled:opacity-40 disabled:cursor-not-allowed';

function DirectionPicker({ value, onChange }: { value: number; onChange: (d: number) => void }) {
  return (
    <div className="flex gap-1" role="group" aria-label="Direction">
      {directions.map((d) => (
        <button
          key={d.deg}
          type="button"
          aria-label={d.name}
          aria-pressed={Math.round(value) % 360 === d.deg}
          onClick={() => onChange(d.deg)}
          className={`${btn} min-w-11 border ${Math.round(value) % 360 === d.deg ? 'border-spruce-700 bg-spruce-700 text-white' : 'border-ash-300 bg-white text-ash-900'}`}
        >
          {d.label}
        </button>
      ))}
    </div>
  );
}

function DrawingEntry() {
  const store = useEditorStore();
  const drawing = useEditor((s) => s.ui.drawing);
  const units = useEditor((s) => s.meta.units);
  const [length, setLength] = useState<number | null>(null);
  const [angle, setAngle] = useState(0);
  const can = drawing.length > 0 && length !== null;
  const add = () => {
    if (!can) return;
    store.getState().run(addDrawingSide, { lengthMm: length!, angleDeg: angle });
    // Most decks turn a right angle at each corner: suggest the next direction.
    setAngle((a) => (a + 90) % 360);
  };
  return (
    <div className="flex flex-col gap-3" data-testid="drawing-entry">
      <p className="text-sm text-ash-700">
        {drawing.length === 0
          ? 'Tap the plan where the first corner goes.'
          : `${drawing.length} corner${drawing.length > 1 ? 's' : ''} placed. Tap the next corner, or type the next side.`}
      </p>
      <form
        className="flex flex-col gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          add();
        }}
      >
        <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
          Next side length
          <LengthInput
            units={units}
            valueMm={null}
            placeholder={units === 'metric' ? 'e.g. 4800 or 4.8m' : `e.g. 15' 9"`}
            onCommit={(mm) => setLength(mm)}
            onDraft={(mm) => setLength(mm)}
            disabled={drawing.length === 0}
            aria-label="Next side length"
          />
        </label>
        <div className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
          Direction
          <div className="flex flex-wrap items-center gap-2">
            <DirectionPicker value={angle} onChange={setAngle} />
            <input
              type="number"
              inputMode="decimal"
              aria-label="Direction in degrees"
              className={`${controlClasses} !w-24`}
              value={angle}
              onChange={(e) => setAngle(Number(e.target.value) || 0)}
            />
            <span className="text-ash-600">°</span>
          </div>
        </div>
        <div className="flex flex-wrap gap-2">
          <button type="submit" disabled={!can} className={`${btn} bg-spruce-700 text-white`}>
            Add side
          </button>
          <button
            type="button"
            disabled={drawing.length === 0}
            className={`${btn} border border-ash-300`}
            onClick={() => store.getState().run(removeDrawingCorner, undefined)}
          >
            Take back
          </button>
          <button
            type="button"
            disabled={!closeOutline.predicate!(store.getState(), undefined)}
            className={`${btn} bg-larch-600 text-white`}
            onClick={() => store.getState().run(closeOutline, undefined)}
          >
            Close outline
          </button>
        </div>
      </form>
    </div>
  );
}

function SideEditor({ index }: { index: number }) {
  const store = useEditorStore();
  const outline = useEditor((s) => s.doc.outline);
  const units = useEditor((s) => s.meta.units);
  const ro = useEditor((s) => s.meta.readOnly);
  const [a, b] = sideOf(outline, index);
  const len = dist(a, b);
  const ang = Math.round(angleOf(a, b) * 10) / 10;
  const [moveNext, setMoveNext] = useState(true);
  return (
    <div className="flex flex-col gap-3" data-testid="side-editor">
      <h3 className="text-sm font-bold">
        Side {index + 1}: {formatLength(len, units)} at {ang}°
      </h3>
      {ro ? null : (
        <>
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Length
            <LengthInput
              units={units}
              valueMm={len}
              aria-label="Side length"
              onCommit={(mm) => store.getState().run(setSide, { index, lengthMm: mm, moveNext })}
            />
          </label>
          <div className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Direction
            <div className="flex flex-wrap items-center gap-2">
              <DirectionPicker
                value={ang}
                onChange={(d) => store.getState().run(setSide, { index, angleDeg: d, moveNext })}
              />
              <input
                key={ang}
                type="number"
                inputMode="decimal"
                aria-label="Side direction in degrees"
                className={`${controlClasses} !w-24`}
                defaultValue={ang}
                onBlur={(e) =>
                  store
                    .getState()
                    .run(setSide, { index, angleDeg: Number(e.target.value), moveNext })
                }
                onKeyDown={(e) =>
                  e.key === 'Enter' &&
                  store
                    .getState()
                    .run(setSide, { index, angleDeg: Number(e.currentTarget.value), moveNext })
                }
              />
            </div>
          </div>
          <label className="flex min-h-11 items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="size-5"
              checked={moveNext}
              onChange={(e) => setMoveNext(e.target.checked)}
            />
            Move the next side with it
          </label>
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              className={`${btn} border border-ash-300`}
              onClick={() => store.getState().run(insertCorner, { side: index })}
            >
              Insert corner
            </button>
            <button
              type="button"
              className={`${btn} border border-ash-300`}
              onClick={() => store.getState().run(addStep, { edge: index })}
            >
              Add steps here
            </button>
          </div>
        </>
      )}
    </div>
  );
}

export function SideEntry() {
  const tool = useEditor((s) => s.ui.tool);
  const selection = useEditor((s) => s.ui.selection);
  const ro = useEditor((s) => s.meta.readOnly);
  const store = useEditorStore();
  const outline = useEditor((s) => s.doc.outline);
  if (tool === 'outline') return <DrawingEntry />;
  if (selection?.kind === 'side') return <SideEditor index={selection.index} />;
  if (selection?.kind === 'corner' && !ro) {
    const p = outline[selection.index];
    return (
      <div className="flex flex-col gap-3">
        <h3 className="text-sm font-bold">Corner {selection.index + 1}</h3>
        {p ? (
          <p className="text-sm text-ash-700">
            Drag it on the plan, or pick a side to type its length.
          </p>
        ) : null}
        <button
          type="button"
          disabled={outline.length <= 3}
          className={`${btn} self-start bg-clay-600 text-white`}
          onClick={() => store.getState().run(deleteCorner, { index: selection.index })}
        >
          Delete corner
        </button>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-2 text-sm text-ash-700">
      <p>Tap a side of the deck to see or type its exact length and direction.</p>
      {ro ? null : (
        <p>
          To start a new outline, choose Draw outline in the toolbar and tap the corners, or type
          each side.
        </p>
      )}
      <ul className="mt-1 flex flex-col gap-1">
        {outline.map((_, i) => {
          const [a, b] = sideOf(outline, i);
          return (
            <li key={i}>
              <button
                type="button"
                className="min-h-11 w-full rounded-lg border border-ash-200 px-3 text-left hover:bg-ash-50"
                onClick={() => store.getState().setUi({ selection: { kind: 'side', index: i } })}
              >
                Side {i + 1}: {formatLength(dist(a, b), store.getState().meta.units)}
              </button>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
