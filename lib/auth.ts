// Sign-in (next-auth 4, email + password, JWT sessions) and the session helpers for route
// handlers and server components. Server-only: it reaches the database.
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { getToken } from 'next-auth/jwt';
import { cookies, headers } from 'next/headers';
import type { SessionUser } from '@/lib/validation/access';
import { signInSchema } from '@/lib/validation/auth';
import { UNIT_SYSTEMS, type Units } from '@/models/constants';
import { Unauthorized } from '@/lib/server/errors';
import { loadSessionUser, verifyCredentials } from '@/lib/server/users';

export type { SessionUser };

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'Email and password',
      credentials: {
        email: { label: 'Email', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      async authorize(credentials) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) return null;
        return verifyCredentials(parsed.data.email, parsed.data.password);
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user, trigger, session }) {
      if (user) {
        const u = user as SessionUser;
        token.id = u.id;
        token.firmId = u.firmId;
        token.role = u.role;
        token.name = u.name;
        token.email = u.email;
        token.units = u.units;
      }
      // The client calls `update({ units })` after PATCH /api/me so the token follows.
      const units = (session as { units?: unknown } | undefined)?.units;
      if (trigger === 'update' && UNIT_SYSTEMS.includes(units as Units)) {
        token.units = units as Units;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = {
        id: token.id,
        firmId: token.firmId,
        role: token.role,
        name: token.name ?? '',
        email: token.email ?? '',
        units: token.units,
      };
      return session;
    },
  },
  secret: process.env.NEXTAUTH_SECRET,
};

/** Cookie header → plain object, the form next-auth's getToken reads. */
function parseCookieHeader(header: string | null): Record<string, string> {
  const out: Record<string, string> = {};
  if (!header) return out;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0) continue;
    const name = part.slice(0, eq).trim();
    const value = part.slice(eq + 1).trim();
    try {
      out[name] = decodeURIComponent(value);
    } catch {
      out[name] = value;
    }
  }
  return out;
}

async function readToken(req?: Request) {
  const secret = process.env.NEXTAUTH_SECRET;
  if (req) {
    return getToken({
      req: { headers: req.headers, cookies: parseCookieHeader(req.headers.get('cookie')) },
      secret,
    } as unknown as Parameters<typeof getToken>[0]);
  }
  const [h, c] = await Promise.all([headers(), cookies()]);
  return getToken({ req: { headers: h, cookies: c }, secret } as unknown as Parameters<
    typeof getToken
  >[0]);
}

/**
 * The signed-in user, re-read from the database (so a deactivated user or a changed role takes
 * effect at once), or null. Pass the Request in route handlers; server components pass nothing.
 */
export async function getCurrentUser(req?: Request): Promise<SessionUser | null> {
  let token;
  try {
    token = await readToken(req);
  } catch {
    return null; // a cookie signed with another secret, or a damaged one
  }
  if (!token || typeof token === 'string') return null;
  if (typeof token.id !== 'string' || typeof token.firmId !== 'string') return null;
  return loadSessionUser(token.id, token.firmId);
}

/** The signed-in user, or throws Unauthorized (answered 401 by the handle() wrapper). */
export async function requireUser(req?: Request): Promise<SessionUser> {
  const user = await getCurrentUser(req);
  if (!user) throw new Unauthorized();
  return user;
}
