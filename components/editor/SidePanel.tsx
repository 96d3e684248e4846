'use client';
// The side panel (right in landscape, below the plan in portrait): inputs, sides, flags, key, materials.
import type { ReactNode } from 'react';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import type { UiState } from '@/canvas/store/types';
import { FlagsPanel } from './FlagsPanel';
import { InputsPanel } from './InputsPanel';
import { Legend } from './Legend';
import { SideEntry } from './SideEntry';

type Tab = UiState['panel'] | 'legend';

export function SidePanel({
  materials,
  collapsed,
  onToggle,
}: {
  materials?: ReactNode;
  collapsed: boolean;
  onToggle: () => void;
}) {
  const store = useEditorStore();
  const panel = useEditor((s) => s.ui.panel);
  const tool = useEditor((s) => s.ui.tool);
  const flagCount = useEditor(
    (s) => (s.plan.plan?.flags ?? []).filter((f) => f.code !== 'caution').length,
  );
  const tabs: { id: Tab; label: string }[] = [
    { id: 'side', label: tool === 'outline' ? 'Draw' : 'Sides' },
    { id: 'inputs', label: 'Frame' },
    { id: 'flags', label: `Flags${flagCount ? ` (${flagCount})` : ''}` },
    { id: 'legend' as Tab, label: 'Key' },
    ...(materials ? [{ id: 'materials' as Tab, label: 'Materials' }] : []),
  ];
  const current = (panel as Tab) ?? 'inputs';
  return (
    <div className="flex min-h-0 flex-1 flex-col">
      <div
        role="tablist"
        aria-label="Panels"
        className="flex items-center gap-1 overflow-x-auto border-b border-ash-200 bg-ash-50 px-1"
      >
        {tabs.map((t) => (
          <button
            key={t.id}
            role="tab"
            type="button"
            aria-selected={current === t.id}
            data-testid={`tab-${t.id}`}
            onClick={() => {
              store.getState().setUi({ panel: t.id as UiState['panel'] });
              if (collapsed) onToggle();
            }}
            className={`min-h-11 shrink-0 border-b-2 px-3 text-sm font-semibold ${current === t.id ? 'border-spruce-700 text-spruce-900' : 'border-transparent text-ash-600 hover:text-ash-900'}`}
          >
            {t.label}
          </button>
        ))}
        <button
          type="button"
          onClick={onToggle}
          aria-expanded={!collapsed}
          className="ml-auto min-h-11 min-w-11 shrink-0 rounded-lg text-ash-700 lg:hidden"
          aria-label={collapsed ? 'Show panel' : 'Hide panel'}
        >
          {collapsed ? '▴' : '▾'}
        </button>
      </div>
      {collapsed ? null : (
        <div role="tabpanel" className="min-h-0 flex-1 overflow-y-auto p-3">
          {current === 'inputs' ? <InputsPanel /> : null}
          {current === 'side' ? <SideEntry /> : null}
          {current === 'flags' ? <FlagsPanel /> : null}
          {current === ('legend' as Tab) ? <Legend /> : null}
          {current === 'materials' ? materials : null}
        </div>
      )}
    </div>
  );
}
