import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { engineeredSpan, type SpanInput } from '.';
import { inUnits, q, rectI, simpleUniform } from './beams';

// A 47 x 150 mm timber joist at 400 mm centres under the UK domestic load (1.5 kN/m² imposed,
// BS EN 1991-1-1 UK NA, from memory) plus 0.5 kN/m² dead, L/360. Stresses are illustrative
// (softwood of roughly C24 grade, from memory), not a design value set.
const uk: SpanInput = {
  section: { bMm: 47, dMm: 150 },
  material: { EMPa: 10800, fbMPa: 7.5, fvMPa: 0.71 },
  centresMm: 400,
  loads: { imposedKPa: 1.5, deadKPa: 0.5 },
  deflectionLimit: 360,
};

describe('engineered span (AWC Design Aid No. 6, simple beam, uniform load)', () => {
  const r = engineeredSpan(uk);
  const I = (47 * 150 ** 3) / 12;
  const S = (47 * 150 ** 2) / 6;

  it('bending span from wL²/8 = fb·S with total load (N, mm)', () => {
    expect(r.bendingSpanMm).toBeCloseTo(Math.sqrt((8 * 7.5 * S) / 0.8), 6); // w = 2.0 kPa × 0.4 m = 0.8 N/mm
    expect(r.bendingSpanMm).toBeCloseTo(3635.8, 1);
  });
  it('shear span from 1.5(wL/2)/(bd) = fv with total load', () => {
    expect(r.shearSpanMm).toBeCloseTo((4 * 0.71 * 47 * 150) / (3 * 0.8), 6);
  });
  it('deflection span from 5wL⁴/(384EI) = L/360 with imposed load only', () => {
    expect(r.deflectionSpanMm).toBeCloseTo(Math.cbrt((384 * 10800 * I) / (5 * 360 * 0.6)), 6); // 1.5 kPa × 0.4 m
  });
  it('the least span governs', () => {
    expect(r.governs).toBe('bending');
    expect(r.allowableSpanMm).toBe(Math.min(r.bendingSpanMm, r.shearSpanMm, r.deflectionSpanMm));
  });
  it('each span, put back into the Design Aid No. 6 formulas, sits exactly on its limit', () => {
    const E = q(10800, 'MPa');
    const Iq = rectI(q(47, 'mm'), q(150, 'mm'));
    const atBending = simpleUniform(q(0.8, 'kN/m'), q(r.bendingSpanMm, 'mm'), E, Iq);
    expect(inUnits(atBending.maxMoment, 'N mm') / S).toBeCloseTo(7.5, 9);
    const atShear = simpleUniform(q(0.8, 'kN/m'), q(r.shearSpanMm, 'mm'), E, Iq);
    expect((1.5 * inUnits(atShear.maxShear, 'N')) / (47 * 150)).toBeCloseTo(0.71, 9);
    const atDefl = simpleUniform(q(0.6, 'kN/m'), q(r.deflectionSpanMm, 'mm'), E, Iq);
    expect(inUnits(atDefl.maxDeflection, 'mm')).toBeCloseTo(r.deflectionSpanMm / 360, 9);
  });
  it('explains itself with formulas, numbers, source and caution', () => {
    expect(r.explain).toContain('wL²/8');
    expect(r.explain).toContain('Design Aid No. 6');
    expect(r.explain).toContain('qualified engineer');
    expect(r.explain).toContain(`${Math.round(r.bendingSpanMm)} mm`);
  });
});

describe('self-weight', () => {
  it('is included only when a density is given, and never in the deflection check', () => {
    const without = engineeredSpan(uk);
    const withDensity = engineeredSpan({ ...uk, material: { ...uk.material, densityKgM3: 500 } });
    expect(without.selfWeightKNm).toBe(0);
    // 500 kg/m³ × 9.80665 m/s² × 0.047 m × 0.150 m = 0.03457 kN/m
    expect(withDensity.selfWeightKNm).toBeCloseTo((500 * 9.80665 * 0.047 * 0.15) / 1000, 9);
    expect(withDensity.bendingSpanMm).toBeCloseTo(
      Math.sqrt((8 * 7.5 * ((47 * 150 ** 2) / 6)) / (0.8 + withDensity.selfWeightKNm)),
      6,
    );
    expect(withDensity.shearSpanMm).toBeLessThan(without.shearSpanMm);
    expect(withDensity.deflectionSpanMm).toBe(without.deflectionSpanMm);
  });
});

describe('governing criterion moves with the section', () => {
  it('a shallow, flexible section is governed by deflection; a short, deep one by shear', () => {
    const flexible = engineeredSpan({
      ...uk,
      section: { bMm: 50, dMm: 125 },
      material: { EMPa: 1500, fbMPa: 10, fvMPa: 2 }, // a plastic-like E (illustrative)
    });
    expect(flexible.governs).toBe('deflection');
    const deep = engineeredSpan({
      ...uk,
      section: { bMm: 50, dMm: 600 },
      material: { EMPa: 12000, fbMPa: 20, fvMPa: 0.2 },
      loads: { imposedKPa: 10, deadKPa: 10 },
    });
    expect(deep.governs).toBe('shear');
  });
  it('no imposed load leaves no deflection limit', () => {
    const r = engineeredSpan({ ...uk, loads: { imposedKPa: 0, deadKPa: 1 } });
    expect(r.deflectionSpanMm).toBe(Number.POSITIVE_INFINITY);
    expect(r.governs).toBe('bending');
  });
  it('refuses bad input and a load-free member', () => {
    expect(() => engineeredSpan({ ...uk, centresMm: -1 })).toThrow();
    expect(() => engineeredSpan({ ...uk, loads: { imposedKPa: 0, deadKPa: 0 } })).toThrow(
      RangeError,
    );
  });
  it('mathjs refuses to convert across dimensions', () => {
    expect(() => inUnits(q(1, 'kN'), 'mm')).toThrow();
  });
});

// Spawning tsx is slow on a busy machine: these two get a generous timeout (not a speed check).
describe('npm run span (engine/cli/span.ts)', { timeout: 60_000 }, () => {
  const dir = path.resolve(__dirname, '../../.tmp/span-cli-test');
  mkdirSync(dir, { recursive: true });
  const run = (file: string) =>
    spawnSync(
      process.execPath,
      ['--import', 'tsx', path.resolve(__dirname, '../cli/span.ts'), file],
      {
        encoding: 'utf8',
      },
    );

  it('prints the five keys for a good spec', () => {
    const file = path.join(dir, 'good.json');
    writeFileSync(file, JSON.stringify(uk));
    const out = run(file);
    expect(out.status).toBe(0);
    const json = JSON.parse(out.stdout);
    expect(Object.keys(json).sort()).toEqual(
      ['allowableSpanMm', 'bendingSpanMm', 'deflectionSpanMm', 'governs', 'shearSpanMm'].sort(),
    );
    expect(json.governs).toBe('bending');
    expect(json.allowableSpanMm).toBeCloseTo(engineeredSpan(uk).allowableSpanMm, 1);
  });
  it('bad input: a clear message on standard error and a non-zero exit', () => {
    const file = path.join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify({ ...uk, centresMm: 'wide' }));
    const out = run(file);
    expect(out.status).not.toBe(0);
    expect(out.stderr).toContain('centresMm');
    expect(out.stdout).toBe('');
  });
});
