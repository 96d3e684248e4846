// Shared set-up for integration tests: real database (DATABASE_URL), real next-auth JWT cookies,
// route handlers called directly with Request objects.
import { encode } from 'next-auth/jwt';
import { afterAll } from 'vitest';
import { closeDb, db } from '@/lib/server/db';
import { User } from '@/models';

if (!process.env.DATABASE_URL) {
  throw new Error('Integration tests need DATABASE_URL (a migrated and seeded database)');
}
// The test script passes the real secret; a standalone run gets a fixed one.
process.env.NEXTAUTH_SECRET ||= 'integration-test-secret';
// Models are usable straight away in tests (services call db() themselves).
db();

afterAll(async () => {
  await closeDb();
});

export const BASE = 'http://localhost:3000';

export const DEMO = {
  owner: 'owner@larchfield.example',
  designer: 'designer@larchfield.example',
  crew: 'crew@larchfield.example',
  otherOwner: 'owner@orchardrow.example',
} as const;
export type Who = keyof typeof DEMO;

const cookieName = () =>
  process.env.NEXTAUTH_URL?.startsWith('https://')
    ? '__Secure-next-auth.session-token'
    : 'next-auth.session-token';

/** The seeded user behind a demo login. */
export async function demoUser(who: Who) {
  db();
  const user = await User.findOne({ where: { email: DEMO[who] } });
  if (!user) throw new Error(`seed is missing ${DEMO[who]}`);
  return user;
}

const cookies = new Map<Who, string>();

/** A session cookie signed the way next-auth signs one after a successful sign-in. */
export async function sessionCookie(who: Who): Promise<string> {
  const cached = cookies.get(who);
  if (cached) return cached;
  const u = await demoUser(who);
  const token = await encode({
    token: {
      sub: u.id,
      id: u.id,
      firmId: u.firmId,
      role: u.role,
      name: u.name,
      email: u.email,
      units: u.units,
    },
    secret: process.env.NEXTAUTH_SECRET!,
  });
  const cookie = `${cookieName()}=${token}`;
  cookies.set(who, cookie);
  return cookie;
}

/** Builds a Request as the browser would send it, optionally signed in and with a JSON body. */
export async function request(
  method: string,
  path: string,
  opts: { as?: Who; body?: unknown; rawBody?: string } = {},
): Promise<Request> {
  const headers = new Headers();
  if (opts.as) headers.set('cookie', await sessionCookie(opts.as));
  let body: string | undefined;
  if (opts.rawBody !== undefined) body = opts.rawBody;
  else if (opts.body !== undefined) body = JSON.stringify(opts.body);
  if (body !== undefined) headers.set('content-type', 'application/json');
  return new Request(new URL(path, BASE), { method, headers, body });
}

/** The route context Next passes to dynamic route handlers (params is a Promise in Next 16). */
export const params = (id: string) => ({ params: Promise.resolve({ id }) });

/** Reads a JSON answer (throws with the body if it is not JSON). */
export async function json<T = unknown>(res: Response): Promise<T> {
  const text = await res.text();
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new Error(`not JSON (${res.status}): ${text.slice(0, 200)}`);
  }
}
