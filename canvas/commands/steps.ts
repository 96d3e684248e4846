// Step commands: a flight of steps on an outline edge, its count and tread boards.
import type { StepInput } from '@/engine/schema';
import { stepSchema } from '@/engine/schema';
import { defineCommand } from './types';

export const addStep = defineCommand<{ edge: number }>({
  id: 'step.add',
  label: 'Add steps on this side',
  edits: true,
  predicate: (s, { edge }) => edge >= 0 && edge < s.doc.outline.length && s.doc.steps.length < 20,
  perform: (s, { edge }) => {
    // One step puts its top midway between ground and deck (common practice); more for higher decks.
    const count = Math.max(1, Math.ceil(s.doc.heightMm / 190) - 1);
    const step = stepSchema.parse({ edge, count, treadBoards: 3 });
    const steps = [...s.doc.steps, step];
    return {
      doc: { ...s.doc, steps },
      ui: { selection: { kind: 'step', index: steps.length - 1 } },
    };
  },
});

export const updateStep = defineCommand<{ index: number; patch: Partial<StepInput> }>({
  id: 'step.update',
  label: 'Change steps',
  edits: true,
  predicate: (s, { index }) => index >= 0 && index < s.doc.steps.length,
  perform: (s, { index, patch }) => {
    const cur = s.doc.steps[index];
    if (!cur) return null;
    const parsed = stepSchema.safeParse({ ...cur, ...patch });
    if (!parsed.success) return null;
    if (parsed.data.edge >= s.doc.outline.length) return null;
    const steps = s.doc.steps.slice();
    steps[index] = parsed.data;
    return { doc: { ...s.doc, steps } };
  },
});

export const deleteStep = defineCommand<{ index: number }>({
  id: 'step.delete',
  label: 'Delete steps',
  edits: true,
  predicate: (s, { index }) => index >= 0 && index < s.doc.steps.length,
  perform: (s, { index }) => ({
    doc: { ...s.doc, steps: s.doc.steps.filter((_, i) => i !== index) },
    ui: { selection: null },
  }),
});

export const stepCommands = [addStep, updateStep, deleteStep] as const;
