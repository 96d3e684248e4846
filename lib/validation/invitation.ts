// Team invitations: the owner invites a designer or crew member, who sets a password from the link.
import { z } from 'zod';

export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid email address')),
  name: z.string().trim().min(1, 'Name is required').max(120),
  role: z.enum(['designer', 'crew']),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const acceptInviteSchema = z
  .object({
    name: z.string().trim().min(1, 'Name is required').max(120).optional(),
    password: z.string().min(10, 'Use at least 10 characters').max(200),
    confirm: z.string().max(200),
  })
  .refine((v) => v.password === v.confirm, {
    path: ['confirm'],
    message: 'The two passwords differ',
  });
