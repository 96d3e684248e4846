// Users: sign-in check, the session user, and a user's own settings.
import bcrypt from 'bcryptjs';
import type { SessionUser } from '@/lib/validation/access';
import { meUpdateSchema } from '@/lib/validation/me';
import { User } from '@/models';
import { db } from './db';
import { parseInput } from './errors';

// A real hash of a random string: lets an unknown email take as long as a wrong password.
const DUMMY_HASH = '$2b$10$.LKT6stOcuxzFlGxONtZBeuVbFeSjEEPlVDj0sO3QvEvfHWcS/f.O';

function toSessionUser(u: User): SessionUser {
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    firmId: u.firmId,
    units: u.units,
  };
}

/** Returns the active user with this email and password, or null. */
export async function verifyCredentials(
  email: string,
  password: string,
): Promise<SessionUser | null> {
  db();
  const user = await User.scope('withPassword').findOne({
    where: { email: email.trim().toLowerCase(), active: true },
  });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
  return user && ok ? toSessionUser(user) : null;
}

/** Reloads the session's user; null when they no longer exist, moved firm or were deactivated. */
export async function loadSessionUser(id: string, firmId: string): Promise<SessionUser | null> {
  db();
  const user = await User.findOne({ where: { id, firmId, active: true } });
  return user ? toSessionUser(user) : null;
}

/** Changes the signed-in user's own display units. */
export async function updateMe(actor: SessionUser, input: unknown): Promise<{ units: string }> {
  const { units } = parseInput(meUpdateSchema, input);
  db();
  await User.update({ units }, { where: { id: actor.id, firmId: actor.firmId } });
  return { units };
}
