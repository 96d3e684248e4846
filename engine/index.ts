// The engine's public entry: the design schema and types, document migration and parsing, and planFrame. Pure: engine modules only.
import { designDocumentSchema, type DesignDocument } from './schema';
import { migrateDesign } from './migrate';

/** The design document schema and its types. */
export * from './schema';
/** The frame plan types. */
export * from './types';
/** The layout (planFrame adds the take-off and cut list). */
export { planFrame, layoutFrame } from './plan';
/** Document versions and their migrators. */
export {
  migrateDesign,
  CURRENT_DESIGN_VERSION,
  DESIGN_MIGRATORS,
  type DesignMigrator,
  type MigrateResult,
} from './migrate';

/** One problem with an input document: where it is (a dotted path) and what is wrong. */
export interface DesignError {
  path: string;
  message: string;
}

/** Result of parseDesign. */
export type ParseDesignResult =
  { ok: true; design: DesignDocument } | { ok: false; errors: DesignError[] };

/**
 * Migrates a raw document to the current version and validates it with the shared zod schema,
 * filling defaults. Never throws: bad input comes back as a list of located messages.
 */
export function parseDesign(input: unknown): ParseDesignResult {
  const migrated = migrateDesign(input);
  if (!migrated.ok) return { ok: false, errors: [{ path: '', message: migrated.error }] };
  const parsed = designDocumentSchema.safeParse(migrated.doc);
  if (parsed.success) return { ok: true, design: parsed.data };
  return {
    ok: false,
    errors: parsed.error.issues.map((i) => ({
      path: i.path.map(String).join('.'),
      message: i.message,
    })),
  };
}
