import { describe, expect, it } from 'vitest';
import type { QuantityLine } from '../types';
import { csvField, EXPORT_CAUTION, materialsCsv } from './csv';
import { handDeck } from './handDeck';
import { takeOff } from './index';
import { priceTakeOff, type PricedProduct } from './price';

// Invented demo prices (the demo firm's starter catalogue shape), not real ones.
const catalogue: PricedProduct[] = [
  {
    id: 'j',
    kind: 'joist',
    name: 'Plastic joist 125 x 50',
    unit: 'length',
    unitPrice: 24.5,
    stockLengthsMm: [3000],
  },
  {
    id: 'b',
    kind: 'board',
    name: 'Composite board',
    unit: 'length',
    unitPrice: 32,
    stockLengthsMm: [4800],
  },
  {
    id: 'bb',
    kind: 'board',
    name: 'Composite border board',
    unit: 'length',
    unitPrice: 35.5,
    stockLengthsMm: [4800],
  },
  {
    id: 'p',
    kind: 'post',
    name: 'Post 100 x 100',
    unit: 'length',
    unitPrice: 29,
    stockLengthsMm: [2400],
  },
  { id: 'k', kind: 'block', name: 'Block 440 x 215 x 100', unit: 'each', unitPrice: 1.85 },
  {
    id: 'c1',
    kind: 'clip',
    name: 'Clip, starter',
    unit: 'each',
    unitPrice: 0.45,
    dimensions: { clip: 'starter' },
  },
  {
    id: 'c2',
    kind: 'clip',
    name: 'Clip, middle',
    unit: 'each',
    unitPrice: 0.32,
    dimensions: { clip: 'middle' },
  },
  {
    id: 'c3',
    kind: 'clip',
    name: 'Clip, finishing',
    unit: 'each',
    unitPrice: 0.45,
    dimensions: { clip: 'finishing' },
  },
  {
    id: 's',
    kind: 'screw',
    name: 'Screw 6.7 x 100',
    unit: 'pack',
    unitPrice: 28,
    dimensions: { packSize: 100 },
  },
  {
    id: 'm',
    kind: 'membrane',
    name: 'Membrane 1.5 x 50 m',
    unit: 'roll',
    unitPrice: 38,
    dimensions: { widthMm: 1500, lengthMm: 50000 },
  },
  {
    id: 'f',
    kind: 'fascia',
    name: 'Fascia 180 x 12',
    unit: 'length',
    unitPrice: 27,
    stockLengthsMm: [3600],
  },
  { id: 'cc', kind: 'concrete', name: 'Concrete', unit: 'm3', unitPrice: 145 },
];

const q = (over: Partial<QuantityLine>): QuantityLine => ({
  key: 'x',
  label: 'X',
  unit: 'each',
  qty: 1,
  basis: 'test',
  ...over,
});

describe('priceTakeOff', () => {
  it('prices stock lengths, packs, rolls, m3 and metres from the catalogue', () => {
    const r = priceTakeOff(
      [
        q({ key: 'joists', unit: 'length', qty: 34, stockMm: 3000, product: 'joist' }),
        q({ key: 'screws', qty: 250, product: 'screw' }),
        q({ key: 'membrane', unit: 'm2', qty: 120.5, product: 'membrane' }),
        q({ key: 'concrete', unit: 'm3', qty: 0.789, product: 'concrete' }),
        q({ key: 'fascia', unit: 'm', qty: 20, product: 'fascia' }),
        q({ key: 'posts', qty: 5, pieceMm: 1100, product: 'post' }),
      ],
      catalogue,
      { wastePct: 0, choices: { joist: 'j' } },
    );
    const by = Object.fromEntries(r.lines.map((l) => [l.key, l]));
    expect(by.joists.amount).toBe(34 * 24.5);
    expect(by.screws.buyQty).toBe(3); // 250 screws in packs of 100
    expect(by.screws.amount).toBe(84);
    expect(by.membrane.buyQty).toBe(2); // 75 m2 a roll
    expect(by.concrete.amount).toBe(114.41); // 0.789 x 145 = 114.405, to the penny
    expect(by.fascia.buyQty).toBe(6); // 20 m in 3.6 m lengths
    expect(by.posts.buyQty).toBe(3); // two 1100 mm posts from each 2400 mm length
    expect(r.subtotal).toBe(833 + 84 + 76 + 114.41 + 162 + 87);
    expect(r.unpricedCount).toBe(0);
  });

  it('shows unpriced lines as such with the reason, never as zero', () => {
    const r = priceTakeOff(
      [
        q({ key: 'odd', product: 'borderScrew' }),
        q({ key: 'boards', unit: 'length', qty: 3, stockMm: 3600, product: 'board' }),
        q({ key: 'loose', qty: 3 }),
      ],
      catalogue,
      { wastePct: 10, choices: { board: 'b' } },
    );
    expect(r.lines.every((l) => l.amount === undefined && l.unpriced)).toBe(true);
    expect(r.lines[0].unpriced).toMatch(/no borderScrew product/);
    expect(r.lines[1].unpriced).toMatch(/not sold in 3600 mm lengths/);
    expect(r.unpricedCount).toBe(3);
    expect(r.total).toBe(0);
  });

  it('asks for a choice when several products of a kind could price a line', () => {
    const r = priceTakeOff(
      [q({ key: 'boards', unit: 'length', qty: 3, stockMm: 4800, product: 'board' })],
      catalogue,
      {
        wastePct: 0,
        choices: {},
      },
    );
    expect(r.lines[0].unpriced).toMatch(/several/);
  });

  it('prices each clip type from its own product, and border boards from the border product (falling back to the board)', () => {
    const lines = [
      q({ key: 's', qty: 10, product: 'clip', variant: 'starter' }),
      q({ key: 'm', qty: 100, product: 'clip', variant: 'middle' }),
      q({ key: 'bb', unit: 'length', qty: 2, stockMm: 4800, product: 'borderBoard' }),
    ];
    const r = priceTakeOff(lines, catalogue, {
      wastePct: 0,
      choices: { clip: 'c2', board: 'b', borderBoard: 'bb' },
    });
    expect(r.lines.map((l) => l.productId)).toEqual(['c1', 'c2', 'bb']);
    const r2 = priceTakeOff(lines, catalogue, { wastePct: 0, choices: { clip: 'c2', board: 'b' } });
    expect(r2.lines[2].productId).toBe('b');
    // A catalogue board marked as a border board serves border boards when none is chosen.
    const marked = catalogue.map((c) =>
      c.id === 'bb' ? { ...c, dimensions: { border: true } } : c,
    );
    const r3 = priceTakeOff(lines, marked, { wastePct: 0, choices: { clip: 'c2' } });
    expect(r3.lines[2].productId).toBe('bb');
    const r4 = priceTakeOff(
      [q({ key: 'b', unit: 'length', qty: 1, stockMm: 4800, product: 'board' })],
      marked,
      {
        wastePct: 0,
        choices: {},
      },
    );
    expect(r4.lines[0].productId).toBe('b');
  });

  it('adds the waste allowance to everything but cut-list stock lengths, unless asked', () => {
    const lines = [
      q({ key: 'joists', unit: 'length', qty: 10, stockMm: 3000, product: 'joist' }),
      q({ key: 'blocks', qty: 100, product: 'block' }),
    ];
    const r = priceTakeOff(lines, catalogue, { wastePct: 10, choices: {} });
    expect(r.subtotal).toBe(245 + 185);
    expect(r.waste).toBe(18.5);
    expect(r.total).toBe(448.5);
    const all = priceTakeOff(lines, catalogue, { wastePct: 10, choices: {}, wasteOnCutList: true });
    expect(all.waste).toBe(43);
    expect(() => priceTakeOff(lines, catalogue, { wastePct: -1, choices: {} })).toThrow(/wastePct/);
  });

  it('prices the hand-built 6 x 4 m deck end to end', () => {
    const { plan, design } = handDeck();
    const { quantities } = takeOff(plan, design);
    const r = priceTakeOff(quantities, catalogue, {
      wastePct: 5,
      choices: { board: 'b', clip: 'c2' },
    });
    // Every line but the border face screws (none on this deck) has a product in this catalogue.
    expect(r.unpricedCount).toBe(0);
    const joists = r.lines.find((l) => l.key === 'joists-3000')!;
    expect(joists.amount).toBe(joists.qty * 24.5);
    expect(r.total).toBeCloseTo(r.subtotal + r.waste, 2);
    expect(r.currency).toBe('GBP');
  });
});

describe('materialsCsv (RFC 4180)', () => {
  it('quotes fields holding commas, quotes or line breaks and doubles the quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a, b')).toBe('"a, b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(12.5)).toBe('12.5');
    expect(csvField(undefined)).toBe('');
  });

  it('keeps a product name from running as a spreadsheet formula', () => {
    expect(csvField('=SUM(A1:A9)')).toBe("'=SUM(A1:A9)");
    expect(csvField('-5 mm')).toBe("'-5 mm");
  });

  it('writes a header, one row per line, the totals and the caution, with CRLF line ends', () => {
    const priced = priceTakeOff(
      [
        q({
          key: 'blocks',
          label: 'Blocks, laid flat',
          qty: 56,
          product: 'block',
          basis: 'rows of "blocks"',
        }),
        q({ key: 'odd', label: 'Odd', qty: 1, product: 'nothing' }),
      ],
      catalogue,
      { wastePct: 10, choices: {} },
    );
    const csv = materialsCsv(priced);
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = csv.split('\r\n').slice(0, -1);
    expect(rows[0]).toBe(
      'Item,Quantity,Unit,Stock length (mm),Product,Buy,Buy unit,Unit price (GBP),Amount (GBP),Note',
    );
    expect(rows[1]).toBe(
      '"Blocks, laid flat",56,each,,Block 440 x 215 x 100,56,each,1.85,103.60,"rows of ""blocks"""',
    );
    expect(rows[2]).toMatch(/^Odd,1,each,,,,,,unpriced,Not priced: no nothing product/);
    expect(rows[3]).toBe('Subtotal,,,,,,,,103.60,1 line(s) not priced');
    expect(rows[4]).toBe('Waste allowance 10%,,,,,,,,10.36,');
    expect(rows[5]).toBe('Total,,,,,,,,113.96,');
    expect(rows[6]).toBe(`Caution,,,,,,,,,${EXPORT_CAUTION}`);
    // Read back with a small RFC 4180 reader: ten fields a row, quotes undone.
    const read = (row: string) => {
      const out: string[] = [];
      let i = 0;
      for (;;) {
        let f = '';
        if (row[i] === '"') {
          i++;
          while (i < row.length) {
            if (row[i] === '"' && row[i + 1] === '"') {
              f += '"';
              i += 2;
            } else if (row[i] === '"') break;
            else f += row[i++];
          }
          i++;
        } else while (i < row.length && row[i] !== ',') f += row[i++];
        out.push(f);
        if (i >= row.length) return out;
        i++; // the comma
      }
    };
    for (const row of rows) expect(read(row)).toHaveLength(10);
    expect(read(rows[1])[9]).toBe('rows of "blocks"');
  });
});
