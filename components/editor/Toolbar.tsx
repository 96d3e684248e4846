'use client';
// The editor's toolbar: tools, undo/redo/delete, view, snapping, and the always-visible save and flag counts.
import { redo, undo, deleteSelection } from '@/canvas/commands/history';
import {
  fitToDeck,
  outlineTool,
  selectTool,
  supportTool,
  toggleBoards,
  toggleLayer,
  toggleSnap,
  zoomIn,
  zoomOut,
} from '@/canvas/commands/view';
import type { Command } from '@/canvas/commands/types';
import { useShallow } from 'zustand/react/shallow';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import { Icon, icons, ToolButton } from './ToolButton';

function Divider() {
  return <span aria-hidden="true" className="mx-0.5 h-7 w-px shrink-0 bg-ash-200" />;
}

export function Toolbar() {
  const store = useEditorStore();
  // Narrow selection: the toolbar re-renders when one of these changes, not on every drag move.
  const s = useEditor(
    useShallow((x) => {
      const can = <A,>(c: Command<A>, args: A) =>
        !(c.edits && x.meta.readOnly) && (!c.predicate || c.predicate(x, args));
      return {
        readOnly: x.meta.readOnly,
        tool: x.ui.tool,
        layers: x.ui.layers,
        snap: x.ui.snap,
        canUndo: can(undo, undefined),
        canRedo: can(redo, undefined),
        canDelete: can(deleteSelection, undefined),
      };
    }),
  );
  const readOnly = s.readOnly;
  const run = <A,>(c: Command<A>, args: A) => store.getState().run(c, args);

  return (
    <div
      role="toolbar"
      aria-label="Plan tools"
      className="flex items-center gap-1 overflow-x-auto border-b border-ash-200 bg-white px-2 py-1"
    >
      {readOnly ? (
        <span className="mr-1 shrink-0 rounded-md bg-ash-100 px-2 py-1 text-xs font-semibold text-ash-700">
          View only
        </span>
      ) : (
        <>
          <ToolButton
            label="Select and move"
            hint="V"
            active={s.tool === 'select'}
            onClick={() => run(selectTool, undefined)}
          >
            <Icon d={icons.select} />
          </ToolButton>
          <ToolButton
            label="Draw outline"
            hint="O"
            active={s.tool === 'outline'}
            onClick={() => run(outlineTool, undefined)}
          >
            <Icon d={icons.outline} />
          </ToolButton>
          <ToolButton
            label="Add support row"
            hint="S"
            active={s.tool === 'support'}
            onClick={() => run(supportTool, undefined)}
          >
            <Icon d={icons.support} />
          </ToolButton>
          <Divider />
          <ToolButton
            label="Undo"
            hint="Ctrl+Z"
            disabled={!s.canUndo}
            onClick={() => run(undo, undefined)}
          >
            <Icon d={icons.undo} />
          </ToolButton>
          <ToolButton
            label="Redo"
            hint="Ctrl+Shift+Z"
            disabled={!s.canRedo}
            onClick={() => run(redo, undefined)}
          >
            <Icon d={icons.redo} />
          </ToolButton>
          <ToolButton
            label="Delete"
            hint="Del"
            disabled={!s.canDelete}
            onClick={() => run(deleteSelection, undefined)}
          >
            <Icon d={icons.trash} />
          </ToolButton>
          <Divider />
        </>
      )}
      <ToolButton label="Fit deck" hint="F" onClick={() => run(fitToDeck, undefined)}>
        <Icon d={icons.fit} />
      </ToolButton>
      <ToolButton label="Zoom in" hint="+" onClick={() => run(zoomIn, undefined)}>
        <Icon d={icons.plus} />
      </ToolButton>
      <ToolButton label="Zoom out" hint="−" onClick={() => run(zoomOut, undefined)}>
        <Icon d={icons.minus} />
      </ToolButton>
      <ToolButton
        label="Show boards"
        hint="B"
        active={s.layers.boards}
        onClick={() => run(toggleBoards, undefined)}
      >
        <Icon d={icons.boards} />
      </ToolButton>
      <ToolButton
        label="Show dimensions"
        active={s.layers.dimensions}
        onClick={() => run(toggleLayer, { layer: 'dimensions' })}
      >
        <Icon d={icons.dims} />
      </ToolButton>
      {readOnly ? null : (
        <>
          <Divider />
          <ToolButton
            label="Snap to grid"
            active={s.snap.grid}
            onClick={() => run(toggleSnap, { snap: 'grid' })}
          >
            <Icon d={icons.grid} />
          </ToolButton>
          <ToolButton
            label="Snap to 45° and 90°"
            active={s.snap.angle}
            onClick={() => run(toggleSnap, { snap: 'angle' })}
          >
            <Icon d={icons.angle} />
          </ToolButton>
          <ToolButton
            label="Snap to corners"
            active={s.snap.points}
            onClick={() => run(toggleSnap, { snap: 'points' })}
          >
            <Icon d={icons.point} />
          </ToolButton>
        </>
      )}
    </div>
  );
}
