// Engineered allowable span of a rectangular joist under uniform area load (AWC Design Aid No. 6, simple beam). Pure: mathjs and zod only.
import { z } from 'zod';
import { STANDING_CAUTION } from '../codes';
import { div, inUnits, mul, plus, q, rectI, rectS, root2, root3, type Quantity } from './beams';

const positive = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .finite()
    .positive(`${label} must be above 0`);

/** Input of an engineered span check; also the `npm run span` file format. */
export const spanInputSchema = z.object({
  section: z.object({ bMm: positive('section.bMm'), dMm: positive('section.dMm') }),
  material: z.object({
    EMPa: positive('material.EMPa'),
    fbMPa: positive('material.fbMPa'),
    fvMPa: positive('material.fvMPa'),
    densityKgM3: positive('material.densityKgM3').optional(),
  }),
  centresMm: positive('centresMm'),
  loads: z.object({
    imposedKPa: z.number().finite().min(0, 'loads.imposedKPa must be 0 or more'),
    deadKPa: z.number().finite().min(0, 'loads.deadKPa must be 0 or more'),
  }),
  /** n in the deflection limit L/n, under imposed load. */
  deflectionLimit: positive('deflectionLimit'),
});

export type SpanInput = z.output<typeof spanInputSchema>;
export type SpanCriterion = 'bending' | 'shear' | 'deflection';

/** The allowable simple span by each criterion, the governing one, and the working. */
export interface SpanResult {
  allowableSpanMm: number;
  governs: SpanCriterion;
  bendingSpanMm: number;
  deflectionSpanMm: number;
  shearSpanMm: number;
  /** Self-weight included in the dead load (0 when no density was given), in kN/m. */
  selfWeightKNm: number;
  /** Line loads on one joist, kN/m. */
  totalLineLoadKNm: number;
  imposedLineLoadKNm: number;
  /** The formulas and numbers with units, the limit, the source and the caution. */
  explain: string;
}

const G = q(9.80665, 'm/s^2');

/**
 * Allowable simple span of a rectangular section at given centres: the least of the bending span
 * (M = wL²/8 ≤ fb·S, total load), the shear span (1.5V/(bd) ≤ fv with V = wL/2, total load) and the
 * deflection span (5wL⁴/(384EI) ≤ L/n, imposed load only). AWC Design Aid No. 6, simple beam, uniform load.
 */
export function engineeredSpan(input: SpanInput): SpanResult {
  const { section, material, centresMm, loads, deflectionLimit } = spanInputSchema.parse(input);
  if (loads.imposedKPa + loads.deadKPa === 0 && material.densityKgM3 === undefined) {
    throw new RangeError('With no load at all every span is allowable: give imposed or dead load');
  }
  const b = q(section.bMm, 'mm');
  const d = q(section.dMm, 'mm');
  const s = q(centresMm, 'mm');
  const E = q(material.EMPa, 'MPa');
  const fb = q(material.fbMPa, 'MPa');
  const fv = q(material.fvMPa, 'MPa');
  const I = rectI(b, d);
  const S = rectS(b, d);

  const selfWeight: Quantity =
    material.densityKgM3 === undefined
      ? q(0, 'kN/m')
      : mul(q(material.densityKgM3, 'kg/m^3'), G, b, d);
  const wImposed = mul(q(loads.imposedKPa, 'kPa'), s);
  const wTotal = mul(q(loads.imposedKPa + loads.deadKPa, 'kPa'), s);
  const wAll = plus(wTotal, selfWeight);

  // Bending: wL²/8 = fb S  ->  L = sqrt(8 fb S / w).
  const Lb = root2(div(mul(8, fb, S), wAll));
  // Shear: 1.5 (wL/2) / (bd) = fv  ->  L = 4 fv b d / (3 w).
  const Lv = div(mul(4, fv, b, d), mul(3, wAll));
  // Deflection: 5 wL⁴/(384 E I) = L/n  ->  L = cbrt(384 E I / (5 n w)), imposed load only.
  const Ld =
    loads.imposedKPa > 0 ? root3(div(mul(384, E, I), mul(5, deflectionLimit, wImposed))) : null;

  const bendingSpanMm = inUnits(Lb, 'mm');
  const shearSpanMm = inUnits(Lv, 'mm');
  const deflectionSpanMm = Ld === null ? Number.POSITIVE_INFINITY : inUnits(Ld, 'mm');
  const candidates: [SpanCriterion, number][] = [
    ['bending', bendingSpanMm],
    ['shear', shearSpanMm],
    ['deflection', deflectionSpanMm],
  ];
  const [governs, allowableSpanMm] = candidates.reduce((best, c) => (c[1] < best[1] ? c : best));

  const selfWeightKNm = inUnits(selfWeight, 'kN/m');
  const totalLineLoadKNm = inUnits(wAll, 'kN/m');
  const imposedLineLoadKNm = inUnits(wImposed, 'kN/m');
  const r1 = (v: number) => Math.round(v * 10) / 10;
  const r3 = (v: number) => Math.round(v * 1000) / 1000;
  const explain = [
    `Section ${r1(section.bMm)} × ${r1(section.dMm)} mm: I = bd³/12 = ${r1(inUnits(I, 'cm^4'))} cm⁴, S = bd²/6 = ${r1(inUnits(S, 'cm^3'))} cm³.`,
    `Material: E = ${material.EMPa} MPa, fb = ${material.fbMPa} MPa, fv = ${material.fvMPa} MPa${material.densityKgM3 ? `, density ${material.densityKgM3} kg/m³ (self-weight ${r3(selfWeightKNm)} kN/m)` : ' (self-weight not included: no density given)'}.`,
    `Loads at ${r1(centresMm)} mm centres: imposed ${loads.imposedKPa} kN/m² -> ${r3(imposedLineLoadKNm)} kN/m; total w = ${r3(totalLineLoadKNm)} kN/m.`,
    `Bending: wL²/8 ≤ fb·S -> L = √(8·fb·S/w) = ${Math.round(bendingSpanMm)} mm.`,
    `Shear: 1.5·(wL/2)/(bd) ≤ fv -> L = 4·fv·b·d/(3w) = ${Math.round(shearSpanMm)} mm.`,
    Ld === null
      ? 'Deflection: no imposed load, so no deflection limit applies.'
      : `Deflection under imposed load: 5wL⁴/(384EI) ≤ L/${deflectionLimit} -> L = ∛(384·E·I/(5·${deflectionLimit}·w)) = ${Math.round(deflectionSpanMm)} mm.`,
    `Allowable simple span: ${Math.round(allowableSpanMm)} mm (${governs} governs).`,
    'Source: American Wood Council, Design Aid No. 6, simple beam with uniform load (M = wL²/8, V = wL/2, Δ = 5wL⁴/(384EI)).',
    STANDING_CAUTION,
  ].join('\n');

  return {
    allowableSpanMm,
    governs,
    bendingSpanMm,
    deflectionSpanMm,
    shearSpanMm,
    selfWeightKNm,
    totalLineLoadKNm,
    imposedLineLoadKNm,
    explain,
  };
}
