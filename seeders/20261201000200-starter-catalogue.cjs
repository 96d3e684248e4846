'use strict';
// A starter catalogue of generic products for the demo firm, and a small one for the second firm.
// Prices are invented demo prices in GBP. Ids are fixed so the seed is idempotent.

const LARCHFIELD = '1a4c0000-0000-4000-8000-000000000001';
const ORCHARD_ROW = '1a4c0000-0000-4000-8000-000000000002';

const product = (n, firmId, p) => ({
  id: `1a4c0000-0000-4000-8006-${String(n).padStart(12, '0')}`,
  firm_id: firmId,
  unit: 'each',
  stock_lengths_mm: [],
  dimensions: {},
  span_table: null,
  material: null,
  board_max_centres: null,
  active: true,
  ...p,
});

// JSONB columns go in as JSON text; INTEGER[] as an array literal (an empty JS array has no type).
const toRow = (p) => ({
  ...p,
  stock_lengths_mm: `{${p.stock_lengths_mm.join(',')}}`,
  dimensions: JSON.stringify(p.dimensions),
  span_table: p.span_table === null ? null : JSON.stringify(p.span_table),
  material: p.material === null ? null : JSON.stringify(p.material),
  board_max_centres: p.board_max_centres === null ? null : JSON.stringify(p.board_max_centres),
});

const larchfield = [
  product(1, LARCHFIELD, {
    kind: 'joist',
    name: 'Recycled-plastic joist 125 x 50',
    sku: 'JST-RP-12550',
    unit: 'length',
    unit_price: '24.50',
    stock_lengths_mm: [3000],
    dimensions: { widthMm: 50, depthMm: 125 },
    // Common practice: a 125 x 50 recycled-plastic joist spans at most 1.5 m at 400 mm centres.
    span_table: [{ centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 }],
  }),
  product(2, LARCHFIELD, {
    kind: 'joist',
    name: 'Treated timber joist 47 x 150 (C24)',
    sku: 'JST-C24-47150',
    unit: 'length',
    unit_price: '13.80',
    stock_lengths_mm: [3000, 3600, 4200, 4800],
    dimensions: { widthMm: 47, depthMm: 150 },
    // The engineered span check wants ALLOWABLE (working) stresses, not BS EN 338 characteristic
    // strengths. C24 grade stresses of BS 5268-2 (bending 7.5, shear 0.71, E mean 10 800 MPa) times
    // the wet-exposure factors (0.8 bending, 0.9 shear, 0.8 E), all from memory: check before use.
    material: { EMPa: 8640, fbMPa: 6, fvMPa: 0.64, densityKgM3: 420 },
  }),
  product(3, LARCHFIELD, {
    kind: 'board',
    name: 'Composite deck board 140 x 25',
    sku: 'BRD-CMP-14025',
    unit: 'length',
    unit_price: '32.00',
    stock_lengths_mm: [4800],
    dimensions: { widthMm: 140, depthMm: 25 },
    // Common practice for composite boards: 400 mm centres straight, 300 mm when laid at an angle.
    board_max_centres: { straightMm: 400, angledMm: 300 },
  }),
  product(4, LARCHFIELD, {
    kind: 'board',
    name: 'Composite border board 140 x 25',
    sku: 'BRD-CMP-14025-BDR',
    unit: 'length',
    unit_price: '35.50',
    stock_lengths_mm: [4800],
    dimensions: { widthMm: 140, depthMm: 25, border: true },
    board_max_centres: { straightMm: 400, angledMm: 300 },
  }),
  product(5, LARCHFIELD, {
    kind: 'post',
    name: 'Recycled-plastic post 100 x 100',
    sku: 'PST-RP-100100',
    unit: 'length',
    unit_price: '29.00',
    stock_lengths_mm: [2400],
    dimensions: { widthMm: 100, depthMm: 100 },
  }),
  product(6, LARCHFIELD, {
    kind: 'block',
    name: 'Solid concrete block 440 x 215 x 100',
    sku: 'BLK-440215100',
    unit_price: '1.85',
    dimensions: { lengthMm: 440, widthMm: 215, depthMm: 100 },
  }),
  product(7, LARCHFIELD, {
    kind: 'clip',
    name: 'Hidden clip, starter',
    sku: 'CLP-START',
    unit_price: '0.45',
    dimensions: { clip: 'starter' },
  }),
  product(8, LARCHFIELD, {
    kind: 'clip',
    name: 'Hidden clip, middle',
    sku: 'CLP-MID',
    unit_price: '0.32',
    dimensions: { clip: 'middle' },
  }),
  product(9, LARCHFIELD, {
    kind: 'clip',
    name: 'Hidden clip, finishing',
    sku: 'CLP-FIN',
    unit_price: '0.45',
    dimensions: { clip: 'finishing' },
  }),
  product(10, LARCHFIELD, {
    kind: 'screw',
    name: 'Construction screw 6.7 x 100',
    sku: 'SCR-67100',
    unit_price: '0.28',
    dimensions: { diameterMm: 6.7, lengthMm: 100 },
  }),
  product(11, LARCHFIELD, {
    kind: 'membrane',
    name: 'Weed membrane roll 1.5 m x 50 m',
    sku: 'MEM-WEED-1550',
    unit: 'roll',
    unit_price: '38.00',
    dimensions: { widthMm: 1500, lengthMm: 50000 },
  }),
  product(12, LARCHFIELD, {
    kind: 'fascia',
    name: 'Composite fascia board 180 x 12',
    sku: 'FAS-CMP-18012',
    unit: 'length',
    unit_price: '27.00',
    stock_lengths_mm: [3600],
    dimensions: { widthMm: 180, depthMm: 12 },
  }),
  product(13, LARCHFIELD, {
    kind: 'concrete',
    name: 'Ready-mixed concrete',
    sku: 'CON-M3',
    unit: 'm3',
    unit_price: '145.00',
    dimensions: {},
  }),
];

// The second firm reuses a SKU on purpose: SKUs are unique per firm, not across firms.
const orchardRow = [
  product(101, ORCHARD_ROW, {
    kind: 'joist',
    name: 'Plastic joist 125 x 50',
    sku: 'JST-RP-12550',
    unit: 'length',
    unit_price: '26.00',
    stock_lengths_mm: [3000],
    dimensions: { widthMm: 50, depthMm: 125 },
    span_table: [{ centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 }],
  }),
  product(102, ORCHARD_ROW, {
    kind: 'board',
    name: 'Composite board 145 x 22',
    sku: 'BRD-14522',
    unit: 'length',
    unit_price: '29.50',
    stock_lengths_mm: [3600],
    dimensions: { widthMm: 145, depthMm: 22 },
    board_max_centres: { straightMm: 400, angledMm: 300 },
  }),
];

module.exports = {
  async up(queryInterface) {
    const now = new Date();
    const rows = [...larchfield, ...orchardRow].map((p) => ({
      ...toRow(p),
      created_at: now,
      updated_at: now,
    }));
    await queryInterface.bulkInsert('products', rows, { ignoreDuplicates: true });
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('products', {
      id: [...larchfield, ...orchardRow].map((p) => p.id),
    });
  },
};
