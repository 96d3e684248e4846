// Who may do what with quotes, payments, mail, team invitations, site files and build stages
// (PRODUCT.md section 2: crew upload photos and mark stages; only owners and designers quote).
// Shared: services enforce it, the screens hide what a role may not do.
import type { Role } from '@/models/constants';

export type BusinessAction =
  | 'quote:read'
  | 'quote:write'
  | 'settings:write'
  | 'file:read'
  | 'file:upload'
  | 'file:delete'
  | 'stage:read'
  | 'stage:mark'
  | 'mail:read'
  | 'mail:send'
  | 'team:invite';

export const businessMatrix: Record<BusinessAction, { roles: readonly Role[]; message: string }> = {
  'quote:read': { roles: ['owner', 'designer'], message: 'Only owners and designers see quotes' },
  'quote:write': { roles: ['owner', 'designer'], message: 'Only owners and designers can quote' },
  'settings:write': { roles: ['owner'], message: 'Only the owner can change quoting settings' },
  'file:read': { roles: ['owner', 'designer', 'crew'], message: '' },
  'file:upload': { roles: ['owner', 'designer', 'crew'], message: '' },
  'file:delete': {
    roles: ['owner', 'designer'],
    message: 'Only owners and designers delete files',
  },
  'stage:read': { roles: ['owner', 'designer', 'crew'], message: '' },
  'stage:mark': { roles: ['owner', 'designer', 'crew'], message: '' },
  'mail:read': { roles: ['owner'], message: 'Only the owner reads the firm’s sent mail' },
  'mail:send': { roles: ['owner', 'designer'], message: 'Only owners and designers send mail' },
  'team:invite': { roles: ['owner'], message: 'Only the owner invites people to the team' },
};

/** True when the role may perform the action. */
export function canDo(user: { role: Role } | null | undefined, a: BusinessAction): boolean {
  return !!user && businessMatrix[a].roles.includes(user.role);
}
