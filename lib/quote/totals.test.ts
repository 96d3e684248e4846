import { describe, expect, it } from 'vitest';
import type { QuoteLine } from '@/lib/validation/quote';
import { formatMoney, parseMoney, quoteTotals } from './totals';

const line = (p: Partial<QuoteLine> & Pick<QuoteLine, 'kind' | 'qty' | 'unitCost'>): QuoteLine => ({
  id: Math.random().toString(36).slice(2),
  description: 'x',
  unit: 'each',
  ...p,
});

describe('quoteTotals', () => {
  // UK standard VAT rate 20% (from memory; the firm sets its own rate).
  const uk = { marginPercent: 25, taxLabel: 'VAT', taxRatePercent: 20, depositPercent: 30 };

  it('marks cost up by the margin, adds tax on the subtotal, takes the deposit from the total', () => {
    const t = quoteTotals(
      [
        line({ kind: 'material', qty: 24, unitCost: 1250 }), // 24 joists at £12.50 = £300.00
        line({ kind: 'labour', qty: 3, unitCost: 40000, labourBasis: 'days' }), // 3 days at £400
      ],
      uk,
    );
    expect(t.cost).toBe(30000 + 120000);
    expect(t.subtotal).toBe(187500); // x 1.25
    expect(t.marginAmount).toBe(37500);
    expect(t.tax).toBe(37500); // 20 % of 1 875.00
    expect(t.total).toBe(225000);
    expect(t.deposit).toBe(67500); // 30 %
    expect(t.materialsCost).toBe(30000);
    expect(t.labourCost).toBe(120000);
  });

  it('prices a per-m^2 labour line from a fractional area, rounding half up to the penny', () => {
    const t = quoteTotals(
      [line({ kind: 'labour', qty: 23.455, unitCost: 3500, labourBasis: 'm2' })],
      {
        ...uk,
        marginPercent: 0,
        taxRatePercent: 0,
      },
    );
    expect(t.lines[0].cost).toBe(82093); // 23.455 x 35.00 = 820.925 -> 820.93
    expect(t.total).toBe(82093);
  });

  it('a firm without sales tax charges none', () => {
    const t = quoteTotals([line({ kind: 'other', qty: 1, unitCost: 9999 })], {
      marginPercent: 0,
      taxLabel: 'No tax',
      taxRatePercent: 0,
      depositPercent: 0,
    });
    expect(t.tax).toBe(0);
    expect(t.deposit).toBe(0);
    expect(t.total).toBe(9999);
  });
});

describe('money text', () => {
  it('formats and parses pounds and pence', () => {
    expect(formatMoney(123456, 'GBP')).toBe('£1,234.56');
    expect(parseMoney('1,234.56')).toBe(123456);
    expect(parseMoney('£12.5')).toBe(1250);
    expect(parseMoney('12.345')).toBeUndefined();
    expect(parseMoney('abc')).toBeUndefined();
  });
});
