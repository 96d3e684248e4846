import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/engine/schema';
import { clearDrafts, draftKey, readDraft, writeDraft } from './drafts';

/** An in-memory stand-in for localStorage. */
function memoryStorage() {
  const m = new Map<string, string>();
  return {
    getItem: (k: string) => m.get(k) ?? null,
    setItem: (k: string, v: string) => void m.set(k, v),
    removeItem: (k: string) => void m.delete(k),
    key: (i: number) => [...m.keys()][i] ?? null,
    get length() {
      return m.size;
    },
  };
}

describe('drafts kept on this device', () => {
  it('keeps one draft per design, keyed by the version it was edited from', () => {
    const store = memoryStorage();
    const doc = { ...exampleDesign(), heightMm: 777 };
    writeDraft('d1', 3, exampleDesign(), store);
    writeDraft('d1', 4, doc, store);
    writeDraft('d2', 1, exampleDesign(), store);
    expect(store.getItem(draftKey('d1', 3))).toBeNull();
    const d = readDraft('d1', store)!;
    expect(d.version).toBe(4);
    expect(d.doc.heightMm).toBe(777);
    clearDrafts('d1', store);
    expect(readDraft('d1', store)).toBeNull();
    expect(readDraft('d2', store)).not.toBeNull();
  });

  it('ignores a damaged or invalid draft', () => {
    const store = memoryStorage();
    store.setItem(draftKey('d1', 2), '{not json');
    store.setItem(draftKey('d1', 3), JSON.stringify({ doc: { version: 1 }, savedAt: 1 }));
    expect(readDraft('d1', store)).toBeNull();
  });
});
