// Quote, proposal, payment and settings inputs: one zod schema each, shared by forms and routes.
import { z } from 'zod';

export const QUOTE_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'expired'] as const;
export const quoteStatusSchema = z.enum(QUOTE_STATUSES);
export type QuoteStatus = z.infer<typeof quoteStatusSchema>;

const money = z.number().int('money is in whole pence/cents').min(0).max(100_000_000_00);

export const quoteLineKindSchema = z.enum(['material', 'labour', 'other']);

/** How a labour line was worked out: crew days at a day rate, or an area at a rate per m^2. */
export const labourBasisSchema = z.enum(['days', 'm2']);

export const quoteLineSchema = z.object({
  id: z.string().min(1).max(64),
  kind: quoteLineKindSchema,
  description: z.string().trim().min(1, 'describe the line').max(300),
  qty: z.number().min(0).max(1_000_000),
  unit: z.string().trim().max(20).default('each'),
  /** Cost to the firm per unit, minor units; the client sees it marked up by the margin. */
  unitCost: money,
  labourBasis: labourBasisSchema.optional(),
  /** For day-rate labour: crew size, so the day rate is crew x rate per person. Display only. */
  crew: z.number().int().min(1).max(50).optional(),
  /** Take-off key the line came from, when it came from a design. */
  takeoffKey: z.string().max(100).optional(),
});
export type QuoteLine = z.infer<typeof quoteLineSchema>;

export const quoteSettingsSchema = z.object({
  marginPercent: z.number().min(0).max(500),
  taxLabel: z.string().trim().max(30),
  taxRatePercent: z.number().min(0).max(50),
  depositPercent: z.number().min(0).max(100),
});
export type QuoteSettings = z.infer<typeof quoteSettingsSchema>;

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'a date as YYYY-MM-DD');

/** Body of POST /api/jobs/[id]/quotes. Lines default to the design's take-off plus labour. */
export const createQuoteSchema = z.object({
  designId: z.uuid().optional(),
  title: z.string().trim().min(1).max(200).optional(),
  labourDays: z.number().min(0).max(365).optional(),
  crewSize: z.number().int().min(1).max(50).optional(),
});
export type CreateQuoteInput = z.infer<typeof createQuoteSchema>;

/** Body of PUT /api/quotes/[id]: a new revision. `revision` is the one last read (stale: 409). */
export const updateQuoteSchema = quoteSettingsSchema.extend({
  revision: z.number().int().min(1),
  title: z.string().trim().min(1).max(200),
  lines: z.array(quoteLineSchema).max(500),
  validUntil: isoDate,
  terms: z.string().max(5000),
  note: z.string().max(2000).default(''),
});
export type UpdateQuoteInput = z.infer<typeof updateQuoteSchema>;

/** Body of POST /api/quotes/[id]/send. */
export const sendQuoteSchema = z.object({
  to: z.email('a valid e-mail address').optional(),
  message: z.string().max(2000).optional(),
});

/** The client's answer on the proposal page. */
export const proposalAnswerSchema = z.discriminatedUnion('answer', [
  z.object({
    answer: z.literal('accept'),
    name: z.string().trim().min(2, 'type your full name').max(120),
    agree: z.literal(true, { error: 'tick to confirm you accept the quote and its terms' }),
  }),
  z.object({
    answer: z.literal('decline'),
    reason: z.string().trim().max(1000).optional(),
  }),
]);
export type ProposalAnswer = z.infer<typeof proposalAnswerSchema>;

/** The firm's quoting defaults (owner only). */
export const firmQuoteSettingsSchema = quoteSettingsSchema.extend({
  validityDays: z.number().int().min(1).max(365),
  crewDayRate: money,
  labourRatePerM2: money,
  terms: z.string().max(5000),
});
export type FirmQuoteSettings = z.infer<typeof firmQuoteSettingsSchema>;
