// The sign-in form (shared by the page and the Credentials provider).
import { z } from 'zod';

export const signInSchema = z.object({
  email: z
    .string({ error: 'Email is required' })
    .trim()
    .toLowerCase()
    .min(1, 'Email is required')
    .max(254)
    .pipe(z.email('Enter a valid email address')),
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type SignInInput = z.input<typeof signInSchema>;
