// The product catalogue API: firm scoping, owner-only writes, validation shared with the form, search.
import { describe, expect, it } from 'vitest';
import { GET as getOne, PATCH, DELETE } from '@/app/api/products/[id]/route';
import { GET as list, POST } from '@/app/api/products/route';
import { specsFromProducts, type CatalogueProduct } from '@/engine/products';
import type { ProductDto } from '@/lib/validation/product';
import { json, params, request } from './helpers';

const stamp = Date.now().toString(36);

const timberJoist = (sku: string) => ({
  kind: 'joist',
  name: `Test timber joist 47 x 200 ${stamp}`,
  sku,
  unit: 'length',
  unitPrice: 18.4,
  stockLengthsMm: [4800, 3600],
  dimensions: { widthMm: 47, depthMm: 200 },
  // Illustrative allowable stresses (from memory, roughly C24 wet service).
  material: { EMPa: 8640, fbMPa: 6, fvMPa: 0.64 },
});

async function create(body: unknown, as: 'owner' | 'designer' | 'crew' | 'otherOwner' = 'owner') {
  return POST(await request('POST', '/api/products', { as, body }));
}

describe('GET /api/products', () => {
  it('answers 401 when signed out', async () => {
    const res = await list(await request('GET', '/api/products'));
    expect(res.status).toBe(401);
  });

  it('lists only the firm’s own products, for every role', async () => {
    for (const as of ['owner', 'designer', 'crew'] as const) {
      const res = await list(await request('GET', '/api/products', { as }));
      expect(res.status).toBe(200);
      const items = await json<ProductDto[]>(res);
      expect(items.some((p) => p.sku === 'JST-RP-12550')).toBe(true);
      expect(items.some((p) => p.name === 'Plastic joist 125 x 50')).toBe(false); // Orchard Row's
    }
  });

  it('searches name and SKU, filters by kind', async () => {
    const res = await list(
      await request('GET', '/api/products?q=clip&kind=clip', { as: 'designer' }),
    );
    const items = await json<ProductDto[]>(res);
    expect(items.length).toBeGreaterThanOrEqual(3);
    expect(items.every((p) => p.kind === 'clip')).toBe(true);
    const bySku = await json<ProductDto[]>(
      await list(await request('GET', '/api/products?q=blk-440', { as: 'owner' })),
    );
    expect(bySku.map((p) => p.sku)).toEqual(['BLK-440215100']);
    const bad = await list(await request('GET', '/api/products?kind=spaceship', { as: 'owner' }));
    expect(bad.status).toBe(400);
  });
});

describe('POST /api/products', () => {
  it('the owner adds a joist; it round-trips with the price as a number', async () => {
    const res = await create(timberJoist(`T-${stamp}-1`));
    expect(res.status).toBe(201);
    const p = await json<ProductDto>(res);
    expect(p).toMatchObject({ kind: 'joist', unitPrice: 18.4, stockLengthsMm: [3600, 4800] });
    const again = await json<ProductDto>(
      await getOne(await request('GET', `/api/products/${p.id}`, { as: 'crew' }), params(p.id)),
    );
    expect(again.material).toEqual({ EMPa: 8640, fbMPa: 6, fvMPa: 0.64 });
  });

  it('designers and crew may not write (403); nothing is stored', async () => {
    for (const as of ['designer', 'crew'] as const) {
      const res = await create(timberJoist(`T-${stamp}-${as}`), as);
      expect(res.status).toBe(403);
    }
    const items = await json<ProductDto[]>(
      await list(await request('GET', `/api/products?q=T-${stamp}-designer`, { as: 'owner' })),
    );
    expect(items).toEqual([]);
  });

  it('bad input is a 400 with field messages (same schema as the form)', async () => {
    const res = await create({ ...timberJoist(`T-${stamp}-2`), material: null, unitPrice: -3 });
    expect(res.status).toBe(400);
    const body = await json<{ error: string; fields: Record<string, string[]> }>(res);
    expect(Object.keys(body.fields)).toEqual(expect.arrayContaining(['unitPrice', 'spanTable']));
  });

  it('a duplicate SKU in the same firm is a 400 on the SKU; another firm may reuse it', async () => {
    const sku = `T-${stamp}-dup`;
    expect((await create(timberJoist(sku))).status).toBe(201);
    const dup = await create(timberJoist(sku));
    expect(dup.status).toBe(400);
    expect((await json<{ fields: Record<string, string[]> }>(dup)).fields.sku).toBeDefined();
    expect((await create(timberJoist(sku), 'otherOwner')).status).toBe(201);
  });
});

describe('/api/products/[id]', () => {
  it('another firm’s product is 404 for read, change and delete', async () => {
    const mine = await json<ProductDto>(await create(timberJoist(`T-${stamp}-iso`)));
    const get = await getOne(
      await request('GET', `/api/products/${mine.id}`, { as: 'otherOwner' }),
      params(mine.id),
    );
    expect(get.status).toBe(404);
    const patch = await PATCH(
      await request('PATCH', `/api/products/${mine.id}`, {
        as: 'otherOwner',
        body: { unitPrice: 1 },
      }),
      params(mine.id),
    );
    expect(patch.status).toBe(404);
    const del = await DELETE(
      await request('DELETE', `/api/products/${mine.id}`, { as: 'otherOwner' }),
      params(mine.id),
    );
    expect(del.status).toBe(404);
    const still = await json<ProductDto>(
      await getOne(
        await request('GET', `/api/products/${mine.id}`, { as: 'owner' }),
        params(mine.id),
      ),
    );
    expect(still.unitPrice).toBe(18.4);
    const junk = await getOne(
      await request('GET', '/api/products/not-a-uuid', { as: 'owner' }),
      params('not-a-uuid'),
    );
    expect(junk.status).toBe(404);
  });

  it('the owner changes the price and retires a product; the whole product is re-checked', async () => {
    const p = await json<ProductDto>(await create(timberJoist(`T-${stamp}-3`)));
    const res = await PATCH(
      await request('PATCH', `/api/products/${p.id}`, {
        as: 'owner',
        body: { unitPrice: 19.95, active: false },
      }),
      params(p.id),
    );
    expect(res.status).toBe(200);
    expect(await json<ProductDto>(res)).toMatchObject({ unitPrice: 19.95, active: false });
    // Removing the material would leave a joist with no span basis: refused, unchanged.
    const bad = await PATCH(
      await request('PATCH', `/api/products/${p.id}`, { as: 'owner', body: { material: null } }),
      params(p.id),
    );
    expect(bad.status).toBe(400);
    const unknownKey = await PATCH(
      await request('PATCH', `/api/products/${p.id}`, { as: 'owner', body: { firmId: 'x' } }),
      params(p.id),
    );
    expect(unknownKey.status).toBe(400);
    const designer = await PATCH(
      await request('PATCH', `/api/products/${p.id}`, { as: 'designer', body: { unitPrice: 1 } }),
      params(p.id),
    );
    expect(designer.status).toBe(403);
    const after = await json<ProductDto>(
      await getOne(await request('GET', `/api/products/${p.id}`, { as: 'owner' }), params(p.id)),
    );
    expect(after.material).not.toBeNull();
    expect(after.unitPrice).toBe(19.95);
  });

  it('the owner deletes; then it is gone', async () => {
    const p = await json<ProductDto>(await create(timberJoist(`T-${stamp}-4`)));
    expect(
      (
        await DELETE(
          await request('DELETE', `/api/products/${p.id}`, { as: 'designer' }),
          params(p.id),
        )
      ).status,
    ).toBe(403);
    expect(
      (
        await DELETE(
          await request('DELETE', `/api/products/${p.id}`, { as: 'owner' }),
          params(p.id),
        )
      ).status,
    ).toBe(204);
    expect(
      (await getOne(await request('GET', `/api/products/${p.id}`, { as: 'owner' }), params(p.id)))
        .status,
    ).toBe(404);
  });
});

describe('the engine reads limits from the stored products', () => {
  it('the seeded plastic joist gives the common-practice 1500 mm span at 400 mm centres; the board 400 mm', async () => {
    const items = await json<ProductDto[]>(
      await list(await request('GET', '/api/products', { as: 'designer' })),
    );
    const joist = items.find((p) => p.sku === 'JST-RP-12550') as CatalogueProduct;
    const board = items.find((p) => p.sku === 'BRD-CMP-14025') as CatalogueProduct;
    const s = specsFromProducts({ joist, board }, 'uk', 400);
    expect(s.joist).toMatchObject({ maxSpanMm: 1500, maxCantileverMm: 100, stockMm: 3000 });
    expect(s.board).toMatchObject({ maxSpanMm: 400, stockMm: 4800 });
  });
});
