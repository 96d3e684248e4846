// Quote arithmetic shared by the quote editor and the server: money in integer minor units (pence,
// cents), margin as a mark-up on cost, tax on the marked-up subtotal, deposit on the total.
import type { QuoteLine, QuoteSettings } from '@/lib/validation/quote';

export interface QuoteLineTotal {
  id: string;
  /** qty x unit cost, minor units. */
  cost: number;
  /** What the client sees for the line: cost marked up by the margin, minor units. */
  price: number;
  /** Unit price the client sees (rounded), minor units. */
  unitPrice: number;
}

export interface QuoteTotals {
  lines: QuoteLineTotal[];
  materialsCost: number;
  labourCost: number;
  otherCost: number;
  cost: number;
  marginAmount: number;
  subtotal: number;
  taxLabel: string;
  taxRatePercent: number;
  tax: number;
  total: number;
  depositPercent: number;
  deposit: number;
}

const roundHalfUp = (x: number) => Math.sign(x) * Math.round(Math.abs(x) + 1e-9);

/** Works out line prices, margin, tax, total and deposit. Pure; the same numbers on both sides. */
export function quoteTotals(
  lines: QuoteLine[],
  opts: Pick<QuoteSettings, 'marginPercent' | 'taxLabel' | 'taxRatePercent' | 'depositPercent'>,
): QuoteTotals {
  const markUp = 1 + opts.marginPercent / 100;
  const out: QuoteLineTotal[] = [];
  let materialsCost = 0;
  let labourCost = 0;
  let otherCost = 0;
  let subtotal = 0;
  for (const line of lines) {
    const cost = roundHalfUp(line.qty * line.unitCost);
    const price = roundHalfUp(cost * markUp);
    const unitPrice = roundHalfUp(line.unitCost * markUp);
    out.push({ id: line.id, cost, price, unitPrice });
    subtotal += price;
    switch (line.kind) {
      case 'material':
        materialsCost += cost;
        break;
      case 'labour':
        labourCost += cost;
        break;
      case 'other':
        otherCost += cost;
        break;
      default: {
        const never: never = line.kind;
        throw new Error(`unknown quote line kind ${String(never)}`);
      }
    }
  }
  const cost = materialsCost + labourCost + otherCost;
  const tax = roundHalfUp((subtotal * opts.taxRatePercent) / 100);
  const total = subtotal + tax;
  return {
    lines: out,
    materialsCost,
    labourCost,
    otherCost,
    cost,
    marginAmount: subtotal - cost,
    subtotal,
    taxLabel: opts.taxLabel,
    taxRatePercent: opts.taxRatePercent,
    tax,
    total,
    depositPercent: opts.depositPercent,
    deposit: roundHalfUp((total * opts.depositPercent) / 100),
  };
}

/** "£1,234.56" in the firm's currency. */
export function formatMoney(minor: number, currency: string, locale = 'en-GB'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minor / 100);
}

/** Parses "1,234.56" or "1234.5" into minor units; undefined when it is not a money amount. */
export function parseMoney(text: string): number | undefined {
  const t = text.replace(/[£$€,\s]/g, '');
  if (!/^-?\d+(\.\d{0,2})?$/.test(t)) return undefined;
  return roundHalfUp(Number(t) * 100);
}
