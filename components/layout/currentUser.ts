// Server-side: the signed-in person for a page (re-read from the database), or a redirect to sign in.
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { getCurrentUser } from '@/lib/auth';
import { toShellUser, type ShellUser } from './roles';

/** The signed-in user, or null when signed out. One lookup per request. */
export const currentUser = cache(async (): Promise<ShellUser | null> => {
  return toShellUser(await getCurrentUser());
});

/** The signed-in user; signed-out visitors go to /sign-in. */
export async function requireUser(): Promise<ShellUser> {
  const user = await currentUser();
  if (!user) redirect('/sign-in');
  return user;
}
