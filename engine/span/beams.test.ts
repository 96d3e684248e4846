import { describe, expect, it } from 'vitest';
import {
  cantileverUniform,
  inUnits,
  overhangingUniform,
  q,
  rectI,
  rectS,
  simpleCentreLoad,
  simpleUniform,
} from './beams';

// Worked numbers in N and mm (so N/mm = kN/m, MPa = N/mm²), checked against the mathjs unit
// arithmetic, and each deflection also against an independent numerical double integration of
// the curvature M/EI. Formulas: American Wood Council, Design Aid No. 6.

const E_MPA = 9000;
const B = 47;
const D = 150;
const I_MM4 = (B * D ** 3) / 12; // 13 218 750 mm⁴
const E = q(E_MPA, 'MPa');
const I = rectI(q(B, 'mm'), q(D, 'mm'));

/**
 * Deflection (down positive) of a beam with bending moment M(x) (sagging positive), found by
 * integrating κ = M/EI twice (y up) and turning the sign with y = 0 at x = s1 and x = s2, or with y(0) = y'(0) = 0 when
 * s2 is omitted (a fixed end at 0). Returns y at each of the n+1 points over [0, length].
 */
function integrateDeflection(
  M: (x: number) => number,
  length: number,
  EI: number,
  supports: { fixedAt0: true } | { s1: number; s2: number },
  n = 20000,
): { x: number[]; y: number[] } {
  const h = length / n;
  const x = Array.from({ length: n + 1 }, (_, i) => i * h);
  const kappa = x.map((xi) => M(xi) / EI);
  // slope and deflection with zero initial slope and deflection (upward-positive convention)
  const run = (theta0: number) => {
    const theta = [theta0];
    const y = [0];
    for (let i = 1; i <= n; i++) {
      theta[i] = theta[i - 1] + ((kappa[i - 1] + kappa[i]) / 2) * h;
      y[i] = y[i - 1] + ((theta[i - 1] + theta[i]) / 2) * h;
    }
    return y;
  };
  if ('fixedAt0' in supports) return { x, y: run(0).map((v) => -v) };
  const i1 = Math.round(supports.s1 / h);
  const i2 = Math.round(supports.s2 / h);
  const y0 = run(0);
  const y1 = run(1);
  // y = y0 + θ·(y1 − y0) + c; choose θ, c so that y(s1) = y(s2) = 0.
  const theta = -(y0[i2] - y0[i1]) / (y1[i2] - y0[i2] - (y1[i1] - y0[i1]));
  const y = y0.map((v, i) => v + theta * (y1[i] - y0[i]));
  const c = -y[i1];
  return { x, y: y.map((v) => -(v + c)) };
}

describe('section properties', () => {
  it('I = bd³/12 and S = bd²/6 for a 47 x 150 mm section (Design Aid No. 6 section properties)', () => {
    expect(inUnits(I, 'mm^4')).toBeCloseTo(13_218_750, 3);
    expect(inUnits(rectS(q(B, 'mm'), q(D, 'mm')), 'mm^3')).toBeCloseTo(176_250, 3);
  });
});

describe('AWC Design Aid No. 6, simple beam, uniform load', () => {
  // w = 2 kN/m over L = 3 m: R = V = 3 kN, M = 2.25 kNm, Δ = 5·2·3000⁴/(384·9000·13 218 750) ≈ 17.73 mm
  const r = simpleUniform(q(2, 'kN/m'), q(3, 'm'), E, I);
  it('reactions, shear and moment', () => {
    expect(inUnits(r.reactions[0], 'kN')).toBeCloseTo(3, 9);
    expect(inUnits(r.maxShear, 'kN')).toBeCloseTo(3, 9);
    expect(inUnits(r.maxMoment, 'kN m')).toBeCloseTo(2.25, 9);
  });
  it('mid-span deflection by the formula, by hand and by numerical integration', () => {
    const delta = inUnits(r.maxDeflection, 'mm');
    expect(delta).toBeCloseTo((5 * 2 * 3000 ** 4) / (384 * E_MPA * I_MM4), 9);
    expect(delta).toBeCloseTo(17.73, 2);
    const L = 3000;
    const { y } = integrateDeflection((x) => (2 * x * (L - x)) / 2, L, E_MPA * I_MM4, {
      s1: 0,
      s2: L,
    });
    expect(Math.max(...y)).toBeCloseTo(delta, 3);
  });
});

describe('AWC Design Aid No. 6, simple beam, concentrated load at centre', () => {
  // P = 1.5 kN, L = 2.4 m: R = 0.75 kN, M = PL/4 = 0.9 kNm, Δ = PL³/(48EI) = 1500·2400³/(48·9000·I) ≈ 3.63 mm
  const r = simpleCentreLoad(q(1.5, 'kN'), q(2.4, 'm'), E, I);
  it('reactions, moment and deflection', () => {
    expect(inUnits(r.reactions[1], 'kN')).toBeCloseTo(0.75, 9);
    expect(inUnits(r.maxMoment, 'kN m')).toBeCloseTo(0.9, 9);
    const delta = inUnits(r.maxDeflection, 'mm');
    expect(delta).toBeCloseTo((1500 * 2400 ** 3) / (48 * E_MPA * I_MM4), 9);
    expect(delta).toBeCloseTo(3.63, 2);
    const L = 2400;
    const { y } = integrateDeflection(
      (x) => (x <= L / 2 ? 750 * x : 750 * (L - x)),
      L,
      E_MPA * I_MM4,
      { s1: 0, s2: L },
    );
    expect(Math.max(...y)).toBeCloseTo(delta, 3);
  });
});

describe('AWC Design Aid No. 6, cantilever, uniform load', () => {
  // w = 2 kN/m over L = 0.6 m: R = 1.2 kN, M = wL²/2 = 0.36 kNm, Δ = wL⁴/(8EI) = 2·600⁴/(8·9000·I) ≈ 0.272 mm
  const r = cantileverUniform(q(2, 'kN/m'), q(0.6, 'm'), E, I);
  it('reaction, moment and free-end deflection', () => {
    expect(inUnits(r.reactions[0], 'kN')).toBeCloseTo(1.2, 9);
    expect(inUnits(r.maxMoment, 'kN m')).toBeCloseTo(0.36, 9);
    const delta = inUnits(r.maxDeflection, 'mm');
    expect(delta).toBeCloseTo((2 * 600 ** 4) / (8 * E_MPA * I_MM4), 9);
    expect(delta).toBeCloseTo(0.272, 3);
    const L = 600;
    // Fixed end at x = 0: hogging moment −w(L − x)²/2.
    const { y } = integrateDeflection((x) => (-2 * (L - x) ** 2) / 2, L, E_MPA * I_MM4, {
      fixedAt0: true,
    });
    expect(y[y.length - 1]).toBeCloseTo(delta, 4);
  });
});

describe('AWC Design Aid No. 6, beam overhanging one support, uniform load', () => {
  // w = 2 kN/m, back span l = 3 m, overhang a = 0.75 m.
  // R1 = w(l² − a²)/(2l) = 2(9 − 0.5625)/6 = 2.8125 kN; R2 = w(l + a)²/(2l) = 2·14.0625/6 = 4.6875 kN
  // V2 = wa = 1.5 kN; V3 = w(l² + a²)/(2l) = 3.1875 kN
  // M1 = w(l + a)²(l − a)²/(8l²) = 2·14.0625·5.0625/72 ≈ 1.9775 kNm; M2 = wa²/2 = 0.5625 kNm
  const w = 2;
  const l = 3000;
  const a = 750;
  const r = overhangingUniform(q(w, 'kN/m'), q(l, 'mm'), q(a, 'mm'), E, I);
  it('reactions and shears balance the load', () => {
    expect(inUnits(r.reactions[0], 'kN')).toBeCloseTo(2.8125, 9);
    expect(inUnits(r.reactions[1], 'kN')).toBeCloseTo(4.6875, 9);
    expect(inUnits(r.reactions[0], 'kN') + inUnits(r.reactions[1], 'kN')).toBeCloseTo(
      (w * (l + a)) / 1000,
      9,
    );
    expect(inUnits(r.shearAtR2Overhang, 'kN')).toBeCloseTo(1.5, 9);
    expect(inUnits(r.shearAtR2Span, 'kN')).toBeCloseTo(3.1875, 9);
  });
  it('moments: the formula matches statics at x = l/2 (1 − a²/l²)', () => {
    expect(inUnits(r.maxSpanMoment, 'kN m')).toBeCloseTo(1.977539, 5);
    expect(inUnits(r.supportMoment, 'kN m')).toBeCloseTo(0.5625, 9);
    const R1 = 2812.5; // N
    const M = (x: number) => R1 * x - (w * x * x) / 2; // N mm between supports
    let best = -Infinity;
    for (let x = 0; x <= l; x += 1) best = Math.max(best, M(x));
    expect(best / 1e6).toBeCloseTo(inUnits(r.maxSpanMoment, 'kN m'), 5);
  });
  it('free-end deflection wa(4a²l − l³ + 3a³)/(24EI) matches numerical integration', () => {
    const tip = inUnits(r.tipDeflection, 'mm');
    expect(tip).toBeCloseTo(
      (w * a * (4 * a * a * l - l ** 3 + 3 * a ** 3)) / (24 * E_MPA * I_MM4),
      9,
    );
    const R1 = 2812.5;
    const R2 = 4687.5;
    const M = (x: number) => R1 * x - (w * x * x) / 2 + (x > l ? R2 * (x - l) : 0);
    const { y } = integrateDeflection(M, l + a, E_MPA * I_MM4, { s1: 0, s2: l });
    expect(y[y.length - 1]).toBeCloseTo(tip, 3);
    // With this short overhang the tip lifts as the back span sags (tip < 0, down positive).
    expect(tip).toBeLessThan(0);
  });
});
