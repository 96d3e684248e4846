// Enforces lib/validation/businessAccess.ts inside services.
import type { SessionUser } from '@/lib/validation/access';
import { businessMatrix, canDo, type BusinessAction } from '@/lib/validation/businessAccess';
import { Forbidden } from './errors';

export { canDo, type BusinessAction };

/** Throws Forbidden (403) unless the user's role allows the action. */
export function assertCanDo(user: SessionUser, a: BusinessAction): void {
  if (!canDo(user, a)) throw new Forbidden(businessMatrix[a].message || undefined);
}
