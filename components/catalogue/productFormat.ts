// Short descriptions of catalogue products for the table: kind labels, size, stock lengths, limits, price.
import { formatLength, type UnitSystem } from '@/lib/units';
import type { ProductDto, ProductKind } from '@/lib/validation/product';

export const kindLabels: Record<ProductKind, string> = {
  joist: 'Joist',
  beam: 'Beam',
  board: 'Board',
  post: 'Post',
  block: 'Block',
  clip: 'Clip',
  screw: 'Screw',
  membrane: 'Membrane',
  fascia: 'Fascia',
  concrete: 'Concrete',
  other: 'Other',
};

export const unitLabels: Record<string, string> = {
  each: 'each',
  length: 'per length',
  m: 'per metre',
  m2: 'per m²',
  m3: 'per m³',
  roll: 'per roll',
  pack: 'per pack',
};

/** "125 × 50" style size (depth × width), in the user's units. */
export function sizeText(p: Pick<ProductDto, 'dimensions'>, units: UnitSystem): string {
  const { widthMm, depthMm, lengthMm } = p.dimensions;
  const parts = [lengthMm, widthMm, depthMm].filter((v): v is number => typeof v === 'number');
  if (parts.length === 0) return '—';
  if (units === 'metric') return `${parts.map((v) => Math.round(v)).join(' × ')} mm`;
  return parts.map((v) => formatLength(v, units)).join(' × ');
}

/** Stock lengths in the user's units, shortest first. */
export function stockText(p: Pick<ProductDto, 'stockLengthsMm'>, units: UnitSystem): string {
  if (p.stockLengthsMm.length === 0) return '—';
  return [...p.stockLengthsMm]
    .sort((a, b) => a - b)
    .map((mm) => formatLength(mm, units, { metricAs: 'm' }))
    .join(', ');
}

/** What the checks read from the product: span table, material or board centres. */
export function limitsText(
  p: Pick<ProductDto, 'kind' | 'spanTable' | 'material' | 'boardMaxCentres'>,
  units: UnitSystem,
): string {
  const len = (mm: number) => formatLength(mm, units);
  if (p.kind === 'joist' || p.kind === 'beam') {
    const parts: string[] = [];
    if (p.spanTable && p.spanTable.length > 0) {
      parts.push(
        [...p.spanTable]
          .sort((a, b) => a.centresMm - b.centresMm)
          .map((r) => `span ${len(r.maxSpanMm)} at ${len(r.centresMm)} centres`)
          .join('; '),
      );
    }
    if (p.material) parts.push(`engineered (E ${p.material.EMPa} MPa)`);
    return parts.join(' · ') || '—';
  }
  if (p.kind === 'board' && p.boardMaxCentres) {
    return `centres ≤ ${len(p.boardMaxCentres.straightMm)} square, ${len(p.boardMaxCentres.angledMm)} angled`;
  }
  return '—';
}

/** A price with two decimals and its unit. */
export function priceText(p: Pick<ProductDto, 'unitPrice' | 'unit'>): string {
  return `${p.unitPrice.toFixed(2)} ${unitLabels[p.unit] ?? p.unit}`;
}
