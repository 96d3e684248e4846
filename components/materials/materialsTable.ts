// Plain helpers for the materials table: which group a take-off line belongs to, and money text.
import type { PricedLine } from '@/engine/takeoff/price';

export type MaterialsGroup = 'frame' | 'boards' | 'fixings' | 'footings' | 'sundries';

export const GROUP_TITLES: Record<MaterialsGroup, string> = {
  frame: 'Frame',
  boards: 'Boards',
  fixings: 'Fixings',
  footings: 'Footings',
  sundries: 'Sundries',
};

const ORDER: MaterialsGroup[] = ['frame', 'boards', 'fixings', 'footings', 'sundries'];

// Product choice keys (DesignDocument.products, QuantityLine.product) by group.
const BY_PRODUCT: Record<string, MaterialsGroup> = {
  joist: 'frame',
  beam: 'frame',
  board: 'boards',
  borderBoard: 'boards',
  fascia: 'boards',
  clip: 'fixings',
  screw: 'fixings',
  borderScrew: 'fixings',
  block: 'footings',
  concrete: 'footings',
  post: 'footings',
  membrane: 'sundries',
};

/** The group a take-off line is shown under; anything unknown is a sundry. */
export function groupOf(line: Pick<PricedLine, 'product' | 'key'>): MaterialsGroup {
  if (line.product && BY_PRODUCT[line.product]) return BY_PRODUCT[line.product];
  const head = line.key.split(/[-_]/)[0];
  const guess = Object.entries(BY_PRODUCT).find(([k]) => head.startsWith(k));
  return guess ? guess[1] : 'sundries';
}

/** Lines grouped in the order a crew loads a van: frame, boards, fixings, footings, sundries. */
export function groupLines<L extends Pick<PricedLine, 'product' | 'key' | 'amount'>>(
  lines: L[],
): { group: MaterialsGroup; title: string; lines: L[]; amount: number }[] {
  return ORDER.map((group) => {
    const mine = lines.filter((l) => groupOf(l) === group);
    const amount = Math.round(mine.reduce((s, l) => s + (l.amount ?? 0), 0) * 100) / 100;
    return { group, title: GROUP_TITLES[group], lines: mine, amount };
  }).filter((g) => g.lines.length > 0);
}

/** Money in the firm's currency, e.g. "£1,234.50". */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(amount);
  } catch {
    return `${amount.toFixed(2)} ${currency}`;
  }
}

/** A quantity with its unit in words a buyer reads: "62 lengths", "0.86 m³", "490". */
export function quantityText(qty: number, unit: string): string {
  const n = Number.isInteger(qty) ? String(qty) : String(Math.round(qty * 100) / 100);
  switch (unit) {
    case 'm2':
      return `${n} m²`;
    case 'm3':
      return `${n} m³`;
    case 'm':
      return `${n} m`;
    case 'length':
      return `${n} length${qty === 1 ? '' : 's'}`;
    case 'roll':
      return `${n} roll${qty === 1 ? '' : 's'}`;
    case 'pack':
      return `${n} pack${qty === 1 ? '' : 's'}`;
    default:
      return n;
  }
}
