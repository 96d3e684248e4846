// Site photos and documents, and build stages: the shared rules and schemas.
import { z } from 'zod';

/** What may be uploaded, by the type sniffed from the bytes (never the name or the browser's word). */
export const ALLOWED_FILE_TYPES = {
  'image/jpeg': { ext: ['jpg', 'jpeg'], kind: 'photo' },
  'image/png': { ext: ['png'], kind: 'photo' },
  'image/webp': { ext: ['webp'], kind: 'photo' },
  'application/pdf': { ext: ['pdf'], kind: 'document' },
} as const;
export type AllowedMime = keyof typeof ALLOWED_FILE_TYPES;

/** Largest upload: a full-size phone photo is 3-12 MB (from memory). FILE_MAX_BYTES changes it. */
export const DEFAULT_MAX_FILE_BYTES = 15 * 1024 * 1024;

export const BUILD_STAGE_LABELS = {
  set_out: 'Set out',
  footings: 'Footings',
  frame: 'Frame',
  boards: 'Boards',
  finished: 'Finished',
} as const;
export type BuildStageKey = keyof typeof BUILD_STAGE_LABELS;
export const BUILD_STAGE_KEYS = Object.keys(BUILD_STAGE_LABELS) as BuildStageKey[];

export const markStageSchema = z.object({
  stage: z.enum(BUILD_STAGE_KEYS as [BuildStageKey, ...BuildStageKey[]]),
  doneOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'a date as YYYY-MM-DD')
    .optional(),
  note: z.string().trim().max(1000).optional(),
  /** Photos already uploaded to the job that show this stage. */
  fileIds: z.array(z.uuid()).max(20).optional(),
});
export type MarkStageInput = z.infer<typeof markStageSchema>;

export const uploadFieldsSchema = z.object({
  caption: z.string().trim().max(300).optional(),
  stage: z.enum(BUILD_STAGE_KEYS as [BuildStageKey, ...BuildStageKey[]]).optional(),
});
