// Materials CSV: the priced take-off as RFC 4180 text for spreadsheets and suppliers. Pure; touches nothing outside engine/.
import type { PricedTakeOff } from './price';

/** The caution every export carries (PRODUCT.md section 3). */
export const EXPORT_CAUTION =
  'Quantities and checks are guidance only: local building codes and a qualified engineer decide. Raised decks need guards. Check for buried services before digging.';

/**
 * One CSV field: quoted when it holds a comma, a double quote, CR or LF (quotes doubled), per
 * RFC 4180 section 2. Text that a spreadsheet would run as a formula (= + - @ at the start) gets a
 * leading apostrophe first, so a product name cannot become a formula.
 */
export function csvField(v: string | number | undefined | null): string {
  if (v === undefined || v === null) return '';
  let s: string;
  if (typeof v === 'number') s = Number.isFinite(v) ? String(v) : '';
  else s = /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const money = (x: number | undefined) => (x === undefined ? undefined : x.toFixed(2));

/** The materials list as CSV: one row per line, then subtotal, waste, total and the caution; CRLF line ends. */
export function materialsCsv(priced: PricedTakeOff): string {
  const rows: (string | number | undefined)[][] = [
    [
      'Item',
      'Quantity',
      'Unit',
      'Stock length (mm)',
      'Product',
      'Buy',
      'Buy unit',
      `Unit price (${priced.currency})`,
      `Amount (${priced.currency})`,
      'Note',
    ],
  ];
  for (const l of priced.lines)
    rows.push([
      l.label,
      l.qty,
      l.unit,
      l.stockMm ?? l.pieceMm,
      l.productName,
      l.buyQty,
      l.buyUnit,
      money(l.unitPrice),
      l.unpriced ? 'unpriced' : money(l.amount),
      l.unpriced ? `Not priced: ${l.unpriced}. ${l.basis}` : l.basis,
    ]);
  const total = (label: string, amount: string | undefined, note: string | undefined) =>
    rows.push([
      label,
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
      amount,
      note,
    ]);
  total(
    'Subtotal',
    money(priced.subtotal),
    priced.unpricedCount ? `${priced.unpricedCount} line(s) not priced` : undefined,
  );
  total(
    `Waste allowance ${priced.wastePct}%`,
    money(priced.waste),
    priced.lines.some((l) => !l.wasteApplies)
      ? 'Not applied to cut-list stock lengths, which already include their offcuts'
      : undefined,
  );
  total('Total', money(priced.total), undefined);
  total('Caution', undefined, EXPORT_CAUTION);
  return (
    rows.map((r) => Array.from({ length: 10 }, (_, i) => csvField(r[i])).join(',')).join('\r\n') +
    '\r\n'
  );
}
