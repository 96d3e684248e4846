'use client';
// The materials take-off beside the plan: the materials panel fed with the editor's live plan and document.
import { useEditor } from '@/canvas/store/EditorStoreProvider';
import { MaterialsPanel } from '@/components/materials/MaterialsPanel';

export function MaterialsTab() {
  const designId = useEditor((s) => s.meta.designId);
  const units = useEditor((s) => s.meta.units);
  const plan = useEditor((s) => s.plan.plan);
  const planDoc = useEditor((s) => s.plan.planDoc);
  if (!plan || !planDoc) return <p className="text-sm text-ash-600">Working out the frame…</p>;
  // The document the plan was made from, so prices always match the quantities shown.
  return <MaterialsPanel designId={designId} plan={plan} document={planDoc} units={units} />;
}
