// The firm roles as the screens name them (PRODUCT.md section 2); who may do what is lib/validation/access.
import { can } from '@/lib/validation/access';
import type { Role, Units } from '@/models/constants';

export type { Role, Units };

/** What the signed-in shell and pages need to know about the person using them. */
export type ShellUser = { id: string; name: string; email: string; role: Role; units: Units };

export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  crew: 'Crew',
};

/** Owners and designers create and change jobs and designs; crew reads them. */
export function canEditJobs(role: Role): boolean {
  return can({ role }, 'job:write');
}

/** Only the owner deletes a job. */
export function canDeleteJobs(role: Role): boolean {
  return can({ role }, 'job:delete');
}

/** Reads the session user defensively (the JWT may predate a field). */
export function toShellUser(user: unknown): ShellUser | null {
  if (!user || typeof user !== 'object') return null;
  const u = user as Record<string, unknown>;
  const role = u.role === 'owner' || u.role === 'designer' || u.role === 'crew' ? u.role : null;
  if (!role || typeof u.id !== 'string') return null;
  return {
    id: u.id,
    name: typeof u.name === 'string' && u.name ? u.name : String(u.email ?? ''),
    email: typeof u.email === 'string' ? u.email : '',
    role,
    units: u.units === 'imperial' ? 'imperial' : 'metric',
  };
}
