import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { quoteTotals } from '@/lib/quote/totals';
import type { QuoteLine } from '@/lib/validation/quote';
import { quotePdf } from './quotePdf';

describe('quote PDF', () => {
  it('carries the firm, the lines, the totals with tax and deposit, the terms and the cautions', async () => {
    const lines: QuoteLine[] = [
      {
        id: 'a',
        kind: 'material',
        description: 'Joist 125 x 50 x 3.0 m',
        qty: 24,
        unit: 'length',
        unitCost: 1250,
      },
      {
        id: 'b',
        kind: 'labour',
        description: 'Labour: 3 crew days',
        qty: 3,
        unit: 'day',
        unitCost: 40000,
      },
    ];
    const totals = quoteTotals(lines, {
      marginPercent: 25,
      taxLabel: 'VAT',
      taxRatePercent: 20,
      depositPercent: 30,
    });
    const bytes = await quotePdf({
      firm: {
        name: 'Larchfield Decks',
        address: '4 Mill Lane, Kestrelford, KF3 2LD',
        phone: '',
        email: 'office@larchfield.example',
      },
      client: { name: 'A. Client', address: '1 Test Road' },
      quote: {
        reference: 'Q-0007',
        title: 'Garden deck',
        revision: 2,
        currency: 'GBP',
        validUntil: '2027-01-31',
        sentAt: null,
        lines,
        totals,
        terms: 'Balance due on completion.',
      },
      outline: [
        [0, 0],
        [6000, 0],
        [6000, 4000],
        [0, 4000],
      ],
      cautions: ['Local building codes and a qualified engineer decide.'],
    });
    expect(Buffer.from(bytes.subarray(0, 5)).toString()).toBe('%PDF-');
    const parser = new PDFParse({ data: Buffer.from(bytes) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Larchfield Decks');
    expect(text).toContain('Quote Q-0007');
    expect(text).toContain('Joist 125 x 50 x 3.0 m');
    expect(text).toContain('£15.63'); // £12.50 marked up 25 % = £15.625, rounded half up
    expect(text).toContain('£2,250.00'); // total incl. 20 % VAT
    expect(text).toContain('£675.00'); // 30 % deposit
    expect(text).toContain('Balance due on completion.');
    expect(text).toContain('qualified engineer decide');
    expect(text).toContain('Deck outline, about 6.00 m x 4.00 m');
  });
});
