'use client';
// The plan editor page body: one store per editor, the Konva stage, toolbar, side panel, save and conflict handling.
import { useEffect, useLayoutEffect, useRef, useState } from 'react';
import dynamic from 'next/dynamic';
import { createBrowserPlanner } from '@/canvas/browserPlanner';
import { httpDesignApi } from '@/canvas/persistence/api';
import { startAutosave } from '@/canvas/persistence/autosave';
import { readDraft, clearDrafts, type Draft } from '@/canvas/persistence/drafts';
import type { Planner } from '@/canvas/planner';
import { EditorStoreProvider, useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import type { DesignDocument } from '@/engine/schema';
import { STANDING_CAUTION } from '@/engine/codes';
import type { UnitSystem } from '@/lib/units';
import { ConflictDialog } from './ConflictDialog';
import { DraftBanner } from './DraftBanner';
import { FlagSummary } from './FlagSummary';
import { SaveStatus } from './SaveStatus';
import { MaterialsTab } from './MaterialsTab';
import { SidePanel } from './SidePanel';
import { Toolbar } from './Toolbar';

const EditorStage = dynamic(() => import('@/canvas/EditorStage'), { ssr: false });

export interface EditorProps {
  design: { id: string; jobId: string; name: string; version: number; document: DesignDocument };
  readOnly: boolean;
  units: UnitSystem;
}

export function DesignEditor(props: EditorProps) {
  const planner = useRef<Planner | null>(null);
  useEffect(() => () => planner.current?.dispose(), []);
  return (
    <EditorStoreProvider
      key={props.design.id}
      init={() => {
        planner.current = createBrowserPlanner();
        return {
          meta: {
            designId: props.design.id,
            jobId: props.design.jobId,
            name: props.design.name,
            readOnly: props.readOnly,
            units: props.units,
          },
          doc: props.design.document,
          // Crew open the flags first; designers the frame inputs.
          ui: { panel: props.readOnly ? 'flags' : 'inputs' },
          version: props.design.version,
          planner: planner.current,
        };
      }}
    >
      <EditorBody />
    </EditorStoreProvider>
  );
}

function EditorBody() {
  const store = useEditorStore();
  const meta = useEditor((s) => s.meta);
  const planMs = useEditor((s) => s.plan.ms);
  const planVia = useEditor((s) => s.plan.via);
  const root = useRef<HTMLDivElement>(null);
  const [height, setHeight] = useState<number | null>(null);
  // Phones are for looking: the plan gets the screen, the panel opens from its tabs.
  const [collapsed, setCollapsed] = useState(() => window.innerWidth < 640);
  // Unsaved work left on this device (the editor only ever renders in the browser).
  const [draft, setDraft] = useState<Draft | null>(() => {
    const s = store.getState();
    if (s.meta.readOnly) return null;
    const found = readDraft(s.meta.designId);
    if (found && JSON.stringify(found.doc) !== JSON.stringify(s.doc)) return found;
    if (found) clearDrafts(s.meta.designId);
    return null;
  });

  // Fill the window below the app header, whatever its height.
  useLayoutEffect(() => {
    const fit = () => {
      const el = root.current;
      if (!el) return;
      const top = el.getBoundingClientRect().top + window.scrollY;
      setHeight(Math.max(360, window.innerHeight - top));
    };
    fit();
    window.addEventListener('resize', fit);
    return () => window.removeEventListener('resize', fit);
  }, []);

  // Autosave (editors only); saves at once when the page is hidden.
  useEffect(() => {
    if (meta.readOnly) return;
    const autosave = startAutosave(store, httpDesignApi);
    const hide = () => {
      if (document.visibilityState === 'hidden') void autosave.flush();
    };
    document.addEventListener('visibilitychange', hide);
    return () => {
      document.removeEventListener('visibilitychange', hide);
      autosave.dispose();
    };
  }, [store, meta.readOnly]);

  return (
    <div
      ref={root}
      data-testid="design-editor"
      data-readonly={meta.readOnly ? 'true' : 'false'}
      data-plan-ms={planMs === null ? '' : planMs.toFixed(1)}
      data-planner={planVia ?? ''}
      className="-mx-3 -my-5 flex flex-col overflow-hidden bg-white sm:-mx-5 sm:-my-7"
      style={{ height: height ?? '70dvh' }}
    >
      <div className="flex items-center gap-2 border-b border-ash-200 bg-white px-3 py-1.5">
        <a
          href={`/jobs/${meta.jobId}`}
          className="flex min-h-11 items-center rounded-lg pr-1 text-sm font-semibold text-spruce-800 hover:underline"
        >
          ← Job
        </a>
        <h1
          className="min-w-0 flex-1 truncate text-base font-bold text-ash-950"
          data-testid="design-name"
        >
          {meta.name}
        </h1>
        <FlagSummary />
        {meta.readOnly ? null : <SaveStatus />}
      </div>
      <Toolbar />
      {draft ? <DraftBanner draft={draft} onDone={() => setDraft(null)} /> : null}
      <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
        <div className="relative min-h-0 flex-1" style={{ minHeight: '45%' }}>
          <EditorStage />
        </div>
        <aside
          aria-label="Design panel"
          className={`flex min-h-0 flex-col border-t border-ash-200 bg-white lg:w-[360px] lg:border-l lg:border-t-0 ${collapsed ? '' : 'h-[42%] lg:h-auto'}`}
        >
          <SidePanel
            materials={<MaterialsTab />}
            collapsed={collapsed}
            onToggle={() => setCollapsed((c) => !c)}
          />
          <p
            data-testid="standing-caution"
            className="border-t border-larch-200 bg-larch-50 px-3 py-1.5 text-[11px] leading-snug text-larch-900"
          >
            {STANDING_CAUTION}
          </p>
        </aside>
      </div>
      <ConflictDialog />
    </div>
  );
}
