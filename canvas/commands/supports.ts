// Support row commands: add, move, delete, change kind; take over the rows the engine placed.
import type { DesignDocument, SupportRowInput } from '@/engine/schema';
import type { Pt } from '@/engine/types';
import { round } from '../geometry';
import type { EditorData } from '../store/types';
import { defineCommand } from './types';

type Kind = SupportRowInput['kind'];
const r = (p: Pt): Pt => [round(p[0]), round(p[1])];

/**
 * The support rows as the user sees them: the document's own rows, or, when it has none, the rows
 * the engine placed (so a placed row can be dragged; the first edit makes them the user's).
 */
export function visibleSupports(s: Pick<EditorData, 'doc' | 'plan'>): {
  rows: SupportRowInput[];
  placed: boolean;
} {
  if (s.doc.supports.length || !s.plan.plan) return { rows: s.doc.supports, placed: false };
  const rows = s.plan.plan.supportRows.filter((row) => row.placed);
  return {
    rows: rows.map((row) => ({ a: row.a, b: row.b, kind: row.kind })),
    placed: rows.length > 0,
  };
}

/** The document with the visible support rows made the user's own (no-op when already so). */
export function adoptSupports(s: Pick<EditorData, 'doc' | 'plan'>): DesignDocument {
  const v = visibleSupports(s);
  return v.placed ? { ...s.doc, supports: v.rows.map((row) => ({ ...row })) } : s.doc;
}

export const addSupport = defineCommand<{ a: Pt; b: Pt; kind?: Kind }>({
  id: 'support.add',
  label: 'Add support row',
  edits: true,
  predicate: (s, { a, b }) => a[0] !== b[0] || a[1] !== b[1],
  perform: (s, { a, b, kind }) => {
    const doc = adoptSupports(s);
    const supports = [...doc.supports, { a: r(a), b: r(b), kind: kind ?? 'blocks' }];
    return {
      doc: { ...doc, supports },
      ui: { selection: { kind: 'support', index: supports.length - 1 } },
    };
  },
});

export const moveSupport = defineCommand<{ index: number; a: Pt; b: Pt }>({
  id: 'support.move',
  label: 'Move support row',
  edits: true,
  predicate: (s, { index }) => index >= 0 && index < visibleSupports(s).rows.length,
  perform: (s, { index, a, b }) => {
    const doc = adoptSupports(s);
    const row = doc.supports[index];
    if (!row) return null;
    const supports = doc.supports.slice();
    supports[index] = { ...row, a: r(a), b: r(b) };
    return { doc: { ...doc, supports } };
  },
});

export const deleteSupport = defineCommand<{ index: number }>({
  id: 'support.delete',
  label: 'Delete support row',
  edits: true,
  predicate: (s, { index }) => index >= 0 && index < visibleSupports(s).rows.length,
  perform: (s, { index }) => {
    const doc = adoptSupports(s);
    const supports = doc.supports.filter((_, i) => i !== index);
    return { doc: { ...doc, supports }, ui: { selection: null } };
  },
});

export const setSupportKind = defineCommand<{ index: number; kind: Kind }>({
  id: 'support.setKind',
  label: 'Set support kind',
  edits: true,
  predicate: (s, { index }) => index >= 0 && index < visibleSupports(s).rows.length,
  perform: (s, { index, kind }) => {
    const doc = adoptSupports(s);
    const row = doc.supports[index];
    if (!row || (row.kind === kind && doc === s.doc)) return null;
    const supports = doc.supports.slice();
    supports[index] = { ...row, kind };
    return { doc: { ...doc, supports } };
  },
});

/** Hands support placement back to the engine. */
export const autoSupports = defineCommand({
  id: 'support.auto',
  label: 'Place support rows for me',
  edits: true,
  predicate: (s) => s.doc.supports.length > 0,
  perform: (s) => ({ doc: { ...s.doc, supports: [] }, ui: { selection: null } }),
});

export const supportCommands = [
  addSupport,
  moveSupport,
  deleteSupport,
  setSupportKind,
  autoSupports,
] as const;
