// Take-off pricing: prices each quantity line from the firm's catalogue, adds the waste allowance and totals. Pure; touches nothing outside engine/.
import type { DesignDocument } from '../schema';
import type { QuantityLine } from '../types';

/** The least a catalogue product must say to price a line (no database types here). */
export interface PricedProduct {
  id: string;
  kind: string;
  name: string;
  /** Price per `unit`, in major currency units (pounds, dollars). */
  unitPrice: number;
  /** each | m | m2 | m3 | length (one stock length) | roll | pack. */
  unit: string;
  stockLengthsMm?: number[];
  /** Sizes and variants: widthMm/lengthMm for a roll, clip: starter|middle|finishing, packSize for a pack. */
  dimensions?: Record<string, unknown>;
  currency?: string;
}

/** A quantity line with what it costs, or why it is not priced. */
export interface PricedLine extends QuantityLine {
  productId?: string;
  productName?: string;
  /** How many of the product's unit are bought (lengths, rolls, packs...). */
  buyQty?: number;
  buyUnit?: string;
  unitPrice?: number;
  /** buyQty x unitPrice, rounded to the penny; undefined when unpriced. */
  amount?: number;
  /** Whether the waste allowance applies to this line. */
  wasteApplies: boolean;
  /** Set when the line could not be priced, saying why. */
  unpriced?: string;
}

/** A priced take-off. */
export interface PricedTakeOff {
  lines: PricedLine[];
  subtotal: number;
  waste: number;
  total: number;
  currency: string;
  wastePct: number;
  /** How many lines have no price (they are in `lines` with `unpriced` set, never counted as zero). */
  unpricedCount: number;
}

/** Choice keys whose product is a board: a border board falls back to the field board. */
const FALLBACK_CHOICE: Record<string, string> = { borderBoard: 'board' };
/** The catalogue kind for each choice key, where they differ. */
const KIND_OF: Record<string, string> = { borderBoard: 'board' };

const pennies = (x: number) => Math.round(x * 100 + 1e-9) / 100;

/** The catalogue product for a line: the design's choice, else the only product of that kind. */
function productFor(
  line: QuantityLine,
  catalogue: PricedProduct[],
  choices: DesignDocument['products'],
): PricedProduct | string {
  if (!line.product) return 'no product for this line';
  const key = line.product;
  const pick = (k: string) => (choices as Record<string, string | undefined>)[k];
  const kind = KIND_OF[key] ?? key;
  let chosen = pick(key);
  let p: PricedProduct | undefined;
  // Border boards: the chosen border board, else the catalogue's one board marked border, else the field board.
  if (!chosen && key === 'borderBoard') {
    const marked = catalogue.filter((c) => c.kind === 'board' && c.dimensions?.border === true);
    if (marked.length === 1) p = marked[0];
    else chosen = pick(FALLBACK_CHOICE[key]);
  }
  if (!p && chosen) {
    p = catalogue.find((c) => c.id === chosen);
    if (!p) return `chosen ${key} product is not in the catalogue`;
  } else if (!p) {
    let ofKind = catalogue.filter((c) => c.kind === kind);
    // Field boards: a board marked as a border board is not a candidate when others exist.
    if (key === 'board' && ofKind.length > 1) {
      const plain = ofKind.filter((c) => c.dimensions?.border !== true);
      if (plain.length > 0) ofKind = plain;
    }
    if (ofKind.length === 1) p = ofKind[0];
    else if (ofKind.length === 0) return `no ${kind} product in the catalogue`;
  }
  // Variants (clips): prefer the catalogue product of the same kind carrying that variant.
  if (line.variant) {
    const base = p ?? undefined;
    const v = catalogue.find(
      (c) => c.kind === (base?.kind ?? kind) && c.dimensions?.[kind] === line.variant,
    );
    if (v) return v;
    if (base && (base.dimensions?.[kind] === undefined || base.dimensions?.[kind] === line.variant))
      return base;
    if (!base) return `choose a ${kind} product (${line.variant})`;
    return `no ${line.variant} ${kind} in the catalogue`;
  }
  return p ?? `choose a ${kind} product: the catalogue has several`;
}

const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : undefined);

/** How many of the product's unit the line needs; a string says why it cannot be converted. */
function buyQuantity(
  line: QuantityLine,
  p: PricedProduct,
): { qty: number; note?: string } | string {
  const stocks = p.stockLengthsMm ?? [];
  const longest = stocks.length ? Math.max(...stocks) : undefined;
  switch (p.unit) {
    case 'each':
      return line.unit === 'each'
        ? { qty: line.qty }
        : `a ${line.unit} line cannot be bought by the each`;
    case 'length': {
      if (line.unit === 'length') {
        if (line.stockMm !== undefined && stocks.length && !stocks.includes(line.stockMm))
          return `${p.name} is not sold in ${line.stockMm} mm lengths (${stocks.join(', ')} mm)`;
        return { qty: line.qty };
      }
      if (!longest) return `${p.name} has no stock length`;
      if (line.unit === 'm')
        return {
          qty: Math.ceil((line.qty * 1000) / longest - 1e-9),
          note: `${longest} mm lengths, end to end`,
        };
      if (line.unit === 'each' && line.pieceMm) {
        if (line.pieceMm > longest)
          return `each piece needs ${line.pieceMm} mm, longer than ${longest} mm stock`;
        const perLength = Math.floor(longest / line.pieceMm);
        return {
          qty: Math.ceil(line.qty / perLength),
          note: `${perLength} per ${longest} mm length`,
        };
      }
      return `a ${line.unit} line cannot be bought by the length`;
    }
    case 'm':
      if (line.unit === 'm') return { qty: line.qty };
      if (line.unit === 'length' && line.stockMm) return { qty: (line.qty * line.stockMm) / 1000 };
      if (line.unit === 'each' && line.pieceMm) return { qty: (line.qty * line.pieceMm) / 1000 };
      return `a ${line.unit} line cannot be bought by the metre`;
    case 'm2':
    case 'm3':
      return line.unit === p.unit
        ? { qty: line.qty }
        : `a ${line.unit} line cannot be bought by the ${p.unit}`;
    case 'roll': {
      const w = num(p.dimensions?.widthMm);
      const l = num(p.dimensions?.lengthMm);
      if (line.unit !== 'm2') return `a ${line.unit} line cannot be bought by the roll`;
      if (!w || !l) return `${p.name} does not give its roll width and length`;
      const rollM2 = (w * l) / 1e6;
      return { qty: Math.ceil(line.qty / rollM2 - 1e-9), note: `${rollM2} m2 a roll` };
    }
    case 'pack': {
      const n = num(p.dimensions?.packSize);
      if (!n) return `${p.name} does not give its pack size`;
      if (line.unit !== 'each') return `a ${line.unit} line cannot be bought by the pack`;
      return { qty: Math.ceil(line.qty / n - 1e-9), note: `${n} a pack` };
    }
    default:
      return `unknown unit "${p.unit}" on ${p.name}`;
  }
}

/**
 * Prices a take-off from the catalogue. Each line takes the design's chosen product, or the only
 * catalogue product of its kind (boards: a product marked `dimensions.border` serves border boards); a line that cannot be priced keeps `unpriced` with the reason and
 * adds nothing (it is never priced at zero). The waste allowance (`wastePct` of the line amount)
 * applies to every line except stock lengths from the cut list, which already carry their offcuts
 * (set `wasteOnCutList` to include them). Amounts are rounded to the penny line by line.
 */
export function priceTakeOff(
  quantities: QuantityLine[],
  catalogue: PricedProduct[],
  opts: {
    wastePct: number;
    choices: DesignDocument['products'];
    currency?: string;
    wasteOnCutList?: boolean;
  },
): PricedTakeOff {
  if (!Number.isFinite(opts.wastePct) || opts.wastePct < 0 || opts.wastePct > 100)
    throw new Error('wastePct must be between 0 and 100');
  const lines: PricedLine[] = [];
  let subtotal = 0;
  let waste = 0;
  let unpricedCount = 0;
  for (const q of quantities) {
    const wasteApplies = opts.wasteOnCutList === true || q.unit !== 'length';
    const p = productFor(q, catalogue, opts.choices);
    if (typeof p === 'string') {
      lines.push({ ...q, wasteApplies, unpriced: p });
      unpricedCount++;
      continue;
    }
    const buy = buyQuantity(q, p);
    if (typeof buy === 'string' || !Number.isFinite(p.unitPrice) || p.unitPrice < 0) {
      lines.push({
        ...q,
        productId: p.id,
        productName: p.name,
        wasteApplies,
        unpriced: typeof buy === 'string' ? buy : `${p.name} has no valid price`,
      });
      unpricedCount++;
      continue;
    }
    const amount = pennies(buy.qty * p.unitPrice);
    subtotal += amount;
    if (wasteApplies) waste += (amount * opts.wastePct) / 100;
    lines.push({
      ...q,
      productId: p.id,
      productName: p.name,
      buyQty: Math.round(buy.qty * 1000) / 1000,
      buyUnit: p.unit,
      unitPrice: p.unitPrice,
      amount,
      wasteApplies,
      ...(buy.note ? { basis: `${q.basis} Bought as ${buy.note}.` } : {}),
    });
  }
  subtotal = pennies(subtotal);
  waste = pennies(waste);
  const currency = opts.currency ?? catalogue.find((c) => c.currency)?.currency ?? 'GBP';
  return {
    lines,
    subtotal,
    waste,
    total: pennies(subtotal + waste),
    currency,
    wastePct: opts.wastePct,
    unpricedCount,
  };
}
