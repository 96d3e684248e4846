// The priced take-off of a design, for quoting: frame plan -> take-off -> catalogue prices.
import { parseDesign, planFrame } from '@/engine';
import type { PricedProduct, PricedTakeOff } from '@/engine/takeoff/price';
import { priceTakeOff } from '@/engine/takeoff/price';
import { DEFAULT_WASTE_PCT } from '@/lib/pdf/requests';
import type { Product } from '@/models';

/** The same waste allowance the materials list uses, so the quote and the order agree. */
export const QUOTE_WASTE_PCT = DEFAULT_WASTE_PCT;

/** The design's priced take-off and deck area, or undefined when the design cannot be laid out. */
export function designTakeoff(
  raw: unknown,
  products: Product[],
  currency: string,
): { priced: PricedTakeOff; areaM2: number } | undefined {
  const parsed = parseDesign(raw);
  if (!parsed.ok) return undefined;
  let plan;
  try {
    plan = planFrame(parsed.design);
  } catch {
    return undefined;
  }
  const catalogue: PricedProduct[] = products.map((p) => ({
    id: p.id,
    kind: p.kind,
    name: p.name,
    unitPrice: Number(p.unitPrice),
    unit: p.unit,
    stockLengthsMm: p.stockLengthsMm,
    dimensions: p.dimensions,
    currency,
  }));
  const priced = priceTakeOff(plan.quantities, catalogue, {
    wastePct: QUOTE_WASTE_PCT,
    choices: parsed.design.products,
    currency,
  });
  return { priced, areaM2: plan.areaM2 };
}
