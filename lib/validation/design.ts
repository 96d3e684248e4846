// Design schemas: create/save bodies and the shapes the API answers. The document itself is
// validated by the engine's designDocumentSchema (engine/schema.ts), the one contract for it.
import { z } from 'zod';
import { designDocumentSchema } from '@/engine/schema';
import { idSchema, isoDateSchema, requiredText } from './common';

const name = requiredText('Name', 120);

export const designCreateSchema = z.object({
  name,
  /** Missing means the 6 m x 4 m starter. */
  document: designDocumentSchema.optional(),
});
export type DesignCreateInput = z.input<typeof designCreateSchema>;
export type DesignCreate = z.output<typeof designCreateSchema>;

export const designSaveSchema = z.object({
  /** The version the editor last read; the save is refused (409) if someone saved since. */
  version: z
    .number({ error: 'Version must be a number' })
    .int('Version must be a whole number')
    .min(1, 'Version starts at 1'),
  document: designDocumentSchema,
  name: name.optional(),
});
export type DesignSaveInput = z.input<typeof designSaveSchema>;
export type DesignSave = z.output<typeof designSaveSchema>;

const userRefSchema = z.object({ id: idSchema, name: z.string() });

export const designSummarySchema = z.object({
  id: idSchema,
  name: z.string(),
  version: z.number().int(),
  updatedAt: isoDateSchema,
  updatedBy: userRefSchema.nullable(),
});
export type DesignSummary = z.infer<typeof designSummarySchema>;

export const designSchema = designSummarySchema.extend({
  jobId: idSchema,
  document: designDocumentSchema,
});
export type DesignDto = z.infer<typeof designSchema>;

export const designRevisionSchema = z.object({
  version: z.number().int(),
  savedAt: isoDateSchema,
  savedBy: userRefSchema.nullable(),
});
export type DesignRevisionDto = z.infer<typeof designRevisionSchema>;

/** The body of a 409 answer to a stale save. */
export const staleDesignSchema = z.object({
  error: z.string(),
  current: z.object({
    version: z.number().int(),
    updatedAt: isoDateSchema,
    updatedBy: userRefSchema.nullable(),
  }),
});
export type StaleDesign = z.infer<typeof staleDesignSchema>;
