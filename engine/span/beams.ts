// Beam formulas of AWC Design Aid No. 6 (reactions, shear, moment, deflection), unit-safe with mathjs. Pure: no I/O, no clock.
import { add, cbrt, divide, multiply, sqrt, subtract, unit as mathUnit, type Unit } from 'mathjs';

/** A physical quantity with units (a mathjs Unit), or a plain number when dimensionless. */
export type Quantity = Unit | number;

/** Makes a quantity: q(125, 'mm'), q(1.5, 'kPa'). */
export function q(value: number, units: string): Quantity {
  return mathUnit(value, units);
}

/** Product of quantities. */
export function mul(...xs: Quantity[]): Quantity {
  let acc: Quantity = 1;
  for (const x of xs) acc = multiply(acc as Unit, x as Unit) as Quantity;
  return acc;
}

/** Quotient of two quantities. */
export function div(a: Quantity, b: Quantity): Quantity {
  return divide(a as Unit, b as Unit) as Quantity;
}

/** Sum of two quantities of the same dimension. */
export function plus(a: Quantity, b: Quantity): Quantity {
  return add(a as Unit, b as Unit) as Quantity;
}

/** Difference of two quantities of the same dimension. */
export function minus(a: Quantity, b: Quantity): Quantity {
  return subtract(a as Unit, b as Unit) as Quantity;
}

/** Square root of a quantity (unit powers halve). */
export function root2(x: Quantity): Quantity {
  return sqrt(x as Unit) as unknown as Quantity;
}

/** Cube root of a quantity (unit powers divide by three). */
export function root3(x: Quantity): Quantity {
  return cbrt(x as Unit);
}

/** A quantity's value in the given units ('' for a plain number); throws when the dimensions differ. */
export function inUnits(x: Quantity, units: string): number {
  if (typeof x === 'number') {
    if (units !== '') throw new TypeError(`A plain number has no units to convert to ${units}`);
    return x;
  }
  if (units === '') {
    const v = x.toNumeric();
    if (typeof v !== 'number') throw new TypeError(`${x.toString()} is not dimensionless`);
    return v;
  }
  return x.toNumber(units);
}

/** Second moment of area of a rectangle b x d about its strong axis: I = b d³ / 12. */
export function rectI(b: Quantity, d: Quantity): Quantity {
  return div(mul(b, d, d, d), 12);
}

/** Section modulus of a rectangle b x d: S = b d² / 6. */
export function rectS(b: Quantity, d: Quantity): Quantity {
  return div(mul(b, d, d), 6);
}

/** Results of one loaded beam: reactions, largest shear and moment, largest deflection. */
export interface BeamResult {
  reactions: Quantity[];
  maxShear: Quantity;
  maxMoment: Quantity;
  maxDeflection: Quantity;
}

/** Design Aid No. 6, simple beam, uniform load w over span L: R = V = wL/2, M = wL²/8, Δ = 5wL⁴/(384EI). */
export function simpleUniform(w: Quantity, L: Quantity, E: Quantity, I: Quantity): BeamResult {
  const R = div(mul(w, L), 2);
  return {
    reactions: [R, R],
    maxShear: R,
    maxMoment: div(mul(w, L, L), 8),
    maxDeflection: div(mul(5, w, L, L, L, L), mul(384, E, I)),
  };
}

/** Design Aid No. 6, simple beam, point load P at centre: R = V = P/2, M = PL/4, Δ = PL³/(48EI). */
export function simpleCentreLoad(P: Quantity, L: Quantity, E: Quantity, I: Quantity): BeamResult {
  const R = div(P, 2);
  return {
    reactions: [R, R],
    maxShear: R,
    maxMoment: div(mul(P, L), 4),
    maxDeflection: div(mul(P, L, L, L), mul(48, E, I)),
  };
}

/** Design Aid No. 6, cantilever, uniform load: R = V = wL, M = wL²/2 (at the fixed end), Δ = wL⁴/(8EI) (free end). */
export function cantileverUniform(w: Quantity, L: Quantity, E: Quantity, I: Quantity): BeamResult {
  const R = mul(w, L);
  return {
    reactions: [R],
    maxShear: R,
    maxMoment: div(mul(w, L, L), 2),
    maxDeflection: div(mul(w, L, L, L, L), mul(8, E, I)),
  };
}

/** Results of a beam overhanging one support under uniform load (Design Aid No. 6). */
export interface OverhangResult {
  /** R1 at the far support, R2 at the support next to the overhang. */
  reactions: [Quantity, Quantity];
  /** V2 = wa (overhang side of R2), V3 = w(l² + a²)/(2l) (span side of R2). */
  shearAtR2Overhang: Quantity;
  shearAtR2Span: Quantity;
  /** Largest positive moment between supports, at x = l/2 (1 − a²/l²): w(l + a)²(l − a)²/(8l²). */
  maxSpanMoment: Quantity;
  /** Moment over R2: wa²/2. */
  supportMoment: Quantity;
  /** Deflection of the free end: wa(4a²l − l³ + 3a³)/(24EI) (positive down; negative means it lifts). */
  tipDeflection: Quantity;
}

/** Design Aid No. 6, beam overhanging one support, uniform load w over back span l and overhang a. */
export function overhangingUniform(
  w: Quantity,
  l: Quantity,
  a: Quantity,
  E: Quantity,
  I: Quantity,
): OverhangResult {
  const l2 = mul(l, l);
  const a2 = mul(a, a);
  const lPlusA = plus(l, a);
  const lMinusA = minus(l, a);
  return {
    reactions: [div(mul(w, minus(l2, a2)), mul(2, l)), div(mul(w, lPlusA, lPlusA), mul(2, l))],
    shearAtR2Overhang: mul(w, a),
    shearAtR2Span: div(mul(w, plus(l2, a2)), mul(2, l)),
    maxSpanMoment: div(mul(w, lPlusA, lPlusA, lMinusA, lMinusA), mul(8, l2)),
    supportMoment: div(mul(w, a2), 2),
    tipDeflection: div(
      mul(w, a, plus(minus(mul(4, a2, l), mul(l2, l)), mul(3, a2, a))),
      mul(24, E, I),
    ),
  };
}
