import { describe, expect, it } from 'vitest';
import { jobCreateSchema, jobListQuerySchema, jobUpdateSchema } from './job';

const CLIENT_ID = '1a4c0000-0000-4000-8002-000000000001';

describe('jobCreateSchema', () => {
  it('trims text and fills status and notes', () => {
    const v = jobCreateSchema.parse({ title: '  Patio deck ', siteAddress: ' 1 Lane ' });
    expect(v).toMatchObject({
      title: 'Patio deck',
      siteAddress: '1 Lane',
      status: 'enquiry',
      notes: '',
    });
  });

  it.each([
    ['blank title', { title: '   ', siteAddress: 'x' }, 'title'],
    ['missing site address', { title: 'x' }, 'siteAddress'],
    ['unknown status', { title: 'x', siteAddress: 'y', status: 'paid' }, 'status'],
    ['client id that is not an id', { title: 'x', siteAddress: 'y', clientId: '42' }, 'clientId'],
    ['title over 200 characters', { title: 'x'.repeat(201), siteAddress: 'y' }, 'title'],
  ])('refuses %s', (_label, input, field) => {
    const r = jobCreateSchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join('.'))).toContain(field);
  });

  it('treats an empty client choice as no client', () => {
    expect(
      jobCreateSchema.parse({ title: 'x', siteAddress: 'y', clientId: '' }).clientId,
    ).toBeNull();
  });

  it('refuses both an existing and a new client', () => {
    const r = jobCreateSchema.safeParse({
      title: 'x',
      siteAddress: 'y',
      clientId: CLIENT_ID,
      client: { name: 'New' },
    });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(['client']);
  });

  it('checks a new client inline, with empty optional fields as null', () => {
    const ok = jobCreateSchema.parse({
      title: 'x',
      siteAddress: 'y',
      client: { name: 'Ann', email: '', phone: '' },
    });
    expect(ok.client).toEqual({ name: 'Ann', email: null, phone: null, address: null });
    const bad = jobCreateSchema.safeParse({
      title: 'x',
      siteAddress: 'y',
      client: { name: 'Ann', email: 'ann@' },
    });
    expect(bad.error!.issues.map((i) => i.path.join('.'))).toEqual(['client.email']);
  });
});

describe('jobUpdateSchema', () => {
  it('accepts any one field', () => {
    expect(jobUpdateSchema.parse({ status: 'quoted' })).toEqual({ status: 'quoted' });
    expect(jobUpdateSchema.parse({ clientId: null })).toEqual({ clientId: null });
  });
  it('refuses an empty change', () => {
    expect(jobUpdateSchema.safeParse({}).success).toBe(false);
  });
  it('refuses blanking the title', () => {
    expect(jobUpdateSchema.safeParse({ title: '' }).success).toBe(false);
  });
});

describe('jobListQuerySchema', () => {
  it('defaults to newest first, page 1 of 20', () => {
    expect(jobListQuerySchema.parse({})).toEqual({
      q: undefined,
      status: [],
      sort: 'updatedAt',
      dir: 'desc',
      page: 1,
      pageSize: 20,
    });
  });
  it('sorts names A to Z by default and reads numbers from the URL', () => {
    const v = jobListQuerySchema.parse({ sort: 'client', page: '3', pageSize: '5', q: '  mill ' });
    expect(v).toMatchObject({ sort: 'client', dir: 'asc', page: 3, pageSize: 5, q: 'mill' });
  });
  it('splits a comma list of statuses', () => {
    expect(jobListQuerySchema.parse({ status: 'quoted,accepted' }).status).toEqual([
      'quoted',
      'accepted',
    ]);
  });
  it.each([
    [{ status: 'quoted,paid' }, 'status'],
    [{ sort: 'price' }, 'sort'],
    [{ dir: 'up' }, 'dir'],
    [{ page: '0' }, 'page'],
    [{ page: 'two' }, 'page'],
    [{ pageSize: '101' }, 'pageSize'],
    [{ pageSize: '2.5' }, 'pageSize'],
  ])('refuses %o', (input, field) => {
    const r = jobListQuerySchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path[0]).toBe(field);
  });
});
