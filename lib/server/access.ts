// Enforces the role matrix of lib/validation/access.ts inside services.
import { can, type Action, type SessionUser } from '@/lib/validation/access';
import { Forbidden } from './errors';

const messages: Partial<Record<Action, string>> = {
  'job:write': 'Only owners and designers can change jobs',
  'job:delete': 'Only the owner can delete jobs',
  'design:write': 'Only owners and designers can change designs',
  'client:write': 'Only owners and designers can change clients',
  'catalogue:write': 'Only the owner can change the catalogue',
};

/** Throws Forbidden unless the user's role allows the action. */
export function assertCan(user: SessionUser, action: Action): void {
  if (!can(user, action)) throw new Forbidden(messages[action]);
}
