// Sign-in and session: every API route answers 401 JSON without a valid session.
import { encode } from 'next-auth/jwt';
import { describe, expect, it } from 'vitest';
import { GET as getClients, POST as postClient } from '@/app/api/clients/route';
import { GET as getDesign, PUT as putDesign } from '@/app/api/designs/[id]/route';
import { GET as getRevisions } from '@/app/api/designs/[id]/revisions/route';
import { GET as getFirm } from '@/app/api/firm/route';
import { GET as health } from '@/app/api/health/route';
import { DELETE as deleteJob, GET as getJob, PATCH as patchJob } from '@/app/api/jobs/[id]/route';
import { POST as postDesign } from '@/app/api/jobs/[id]/designs/route';
import { GET as getJobs, POST as postJob } from '@/app/api/jobs/route';
import { GET as getMe, PATCH as patchMe } from '@/app/api/me/route';
import { authOptions } from '@/lib/auth';
import { verifyCredentials } from '@/lib/server/users';
import { User } from '@/models';
import { BASE, demoUser, json, params, request } from './helpers';

const SEEDED_JOB = '1a4c0000-0000-4000-8003-000000000001';
const SEEDED_DESIGN = '1a4c0000-0000-4000-8004-000000000001';

type Handler = (req: Request, ctx: never) => Promise<Response>;
const routes: [string, string, Handler, unknown][] = [
  ['GET', '/api/jobs', getJobs as Handler, undefined],
  ['POST', '/api/jobs', postJob as Handler, undefined],
  ['GET', '/api/jobs/[id]', getJob as Handler, params(SEEDED_JOB)],
  ['PATCH', '/api/jobs/[id]', patchJob as Handler, params(SEEDED_JOB)],
  ['DELETE', '/api/jobs/[id]', deleteJob as Handler, params(SEEDED_JOB)],
  ['POST', '/api/jobs/[id]/designs', postDesign as Handler, params(SEEDED_JOB)],
  ['GET', '/api/designs/[id]', getDesign as Handler, params(SEEDED_DESIGN)],
  ['PUT', '/api/designs/[id]', putDesign as Handler, params(SEEDED_DESIGN)],
  ['GET', '/api/designs/[id]/revisions', getRevisions as Handler, params(SEEDED_DESIGN)],
  ['GET', '/api/clients', getClients as Handler, undefined],
  ['POST', '/api/clients', postClient as Handler, undefined],
  ['GET', '/api/firm', getFirm as Handler, undefined],
  ['GET', '/api/me', getMe as Handler, undefined],
  ['PATCH', '/api/me', patchMe as Handler, undefined],
];

describe('signed out', () => {
  it.each(routes)('%s %s answers 401 JSON', async (method, path, handler, ctx) => {
    const body = method === 'GET' || method === 'DELETE' ? undefined : { title: 'x' };
    const res = await handler(await request(method, path, { body }), ctx as never);
    expect(res.status).toBe(401);
    expect(await json(res)).toEqual({ error: expect.any(String) });
  });

  it('a signed-out delete leaves the job in place', async () => {
    await deleteJob(await request('DELETE', '/api/jobs/x'), params(SEEDED_JOB));
    const res = await getJob(
      await request('GET', '/api/jobs/x', { as: 'owner' }),
      params(SEEDED_JOB),
    );
    expect(res.status).toBe(200);
  });

  it('refuses a session cookie signed with another secret', async () => {
    const u = await demoUser('owner');
    const forged = await encode({
      token: { sub: u.id, id: u.id, firmId: u.firmId, role: 'owner', units: 'metric' },
      secret: 'not-the-server-secret',
    });
    const req = new Request(`${BASE}/api/firm`, {
      headers: { cookie: `next-auth.session-token=${forged}` },
    });
    expect((await getFirm(req)).status).toBe(401);
  });

  it('refuses a token that names a user in a different firm than the token says', async () => {
    const u = await demoUser('owner');
    const other = await demoUser('otherOwner');
    const token = await encode({
      token: { sub: u.id, id: u.id, firmId: other.firmId, role: 'owner', units: 'metric' },
      secret: process.env.NEXTAUTH_SECRET!,
    });
    const req = new Request(`${BASE}/api/jobs`, {
      headers: { cookie: `next-auth.session-token=${token}` },
    });
    expect((await getJobs(req)).status).toBe(401);
  });

  it('refuses a deactivated user at once, even with a valid token', async () => {
    const u = await demoUser('owner');
    const temp = await User.create({
      firmId: u.firmId,
      name: 'Temporary Hand',
      email: `temp-${crypto.randomUUID()}@larchfield.example`,
      role: 'designer',
      passwordHash: 'x',
    });
    try {
      const token = await encode({
        token: {
          sub: temp.id,
          id: temp.id,
          firmId: temp.firmId,
          role: 'designer',
          units: 'metric',
        },
        secret: process.env.NEXTAUTH_SECRET!,
      });
      const mk = () =>
        new Request(`${BASE}/api/firm`, {
          headers: { cookie: `next-auth.session-token=${token}` },
        });
      expect((await getFirm(mk())).status).toBe(200);
      await temp.update({ active: false });
      expect((await getFirm(mk())).status).toBe(401);
    } finally {
      await temp.destroy();
    }
  });
});

describe('sign-in', () => {
  it('accepts the demo password, any case of email, and returns the session fields', async () => {
    const user = await verifyCredentials(' Designer@Larchfield.EXAMPLE ', 'deckdemo-2026');
    expect(user).toMatchObject({
      name: 'Tom Ashby',
      email: 'designer@larchfield.example',
      role: 'designer',
      units: 'metric',
    });
    expect(user).not.toHaveProperty('passwordHash');
  });

  it('refuses a wrong password and an unknown email alike', async () => {
    expect(await verifyCredentials('designer@larchfield.example', 'deckdemo-2025')).toBeNull();
    expect(await verifyCredentials('nobody@larchfield.example', 'deckdemo-2026')).toBeNull();
  });

  it('puts id, firm, role, name and units into the token and the session', async () => {
    const user = await verifyCredentials('crew@larchfield.example', 'deckdemo-2026');
    const jwt = authOptions.callbacks!.jwt!;
    const token = await jwt({ token: {} as never, user: user as never, account: null });
    const session = await authOptions.callbacks!.session!({
      session: { expires: '2099-01-01T00:00:00Z', user: {} } as never,
      token: { ...token } as never,
      user: undefined as never,
      newSession: undefined,
      trigger: 'update',
    });
    expect(session.user).toEqual({
      id: user!.id,
      firmId: user!.firmId,
      role: 'crew',
      name: 'Priya Nandi',
      email: 'crew@larchfield.example',
      units: 'imperial',
    });
    // A units change from the client follows into the token; anything else is ignored.
    const updated = await jwt({
      token: { ...token } as never,
      trigger: 'update',
      session: { units: 'metric' },
    } as never);
    expect(updated.units).toBe('metric');
    const ignored = await jwt({
      token: { ...token } as never,
      trigger: 'update',
      session: { role: 'owner', units: 'cubits' },
    } as never);
    expect(ignored.role).toBe('crew');
    expect(ignored.units).toBe('imperial');
  });

  it('sends signed-out pages to /sign-in', () => {
    expect(authOptions.pages?.signIn).toBe('/sign-in');
  });
});

describe('health', () => {
  it('reports the database up', async () => {
    const res = await health();
    expect(res.status).toBe(200);
    expect(await json(res)).toEqual({ ok: true, db: true });
  });
});
