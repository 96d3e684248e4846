// Clients, firm and own-settings endpoints: roles, validation and firm isolation.
import { describe, expect, it } from 'vitest';
import { GET as listClients, POST as createClient } from '@/app/api/clients/route';
import { GET as getFirm } from '@/app/api/firm/route';
import { GET as getMe, PATCH as patchMe } from '@/app/api/me/route';
import { clientSchema } from '@/lib/validation/client';
import { firmSchema } from '@/lib/validation/firm';
import { Client, User } from '@/models';
import { demoUser, json, request } from './helpers';

const tag = `zc${crypto.randomUUID().slice(0, 8)}`;

describe('clients', () => {
  it('every role lists only its own firm’s clients, A to Z', async () => {
    for (const who of ['owner', 'designer', 'crew'] as const) {
      const res = await listClients(await request('GET', '/api/clients', { as: who }));
      expect(res.status).toBe(200);
      const clients = clientSchema.array().parse(await json(res));
      const names = clients.map((c) => c.name);
      expect(names).toContain('Margaret Okafor');
      expect(names).not.toContain('Alan Fenwick');
      const lower = names.map((n) => n.toLowerCase());
      expect(lower).toEqual([...lower].sort());
    }
    const theirs = clientSchema
      .array()
      .parse(await json(await listClients(await request('GET', '/x', { as: 'otherOwner' }))));
    // Other test files may add to the second firm; only its own clients may appear.
    expect(theirs.map((c) => c.name)).toContain('Alan Fenwick');
    expect(theirs.map((c) => c.name)).not.toContain('Margaret Okafor');
    const firmIds = await Client.findAll({ where: { id: theirs.map((c) => c.id) } });
    expect(new Set(firmIds.map((c) => c.firmId))).toEqual(
      new Set([(await demoUser('otherOwner')).firmId]),
    );
  });

  it('a designer adds a client to their firm', async () => {
    const res = await createClient(
      await request('POST', '/api/clients', {
        as: 'designer',
        body: { name: `${tag} Ada`, email: 'ADA@example.com', phone: '', address: '5 Ash Row' },
      }),
    );
    expect(res.status).toBe(201);
    const c = clientSchema.parse(await json(res));
    expect(c).toMatchObject({ email: 'ada@example.com', phone: null, address: '5 Ash Row' });
    expect((await Client.findByPk(c.id))!.firmId).toBe((await demoUser('designer')).firmId);
  });

  it('crew may not add a client; bad input is a 400; neither writes anything', async () => {
    const before = await Client.count();
    const crew = await createClient(
      await request('POST', '/api/clients', { as: 'crew', body: { name: `${tag} Crew` } }),
    );
    expect(crew.status).toBe(403);
    const bad = await createClient(
      await request('POST', '/api/clients', { as: 'owner', body: { name: '', email: 'x' } }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(((await json(bad)) as { fields: object }).fields).sort()).toEqual([
      'email',
      'name',
    ]);
    expect(await Client.count()).toBe(before);
  });
});

describe('firm', () => {
  it('shows the firm and its team without any password hash', async () => {
    const res = await getFirm(await request('GET', '/api/firm', { as: 'crew' }));
    expect(res.status).toBe(200);
    const raw = await json<Record<string, unknown>>(res);
    expect(JSON.stringify(raw)).not.toMatch(/password|\$2[aby]\$/i);
    const body = firmSchema.parse(raw);
    expect(body.firm).toMatchObject({
      name: 'Larchfield Decks',
      address: '4 Mill Lane',
      town: 'Kestrelford',
      postcode: 'KF3 2LD',
    });
    const team = body.users.map((u) => [u.name, u.role]);
    expect(team).toEqual(
      expect.arrayContaining([
        ['Harriet Vane', 'owner'],
        ['Tom Ashby', 'designer'],
        ['Priya Nandi', 'crew'],
      ]),
    );
    expect(body.users.map((u) => u.email)).not.toContain('owner@orchardrow.example');
  });

  it('the second firm sees only itself', async () => {
    const body = firmSchema.parse(
      await json(await getFirm(await request('GET', '/api/firm', { as: 'otherOwner' }))),
    );
    expect(body.firm.name).toBe('Orchard Row Carpentry');
    const emails = body.users.map((u) => u.email);
    expect(emails).toContain('owner@orchardrow.example');
    expect(emails.filter((e) => e.endsWith('@larchfield.example'))).toEqual([]);
  });
});

describe('me', () => {
  it('returns the signed-in user', async () => {
    const res = await getMe(await request('GET', '/api/me', { as: 'designer' }));
    expect(await json(res)).toMatchObject({ name: 'Tom Ashby', role: 'designer' });
  });

  it('any role changes their own units, and only their own', async () => {
    const crew = await demoUser('crew');
    const owner = await demoUser('owner');
    const original = crew.units;
    try {
      const next = original === 'metric' ? 'imperial' : 'metric';
      const res = await patchMe(
        await request('PATCH', '/api/me', { as: 'crew', body: { units: next } }),
      );
      expect(res.status).toBe(200);
      expect(await json(res)).toEqual({ units: next });
      expect((await User.findByPk(crew.id))!.units).toBe(next);
      expect((await User.findByPk(owner.id))!.units).toBe(owner.units);
      // The change shows at once in the session user, which is re-read from the database.
      const me = await json<{ units: string }>(
        await getMe(await request('GET', '/api/me', { as: 'crew' })),
      );
      expect(me.units).toBe(next);
    } finally {
      await User.update({ units: original }, { where: { id: crew.id } });
    }
  });

  it('refuses units it does not know', async () => {
    const crew = await demoUser('crew');
    const res = await patchMe(
      await request('PATCH', '/api/me', { as: 'crew', body: { units: 'cubits' } }),
    );
    expect(res.status).toBe(400);
    expect(((await json(res)) as { fields: object }).fields).toHaveProperty('units');
    expect((await User.findByPk(crew.id))!.units).toBe(crew.units);
  });
});
