// Job schemas: create/update bodies, the list query, and the shapes the API answers.
import { z } from 'zod';
import { JOB_STATUSES } from '@/models/constants';
import { clientCreateSchema, clientSchema } from './client';
import { idSchema, isoDateSchema, requiredText } from './common';
import { designSummarySchema } from './design';

export const jobStatusSchema = z.enum(JOB_STATUSES, {
  error: `Status must be one of ${JOB_STATUSES.join(', ')}`,
});

/** Plain-English labels for the status values (the UI shows these). */
export const JOB_STATUS_LABELS: Record<(typeof JOB_STATUSES)[number], string> = {
  enquiry: 'Enquiry',
  surveyed: 'Surveyed',
  designing: 'Designing',
  quoted: 'Quoted',
  accepted: 'Accepted',
  building: 'Building',
  complete: 'Complete',
  lost: 'Lost',
};

const title = requiredText('Title', 200);
const siteAddress = requiredText('Site address', 500);
const notes = z
  .string({ error: 'Notes must be text' })
  .max(10_000, 'Notes must be at most 10000 characters');
/** '' from a select means "no client". */
const clientId = z
  .union([idSchema, z.literal(''), z.null()], { error: 'Choose a client from the list' })
  .transform((v) => (v ? v : null));

export const jobCreateSchema = z
  .object({
    title,
    siteAddress,
    status: jobStatusSchema.default('enquiry'),
    notes: notes.default(''),
    clientId: clientId.optional(),
    /** A new client to create with the job (instead of clientId). */
    client: clientCreateSchema.optional(),
  })
  .refine((v) => !(v.clientId && v.client), {
    message: 'Choose an existing client or enter a new one, not both',
    path: ['client'],
  });
export type JobCreateInput = z.input<typeof jobCreateSchema>;
export type JobCreate = z.output<typeof jobCreateSchema>;

export const jobUpdateSchema = z
  .object({
    title: title.optional(),
    siteAddress: siteAddress.optional(),
    status: jobStatusSchema.optional(),
    notes: notes.optional(),
    clientId: clientId.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), {
    message: 'Nothing to change',
  });
export type JobUpdateInput = z.input<typeof jobUpdateSchema>;
export type JobUpdate = z.output<typeof jobUpdateSchema>;

export const JOB_SORTS = ['updatedAt', 'title', 'status', 'client'] as const;
export const MAX_PAGE_SIZE = 100;

/** The list query as it arrives in the URL (every value a string, every value optional). */
export const jobListQuerySchema = z
  .object({
    q: z.string().trim().max(200, 'Search text must be at most 200 characters').optional(),
    /** One status or several separated by commas. */
    status: z
      .string()
      .optional()
      .transform((v) =>
        v
          ? v
              .split(',')
              .map((s) => s.trim())
              .filter(Boolean)
          : [],
      )
      .pipe(z.array(jobStatusSchema)),
    sort: z
      .enum(JOB_SORTS, { error: `Sort by one of ${JOB_SORTS.join(', ')}` })
      .default('updatedAt'),
    dir: z.enum(['asc', 'desc'], { error: 'Direction is asc or desc' }).optional(),
    page: z.coerce
      .number({ error: 'Page must be a number' })
      .int('Page must be a whole number')
      .min(1, 'Page starts at 1')
      .max(100_000)
      .default(1),
    pageSize: z.coerce
      .number({ error: 'Page size must be a number' })
      .int('Page size must be a whole number')
      .min(1, 'Page size must be at least 1')
      .max(MAX_PAGE_SIZE, `Page size must be at most ${MAX_PAGE_SIZE}`)
      .default(20),
  })
  // Newest first by default; names and statuses read best A to Z / first to last.
  .transform((v) => ({
    ...v,
    q: v.q || undefined,
    dir: v.dir ?? (v.sort === 'updatedAt' ? 'desc' : 'asc'),
  }));
export type JobListQueryInput = z.input<typeof jobListQuerySchema>;
export type JobListQuery = z.output<typeof jobListQuerySchema>;

const clientRefSchema = z.object({ id: idSchema, name: z.string() });

export const jobSummarySchema = z.object({
  id: idSchema,
  title: z.string(),
  status: jobStatusSchema,
  siteAddress: z.string(),
  client: clientRefSchema.nullable(),
  designCount: z.number().int(),
  updatedAt: isoDateSchema,
});
export type JobSummary = z.infer<typeof jobSummarySchema>;

export const jobListSchema = z.object({
  items: z.array(jobSummarySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type JobList = z.infer<typeof jobListSchema>;

export const jobSchema = jobSummarySchema.extend({
  notes: z.string(),
  createdAt: isoDateSchema,
  client: clientSchema.nullable(),
  designs: z.array(designSummarySchema),
});
export type JobDto = z.infer<typeof jobSchema>;
