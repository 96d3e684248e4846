import { describe, expect, it } from 'vitest';
import type { ProductDto } from '@/lib/validation/product';
import { fromFormState, toFormState } from './productForm';
import { limitsText, priceText, sizeText, stockText } from './productFormat';

const joist: ProductDto = {
  id: '00000000-0000-4000-8000-000000000001',
  kind: 'joist',
  name: 'Plastic joist',
  sku: 'J1',
  unit: 'length',
  unitPrice: 24.5,
  stockLengthsMm: [3000],
  dimensions: { widthMm: 50, depthMm: 125 },
  // Common practice: 125 x 50 recycled-plastic joist spans 1.5 m at 400 mm centres.
  spanTable: [{ centresMm: 400, maxSpanMm: 1500, maxCantileverMm: 100 }],
  material: null,
  boardMaxCentres: null,
  active: true,
  createdAt: '2026-12-01T00:00:00.000Z',
  updatedAt: '2026-12-01T00:00:00.000Z',
};

describe('catalogue table text', () => {
  it('describes a joist in metric and imperial', () => {
    expect(sizeText(joist, 'metric')).toBe('50 × 125 mm');
    expect(stockText(joist, 'metric')).toBe('3.00 m');
    expect(limitsText(joist, 'metric')).toBe('span 1\u2009500 mm at 400 mm centres');
    expect(limitsText(joist, 'imperial')).toContain("4' 11");
    expect(priceText(joist)).toBe('24.50 per length');
  });
});

describe('catalogue form round trip', () => {
  it('a stored product survives form state and back (metric and imperial)', () => {
    for (const units of ['metric', 'imperial'] as const) {
      const r = fromFormState(toFormState(joist, units), units);
      expect(r.errors).toBeNull();
      const back = r.input!;
      expect(back.stockLengthsMm).toEqual(units === 'metric' ? [3000] : [3000]);
      expect(back.spanTable![0].maxSpanMm).toBeCloseTo(1500, -1); // 1/8 in rounding in imperial
      expect(back.unitPrice).toBe(24.5);
    }
  });
  it('reports typed mistakes on the right field', () => {
    const s = { ...toFormState(joist, 'metric'), stockLengths: '3000, long', unitPrice: 'abc' };
    s.spanRows = [{ centres: '400', span: '', cantilever: '' }];
    const r = fromFormState(s, 'metric');
    expect(r.input).toBeNull();
    expect(r.errors).toMatchObject({
      stockLengthsMm: expect.stringContaining('long'),
      unitPrice: expect.any(String),
      'spanTable.0.maxSpanMm': 'Required',
    });
  });
  it('a joist with neither span table nor material is refused on the span table', () => {
    const s = { ...toFormState(joist, 'metric'), spanRows: [] };
    const r = fromFormState(s, 'metric');
    expect(r.errors).toHaveProperty('spanTable');
  });
});
