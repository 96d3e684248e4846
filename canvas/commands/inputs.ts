// Frame input commands: board direction, centres, border courses, height, member specs, products.
import { designDocumentSchema, type DesignDocument } from '@/engine/schema';
import { defineCommand } from './types';

/** The document fields the inputs form may set (outline, supports and steps have their own commands). */
export type InputsPatch = Partial<
  Omit<DesignDocument, 'version' | 'outline' | 'supports' | 'steps'>
>;

/** Checks a patched document with the shared schema; returns the field errors or the new document. */
export function patchDocument(
  doc: DesignDocument,
  patch: InputsPatch,
): { doc: DesignDocument } | { errors: Record<string, string> } {
  const parsed = designDocumentSchema.safeParse({ ...doc, ...patch });
  if (!parsed.success) {
    const errors: Record<string, string> = {};
    for (const issue of parsed.error.issues) errors[issue.path.join('.')] ??= issue.message;
    return { errors };
  }
  // Keep untouched keys by reference so history diffs stay small.
  const next: DesignDocument = { ...doc };
  for (const key of Object.keys(patch) as (keyof InputsPatch)[]) {
    (next as Record<string, unknown>)[key] = parsed.data[key];
  }
  return { doc: next };
}

export const setInputs = defineCommand<InputsPatch>({
  id: 'inputs.set',
  label: 'Change frame inputs',
  edits: true,
  predicate: (s, patch) => 'doc' in patchDocument(s.doc, patch),
  perform: (s, patch) => {
    const r = patchDocument(s.doc, patch);
    if (!('doc' in r)) return null;
    const changed = (Object.keys(patch) as (keyof InputsPatch)[]).some(
      (k) => JSON.stringify(s.doc[k]) !== JSON.stringify(r.doc[k]),
    );
    return changed ? { doc: r.doc } : null;
  },
});

export const inputCommands = [setInputs] as const;
