// The priced take-off of a design, for quoting: frame plan -> take-off -> catalogue prices.
import type { DesignDocument } from '@/engine/schema';
import type { PricedTakeOff } from '@/engine/takeoff/price';
import type { Product } from '@/models';

/**
 * The design's priced take-off and deck area, or undefined when the design cannot be laid out.
 * WARNING: waits for the framing engine's planFrame (engine/index.ts); until it lands, quotes start
 * with labour only and the designer adds material lines by hand.
 */
export function designTakeoff(
  doc: DesignDocument,
  products: Product[],
  currency: string,
): { priced: PricedTakeOff; areaM2: number } | undefined {
  void doc;
  void products;
  void currency;
  return undefined;
}
