// The seed: demo firm and catalogue as PRODUCT.md describes, valid design documents, and idempotent.
import path from 'node:path';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { designDocumentSchema } from '@/engine/schema';
import { db } from '@/lib/server/db';
import { Design, DesignRevision, Firm, Job, Product, User } from '@/models';
import './helpers';

const require = createRequire(import.meta.url);
const seedersDir = path.resolve(__dirname, '../../seeders');
const SEEDED_DESIGNS = [1, 2, 3, 11].map(
  (n) => `1a4c0000-0000-4000-8004-${String(n).padStart(12, '0')}`,
);

describe('demo seed', () => {
  it('has the demo firm once, with owner, designer and crew', async () => {
    const firms = await Firm.findAll({ where: { name: 'Larchfield Decks' } });
    expect(firms).toHaveLength(1);
    expect(firms[0]).toMatchObject({
      address: '4 Mill Lane',
      town: 'Kestrelford',
      postcode: 'KF3 2LD',
    });
    const users = await User.findAll({ where: { firmId: firms[0].id }, order: [['email', 'ASC']] });
    expect(users.map((u) => [u.email, u.role])).toEqual(
      expect.arrayContaining([
        ['crew@larchfield.example', 'crew'],
        ['designer@larchfield.example', 'designer'],
        ['owner@larchfield.example', 'owner'],
      ]),
    );
  });

  it('has the second firm with its owner, a job and a design', async () => {
    const firm = await Firm.findOne({ where: { name: 'Orchard Row Carpentry' } });
    expect(firm!.town).toBe('Brindlecombe');
    expect(
      await User.count({ where: { firmId: firm!.id, email: 'owner@orchardrow.example' } }),
    ).toBe(1);
    expect(await Job.count({ where: { firmId: firm!.id } })).toBeGreaterThanOrEqual(1);
    expect(await Design.count({ where: { firmId: firm!.id } })).toBeGreaterThanOrEqual(1);
  });

  it('every seeded design and its first revision is a valid design document', async () => {
    const ids = SEEDED_DESIGNS;
    const docs = [
      ...(await Design.findAll({ where: { id: ids } })).map((d) => d.document),
      ...(await DesignRevision.findAll({ where: { designId: ids, version: 1 } })).map(
        (r) => r.document,
      ),
    ];
    expect(docs).toHaveLength(8);
    for (const doc of docs) expect(designDocumentSchema.safeParse(doc).error).toBeUndefined();
  });

  it('includes the rectangle, the L-shape with steps and the 45-degree deck', async () => {
    const seeded = await Design.findAll({
      where: { id: SEEDED_DESIGNS.slice(0, 3) },
      order: [['id', 'ASC']],
    });
    const [rect, lShape, angled] = seeded.map((d) => designDocumentSchema.parse(d.document));
    expect(rect.outline).toHaveLength(4);
    expect(lShape.outline).toHaveLength(6);
    expect(lShape.steps[0]).toMatchObject({ edge: 0, count: 2, treadBoards: 3 });
    expect(angled.boardAngleDeg).toBe(45);
  });

  it('has the starter catalogue with the values PRODUCT.md names', async () => {
    const larchfield = await Firm.findOne({ where: { name: 'Larchfield Decks' } });
    const products = await Product.findAll({ where: { firmId: larchfield!.id } });
    const bySku = new Map(products.map((p) => [p.sku, p]));
    // Common practice: 125 x 50 recycled-plastic joist, 3.0 m stock, 1.5 m max span at 400 centres.
    expect(bySku.get('JST-RP-12550')).toMatchObject({
      kind: 'joist',
      stockLengthsMm: [3000],
      dimensions: { widthMm: 50, depthMm: 125 },
      spanTable: [{ centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 }],
    });
    // Allowable (working) values for the span check: BS 5268-2 C24 grade stresses (bending 7.5,
    // shear 0.71, E mean 10 800 MPa) times wet-exposure factors 0.8 / 0.9 / 0.8 — all from memory.
    const c24 = bySku.get('JST-C24-47150')!.material!;
    expect(c24.EMPa).toBeCloseTo(10_800 * 0.8, 0);
    expect(c24.fbMPa).toBeCloseTo(7.5 * 0.8, 2);
    expect(c24.fvMPa).toBeCloseTo(0.71 * 0.9, 2);
    // Common practice: composite boards come in 4.8 m lengths; 400 mm centres, closer when angled.
    expect(bySku.get('BRD-CMP-14025')).toMatchObject({
      stockLengthsMm: [4800],
      boardMaxCentres: { straightMm: 400, angledMm: 300 },
    });
    // Common UK block size.
    expect(bySku.get('BLK-440215100')!.dimensions).toEqual({
      lengthMm: 440,
      widthMm: 215,
      depthMm: 100,
    });
    expect(new Set(products.map((p) => p.kind))).toEqual(
      new Set([
        'joist',
        'board',
        'post',
        'block',
        'clip',
        'screw',
        'membrane',
        'fascia',
        'concrete',
      ]),
    );
    expect(
      products
        .filter((p) => p.kind === 'clip')
        .map((p) => p.dimensions.clip)
        .sort(),
    ).toEqual(['finishing', 'middle', 'starter']);
    expect(typeof bySku.get('CON-M3')!.unitPrice).toBe('string'); // NUMERIC stays exact
  });

  it('running the seeders again adds nothing', async () => {
    const { sequelize } = db();
    const tables = ['firms', 'users', 'clients', 'jobs', 'designs', 'design_revisions', 'products'];
    const count = async () =>
      Promise.all(
        tables.map(async (t) => {
          const [rows] = await sequelize.query(`SELECT count(*)::int AS n FROM ${t}`);
          return (rows as { n: number }[])[0].n;
        }),
      );
    const before = await count();
    const qi = sequelize.getQueryInterface();
    for (const file of ['20261201000100-demo-firms.cjs', '20261201000200-starter-catalogue.cjs']) {
      const seeder = require(path.join(seedersDir, file));
      await seeder.up(qi, sequelize.constructor);
    }
    expect(await count()).toEqual(before);
  });

  it('records the seeders as run, so a restart does not seed again', async () => {
    const [rows] = await db().sequelize.query('SELECT name FROM "SequelizeData" ORDER BY name');
    expect((rows as { name: string }[]).map((r) => r.name)).toEqual(
      expect.arrayContaining([
        '20261201000100-demo-firms.cjs',
        '20261201000200-starter-catalogue.cjs',
      ]),
    );
  });
});
