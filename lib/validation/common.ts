// Small zod building blocks shared by the form and API schemas.
import { z } from 'zod';

/** A record id (UUID). Route params that fail this are answered 404, not 400. */
export const idSchema = z.uuid({ error: 'Not a valid id' });

/** Required text: trimmed, not empty, bounded. */
export const requiredText = (label: string, max: number) =>
  z
    .string({ error: `${label} is required` })
    .trim()
    .min(1, `${label} is required`)
    .max(max, `${label} must be at most ${max} characters`);

/** Optional text from a form: '' and missing both become null. */
export const optionalText = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, `${label} must be at most ${max} characters`)
    .nullish()
    .transform((v) => (v ? v : null));

/** Optional email from a form: '' and missing become null; anything else must look like an email. */
export const optionalEmail = z
  .string({ error: 'Email must be text' })
  .trim()
  .max(254, 'Email must be at most 254 characters')
  .nullish()
  .transform((v) => (v ? v.toLowerCase() : null))
  .refine((v) => v === null || z.email().safeParse(v).success, 'Enter a valid email address');

/** An ISO date-time string as it comes back in JSON. */
export const isoDateSchema = z.string();
