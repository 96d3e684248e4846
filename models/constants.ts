// Enumerations shared by the models, the validation schemas and the UI (mirrors the CHECK constraints).

export const ROLES = ['owner', 'designer', 'crew'] as const;
export type Role = (typeof ROLES)[number];

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;
export type Units = (typeof UNIT_SYSTEMS)[number];

/** Job status in the order a job moves through them; `lost` can follow any of them. */
export const JOB_STATUSES = [
  'enquiry',
  'surveyed',
  'designing',
  'quoted',
  'accepted',
  'building',
  'complete',
  'lost',
] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

// One list of product kinds, owned by the engine's catalogue schema (the table's CHECK mirrors it).
export { PRODUCT_KINDS, type ProductKind } from '@/engine/products/schema';
