// Design document versions: ordered migrators that bring a stored document up to the current version. Pure: no imports at run time.

/** The version planFrame reads. */
export const CURRENT_DESIGN_VERSION = 1;

/** One step: turns a raw document of version `from` into version `from + 1`. */
export interface DesignMigrator {
  from: number;
  describe: string;
  up(doc: Record<string, unknown>): Record<string, unknown>;
}

/**
 * The migrators, oldest first. Only version 1 exists today, so the list is empty; a version 2 adds
 * `{ from: 1, describe, up }` here and bumps CURRENT_DESIGN_VERSION.
 */
export const DESIGN_MIGRATORS: readonly DesignMigrator[] = [];

/** Result of migrating: the raw document at the current version, or why it could not be. */
export type MigrateResult =
  { ok: true; doc: unknown; from: number; applied: string[] } | { ok: false; error: string };

/**
 * Runs the ordered migrators on a raw stored document, by its `version`. A document without a
 * version is treated as version 1. Does not validate the result: parse it with parseDesign.
 */
export function migrateDesign(
  raw: unknown,
  migrators: readonly DesignMigrator[] = DESIGN_MIGRATORS,
  target: number = CURRENT_DESIGN_VERSION,
): MigrateResult {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return { ok: false, error: 'A design document must be a JSON object' };
  }
  let doc = { ...(raw as Record<string, unknown>) };
  const from = doc.version === undefined ? 1 : doc.version;
  if (typeof from !== 'number' || !Number.isInteger(from) || from < 1) {
    return { ok: false, error: 'version must be a whole number of 1 or more' };
  }
  if (from > target) {
    return {
      ok: false,
      error: `Design version ${from} is newer than this program reads (${target})`,
    };
  }
  doc.version = from;
  const applied: string[] = [];
  for (let v = from; v < target; v++) {
    const m = migrators.find((x) => x.from === v);
    if (!m) return { ok: false, error: `No migration from design version ${v}` };
    doc = { ...m.up(doc), version: v + 1 };
    applied.push(m.describe);
  }
  return { ok: true, doc, from, applied };
}
