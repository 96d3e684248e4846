// The shape of GET /api/firm.
import { z } from 'zod';
import { ROLES, UNIT_SYSTEMS } from '@/models/constants';
import { idSchema } from './common';

export const firmSchema = z.object({
  firm: z.object({
    id: idSchema,
    name: z.string(),
    address: z.string(),
    town: z.string(),
    postcode: z.string(),
    phone: z.string().nullable(),
    email: z.string().nullable(),
    currency: z.string(),
  }),
  users: z.array(
    z.object({ id: idSchema, name: z.string(), email: z.string(), role: z.enum(ROLES) }),
  ),
});
export type FirmDto = z.infer<typeof firmSchema>;

export const meSchema = z.object({ units: z.enum(UNIT_SYSTEMS) });
