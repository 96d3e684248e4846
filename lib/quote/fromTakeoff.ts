// Turns a priced take-off (engine/takeoff) into quote lines, and adds the labour lines.
import type { PricedTakeOff } from '@/engine/takeoff/price';
import type { QuoteLine } from '@/lib/validation/quote';

const pence = (major: number) => Math.round(major * 100 + 1e-9);

/** Material lines from a priced take-off; an unpriced line stays in at no cost, marked for the designer. */
export function materialLines(priced: PricedTakeOff): QuoteLine[] {
  const lines: QuoteLine[] = priced.lines.map((l, i) => ({
    id: `m${i + 1}`,
    kind: 'material' as const,
    description: l.unpriced
      ? `${l.productName ?? l.label} (no price: ${l.unpriced})`.slice(0, 300)
      : (l.productName ?? l.label).slice(0, 300),
    qty: l.buyQty ?? l.qty,
    unit: (l.buyUnit ?? l.unit).slice(0, 20),
    unitCost: l.unitPrice === undefined ? 0 : pence(l.unitPrice),
    takeoffKey: l.key.slice(0, 100),
  }));
  if (priced.waste > 0)
    lines.push({
      id: 'waste',
      kind: 'material',
      description: `Waste allowance (${priced.wastePct} %)`,
      qty: 1,
      unit: 'item',
      unitCost: pence(priced.waste),
      takeoffKey: 'waste',
    });
  return lines;
}

/** Labour: crew days at the firm's crew day rate, or the deck area at its rate per m^2. */
export function labourLine(
  opts:
    | { basis: 'days'; days: number; crewDayRate: number; crew?: number }
    | { basis: 'm2'; areaM2: number; ratePerM2: number },
): QuoteLine {
  if (opts.basis === 'days')
    return {
      id: 'labour',
      kind: 'labour',
      description: `Labour: ${opts.days} crew day${opts.days === 1 ? '' : 's'}`,
      qty: opts.days,
      unit: 'day',
      unitCost: opts.crewDayRate,
      labourBasis: 'days',
      crew: opts.crew,
    };
  return {
    id: 'labour',
    kind: 'labour',
    description: 'Labour: build and fix, by deck area',
    qty: Math.round(opts.areaM2 * 100) / 100,
    unit: 'm²',
    unitCost: opts.ratePerM2,
    labourBasis: 'm2',
  };
}
