// Sending a design's paperwork: the framing plan and cut list to the crew, the order to a supplier.
import { z } from 'zod';

export const jobMailSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('plan'),
    designId: z.uuid(),
    /** Blank: every crew member of the firm. */
    to: z.array(z.email()).max(20).optional(),
    message: z.string().max(2000).optional(),
  }),
  z.object({
    kind: z.literal('order'),
    designId: z.uuid(),
    to: z.array(z.email()).min(1, 'Give the supplier’s e-mail address').max(5),
    wastePct: z.number().min(0).max(100).optional(),
    message: z.string().max(2000).optional(),
  }),
]);
export type JobMailInput = z.infer<typeof jobMailSchema>;
