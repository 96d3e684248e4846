import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/engine/schema';
import {
  bailToMark,
  commitMark,
  diffDocs,
  emptyHistory,
  mark,
  record,
  redo,
  undo,
} from './history';

const base = exampleDesign();
const moved = {
  ...base,
  outline: base.outline.map((p, i) => (i === 1 ? [6500, 0] : p)),
} as typeof base;
const higher = { ...moved, heightMm: 700 };

describe('history', () => {
  it('stores only the top-level keys that changed', () => {
    const d = diffDocs(base, higher)!;
    expect(Object.keys(d.before).sort()).toEqual(['heightMm', 'outline']);
    expect(d.after.heightMm).toBe(700);
    expect(diffDocs(base, base)).toBeNull();
  });

  it('undoes and redoes recorded edits in order', () => {
    let h = record(emptyHistory(), base, moved, 'move');
    h = record(h, moved, higher, 'height');
    const u1 = undo(h, higher)!;
    expect(u1.doc.heightMm).toBe(450);
    expect(u1.doc.outline[1]).toEqual([6500, 0]);
    const u2 = undo(u1.history, u1.doc)!;
    expect(u2.doc.outline[1]).toEqual([6000, 0]);
    expect(undo(u2.history, u2.doc)).toBeNull();
    const r1 = redo(u2.history, u2.doc)!;
    expect(r1.doc.outline[1]).toEqual([6500, 0]);
  });

  it('a new edit after undo drops the redo stack', () => {
    let h = record(emptyHistory(), base, moved, 'move');
    const u = undo(h, moved)!;
    h = record(u.history, u.doc, { ...u.doc, heightMm: 300 }, 'height');
    expect(h.redos).toHaveLength(0);
    expect(redo(h, base)).toBeNull();
  });

  it('folds everything between mark and commit into one entry', () => {
    let h = mark(emptyHistory(), base, 'drag');
    h = record(h, base, moved, 'move');
    h = record(h, moved, higher, 'move');
    expect(h.undos).toHaveLength(0);
    h = commitMark(h, higher);
    expect(h.undos).toHaveLength(1);
    expect(h.undos[0].label).toBe('drag');
    expect(undo(h, higher)!.doc).toMatchObject({ heightMm: 450, outline: base.outline });
  });

  it('bailing returns the marked document and records nothing', () => {
    const h = mark(emptyHistory(), base, 'drag');
    const r = bailToMark(record(h, base, moved, 'move'));
    expect(r.doc).toBe(base);
    expect(r.history.undos).toHaveLength(0);
    expect(r.history.mark).toBeNull();
  });

  it('a gesture that changes nothing leaves no entry', () => {
    expect(commitMark(mark(emptyHistory(), base, 'tap'), base).undos).toHaveLength(0);
  });
});
