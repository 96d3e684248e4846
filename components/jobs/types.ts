// The jobs API's answers as the screens read them; the zod schemas in lib/validation are the truth.
export type { JobSummary, JobDto as Job, JobList as JobsPage } from '@/lib/validation/job';
export type { DesignSummary, DesignDto as Design } from '@/lib/validation/design';
export type { ClientDto as Client } from '@/lib/validation/client';

export type JobSortKey = 'updatedAt' | 'title' | 'status' | 'client';
export type SortDir = 'asc' | 'desc';
