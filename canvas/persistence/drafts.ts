// Unsaved work kept on this device (localStorage, keyed by design id and the version it was edited from)
// until the server confirms a save; offered back after a reload or a crash.
import { designDocumentSchema, type DesignDocument } from '@/engine/schema';

const PREFIX = 'joistwright:draft:';

export interface Draft {
  designId: string;
  /** The server version the edits were made on top of. */
  version: number;
  doc: DesignDocument;
  savedAt: number;
}

export const draftKey = (designId: string, version: number) => `${PREFIX}${designId}:${version}`;

type StorageLike = Pick<Storage, 'getItem' | 'setItem' | 'removeItem' | 'key' | 'length'>;

const storage = (): StorageLike | null => {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null; // storage blocked (private mode, policy)
  }
};

/** Writes the draft for this design, replacing drafts made on older versions. */
export function writeDraft(
  designId: string,
  version: number,
  doc: DesignDocument,
  store = storage(),
) {
  if (!store) return;
  try {
    for (const k of keysFor(designId, store))
      if (k !== draftKey(designId, version)) store.removeItem(k);
    store.setItem(draftKey(designId, version), JSON.stringify({ doc, savedAt: Date.now() }));
  } catch {
    // Quota full: the server copy is still the fallback.
  }
}

/** The newest readable draft for this design, if any. */
export function readDraft(designId: string, store = storage()): Draft | null {
  if (!store) return null;
  let best: Draft | null = null;
  for (const k of keysFor(designId, store)) {
    const version = Number(k.slice(k.lastIndexOf(':') + 1));
    try {
      const raw = JSON.parse(store.getItem(k) ?? 'null') as {
        doc: unknown;
        savedAt: number;
      } | null;
      const parsed = designDocumentSchema.safeParse(raw?.doc);
      if (!raw || !parsed.success || !Number.isInteger(version)) continue;
      if (!best || raw.savedAt > best.savedAt) {
        best = { designId, version, doc: parsed.data, savedAt: raw.savedAt };
      }
    } catch {
      continue;
    }
  }
  return best;
}

/** Forgets every draft of this design (the server has it now). */
export function clearDrafts(designId: string, store = storage()) {
  if (!store) return;
  for (const k of keysFor(designId, store)) store.removeItem(k);
}

function keysFor(designId: string, store: StorageLike): string[] {
  const out: string[] = [];
  for (let i = 0; i < store.length; i++) {
    const k = store.key(i);
    if (k && k.startsWith(`${PREFIX}${designId}:`)) out.push(k);
  }
  return out;
}
