// Who may do what (PRODUCT.md section 2). Shared: services enforce it, the UI hides what a role may not do.
import type { Role, Units } from '@/models/constants';

/** The signed-in user as the session carries it (session.user). */
export interface SessionUser {
  id: string;
  name: string;
  email: string;
  role: Role;
  firmId: string;
  units: Units;
}

export type Action =
  | 'job:read'
  | 'job:write'
  | 'job:delete'
  | 'design:read'
  | 'design:write'
  | 'client:read'
  | 'client:write'
  | 'firm:read'
  | 'catalogue:read'
  | 'catalogue:write';

const matrix: Record<Action, readonly Role[]> = {
  'job:read': ['owner', 'designer', 'crew'],
  'job:write': ['owner', 'designer'],
  'job:delete': ['owner'],
  'design:read': ['owner', 'designer', 'crew'],
  'design:write': ['owner', 'designer'],
  'client:read': ['owner', 'designer', 'crew'],
  'client:write': ['owner', 'designer'],
  'firm:read': ['owner', 'designer', 'crew'],
  'catalogue:read': ['owner', 'designer', 'crew'],
  'catalogue:write': ['owner'],
};

/** True when the role may perform the action. */
export function can(user: Pick<SessionUser, 'role'> | null | undefined, action: Action): boolean {
  return !!user && matrix[action].includes(user.role);
}
