import { describe, expect, it } from 'vitest';
import {
  checkGuard,
  checkStairFlight,
  designLoads,
  guardLimits,
  stairLimits,
  STANDING_CAUTION,
  type CodeFinding,
} from './index';

const codes = (fs: CodeFinding[]) => fs.map((f) => f.code).sort();
const IN = 25.4;

describe('UK stairs, Approved Document K (2013) Table 1.1 private stair', () => {
  // Going 250 mm keeps pitch and 2R+G out of the way for the rise cases below 2R+G limits where noted.
  it.each([
    // [rise, expected stair-rise finding]
    [149, true], // ADK Table 1.1: rise at least 150 mm
    [150, false],
    [151, false],
    [219, false],
    [220, false], // ADK Table 1.1: rise at most 220 mm
    [221, true],
  ])('rise %d mm -> flagged %s', (rise, flagged) => {
    const fs = checkStairFlight({ risesMm: [rise, rise], goingMm: 250 }, 'uk');
    expect(fs.some((f) => f.code === 'stair-rise')).toBe(flagged);
  });

  it.each([
    [219, true], // ADK Table 1.1: going at least 220 mm
    [220, false],
    [221, false],
    [299, false],
    [300, false], // ADK Table 1.1: going at most 300 mm
    [301, true],
  ])('going %d mm -> flagged %s', (going, flagged) => {
    const fs = checkStairFlight({ risesMm: [170], goingMm: going }, 'uk');
    expect(fs.some((f) => f.code === 'stair-going')).toBe(flagged);
  });

  it.each([
    // 2R + G with a 250 mm going: ADK Table 1.1, 550-700 mm.
    [149.5, true], // 549
    [150, false], // 550
    [150.5, false], // 551
    [224.5, false], // 699 (the rise itself is flagged; 2R+G is not)
    [225, false], // 700
    [225.5, true], // 701
  ])('2R+G with rise %d and going 250 -> flagged %s', (rise, flagged) => {
    const fs = checkStairFlight({ risesMm: [rise], goingMm: 250 }, 'uk');
    expect(fs.some((f) => f.code === 'stair-2r-plus-g')).toBe(flagged);
  });

  it('pitch: ADK Table 1.1, private stair at most 42 degrees', () => {
    const going = 230;
    const riseAt42 = going * Math.tan((42 * Math.PI) / 180); // 207.09 mm
    const pitch = (rise: number) =>
      checkStairFlight({ risesMm: [rise], goingMm: going }, 'uk').some(
        (f) => f.code === 'stair-pitch',
      );
    expect(pitch(riseAt42 - 0.5)).toBe(false);
    expect(pitch(riseAt42)).toBe(false);
    expect(pitch(riseAt42 + 0.5)).toBe(true);
  });

  it('equal risers: ADK asks for equal rises; 3 mm is our own tolerance', () => {
    expect(codes(checkStairFlight({ risesMm: [170, 172], goingMm: 250 }, 'uk'))).toEqual([]);
    expect(codes(checkStairFlight({ risesMm: [170, 173], goingMm: 250 }, 'uk'))).toEqual([]);
    const f = checkStairFlight({ risesMm: [170, 173.5], goingMm: 250 }, 'uk');
    expect(codes(f)).toEqual(['stair-unequal-risers']);
    expect(f[0].valueMm).toBeCloseTo(3.5, 9);
    expect(f[0].explain).toContain('our own tolerance');
  });

  it('a comfortable flight raises nothing (rise 170, going 250: 2R+G = 590, pitch 34.2°)', () => {
    expect(checkStairFlight({ risesMm: [170, 170, 170], goingMm: 250 }, 'uk')).toEqual([]);
  });
});

describe('US stairs, IRC R311.7.5', () => {
  const maxRise = 7.75 * IN; // 196.85 mm, R311.7.5.1
  it.each([
    [maxRise - 0.5, false],
    [maxRise, false],
    [maxRise + 0.5, true],
  ])('rise %f mm -> flagged %s (R311.7.5.1, at most 7 3/4 in)', (rise, flagged) => {
    const fs = checkStairFlight({ risesMm: [rise, rise], goingMm: 280 }, 'us');
    expect(fs.some((f) => f.code === 'stair-rise')).toBe(flagged);
  });

  it('no minimum rise and no 2R+G or pitch rule under the IRC (R311.7.5.1 sets only a maximum; from memory)', () => {
    expect(checkStairFlight({ risesMm: [100], goingMm: 400 }, 'us')).toEqual([]);
  });

  it.each([
    [10 * IN - 0.5, true],
    [10 * IN, false],
    [10 * IN + 0.5, false],
  ])('tread %f mm -> flagged %s (R311.7.5.2, at least 10 in)', (going, flagged) => {
    const fs = checkStairFlight({ risesMm: [180], goingMm: going }, 'us');
    expect(fs.some((f) => f.code === 'stair-going')).toBe(flagged);
  });

  it.each([
    [0.375 * IN - 0.1, false],
    [0.375 * IN, false],
    [0.375 * IN + 0.1, true],
  ])('riser spread %f mm -> flagged %s (R311.7.5.1, at most 3/8 in)', (spread, flagged) => {
    const fs = checkStairFlight({ risesMm: [170, 170 + spread, 170], goingMm: 280 }, 'us');
    expect(fs.some((f) => f.code === 'stair-unequal-risers')).toBe(flagged);
  });

  it('messages read in inches for the US basis', () => {
    const [f] = checkStairFlight({ risesMm: [210], goingMm: 280 }, 'us');
    expect(f.message).toContain('7 3/4 in');
    expect(f.explain).toContain('R311.7.5.1');
    expect(f.explain).toContain(STANDING_CAUTION);
  });
});

describe('guards', () => {
  it.each([
    // Approved Document K para 1.41: guard where the drop is more than 600 mm.
    ['uk', 599, false],
    ['uk', 600, false],
    ['uk', 601, true],
    // IRC R312.1.1: more than 30 in (762 mm) above grade.
    ['us', 30 * IN - 1, false],
    ['us', 30 * IN, false],
    ['us', 30 * IN + 1, true],
  ] as const)('%s drop %f mm -> guard %s', (basis, drop, needed) => {
    const f = checkGuard(drop, basis);
    expect(f !== null).toBe(needed);
    if (f) {
      expect(f.code).toBe('guard-required');
      expect(f.limitMm).toBe(guardLimits(basis).dropOverMm);
      expect(f.explain).toContain(STANDING_CAUTION);
    }
  });

  it('UK message says what para 1.41 covers (flights and landings) and the heights of Diagram 3.1', () => {
    const f = checkGuard(700, 'uk');
    expect(f?.source).toContain('para 1.41');
    expect(f?.source).toContain('flights and landings');
    expect(f?.explain).toContain('900 mm');
    expect(f?.explain).toContain('1100 mm');
  });

  it('US guard height is 36 in (IRC R312.1.2)', () => {
    expect(guardLimits('us').guardHeightMm).toBeCloseTo(914.4, 6);
    expect(checkGuard(800, 'us')?.explain).toContain('36 in');
  });
});

describe('stair limit tables', () => {
  it('UK and US differ where the codes differ', () => {
    expect(stairLimits('uk').riseMaxMm).toBe(220); // ADK Table 1.1
    expect(stairLimits('us').riseMaxMm).toBeCloseTo(196.85, 6); // IRC R311.7.5.1
    expect(stairLimits('us').riseMinMm).toBeUndefined();
    expect(stairLimits('uk').riserToleranceIsCodeValue).toBe(false);
  });
});

describe('design loads', () => {
  it('US: IRC R507 40 psf live + 10 psf dead, L/360', () => {
    const l = designLoads('us');
    expect(l.imposedKPa).toBeCloseTo(1.915, 3);
    expect(l.deadKPa).toBeCloseTo(0.479, 3);
    expect(l.deflectionLimit).toBe(360);
    expect(l.units).toBe('imperial');
  });
  it('UK: BS EN 1991-1-1 UK NA domestic imposed 1.5 kN/m2 (from memory)', () => {
    const l = designLoads('uk');
    expect(l.imposedKPa).toBe(1.5);
    expect(l.units).toBe('metric');
    expect(l.source).toContain('from memory');
  });
});

describe('input guards', () => {
  it('refuses non-finite input and accepts an empty flight', () => {
    expect(() => checkStairFlight({ risesMm: [NaN], goingMm: 250 }, 'uk')).toThrow(RangeError);
    expect(() => checkGuard(Infinity, 'uk')).toThrow(RangeError);
    expect(checkStairFlight({ risesMm: [], goingMm: 250 }, 'uk')).toEqual([]);
  });
  it('the standing caution names codes, an engineer, guards and buried services', () => {
    for (const word of ['building codes', 'engineer', 'guards', 'buried services']) {
      expect(STANDING_CAUTION).toContain(word);
    }
  });
});
