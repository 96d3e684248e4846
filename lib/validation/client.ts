// Client (homeowner) schemas: the create form/POST body and the shape the API answers.
import { z } from 'zod';
import { idSchema, isoDateSchema, optionalEmail, optionalText, requiredText } from './common';

export const clientCreateSchema = z.object({
  name: requiredText('Name', 200),
  email: optionalEmail,
  phone: optionalText('Phone', 50),
  address: optionalText('Address', 500),
});
export type ClientCreateInput = z.input<typeof clientCreateSchema>;
export type ClientCreate = z.output<typeof clientCreateSchema>;

export const clientSchema = z.object({
  id: idSchema,
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  address: z.string().nullable(),
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
});
export type ClientDto = z.infer<typeof clientSchema>;
