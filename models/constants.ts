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

export const PRODUCT_KINDS = [
  'joist',
  'beam',
  'board',
  'post',
  'block',
  'clip',
  'screw',
  'membrane',
  'fascia',
  'concrete',
  'other',
] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];
