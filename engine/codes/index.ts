// Code basis checks: stair, guard and design-load limits per code basis (UK / US), with sources. Pure: imports only engine types.
import type { CodeBasis } from '../schema';
import type { FlagCode, Severity } from '../types';

/** One result of a code check, before the framing engine places it on the plan as a Flag. */
export interface CodeFinding {
  code: FlagCode;
  severity: Severity;
  valueMm?: number;
  limitMm?: number;
  message: string;
  source: string;
  explain: string;
}

/** The caution shown with every check result, plan and export. */
export const STANDING_CAUTION =
  'These checks are guidance only. Local building codes and a qualified engineer decide what is ' +
  'required and what is safe. Raised decks need guards at their open edges. Check for buried ' +
  'services (cables, gas, water, drains) before digging.';

const MM_PER_INCH = 25.4;
/** Comparisons allow this much (mm) so a value exactly at a limit is not lost to float rounding. */
const EPS_MM = 1e-6;
/** Pounds per square foot to kilopascals (1 lbf/ft² = 0.0478803 kPa). */
const KPA_PER_PSF = 0.047880259;

/** Stair limits for one code basis, in millimetres and degrees; a missing bound means none. */
export interface StairLimits {
  basis: CodeBasis;
  riseMinMm?: number;
  riseMaxMm: number;
  goingMinMm: number;
  goingMaxMm?: number;
  /** Largest allowed difference between the tallest and shortest riser in a flight. */
  riserToleranceMm: number;
  /** Whether the tolerance is the code's own figure or our own reading of "equal". */
  riserToleranceIsCodeValue: boolean;
  twoRPlusGMinMm?: number;
  twoRPlusGMaxMm?: number;
  pitchMaxDeg?: number;
  sources: {
    rise: string;
    going: string;
    equalRisers: string;
    twoRPlusG?: string;
    pitch?: string;
  };
}

/** Guard limits for one code basis: a guard is needed where the drop is more than dropOverMm. */
export interface GuardLimits {
  basis: CodeBasis;
  dropOverMm: number;
  /** Minimum guard height for stairs and landings (UK) or decks and stairs (US). */
  guardHeightMm: number;
  /** UK only: the higher guard for external balconies and edges of floors used as such. */
  edgeGuardHeightMm?: number;
  source: string;
  heightSource: string;
}

/** Design area loads and deflection limit for joist and beam checks under one code basis. */
export interface DesignLoads {
  basis: CodeBasis;
  imposedKPa: number;
  deadKPa: number;
  /** Deflection limit as n in L/n, under imposed load. */
  deflectionLimit: number;
  /** Display units that match the basis. */
  units: 'metric' | 'imperial';
  source: string;
}

const UK_STAIRS: StairLimits = {
  basis: 'uk',
  riseMinMm: 150,
  riseMaxMm: 220,
  goingMinMm: 220,
  goingMaxMm: 300,
  // WARNING: Approved Document K asks for equal rises in a flight but gives no tolerance; 3 mm is our
  // own allowance for building accuracy, not a code value.
  riserToleranceMm: 3,
  riserToleranceIsCodeValue: false,
  twoRPlusGMinMm: 550,
  twoRPlusGMaxMm: 700,
  pitchMaxDeg: 42,
  sources: {
    rise: 'Approved Document K (2013) Table 1.1, private stair: rise 150–220 mm',
    going: 'Approved Document K (2013) Table 1.1, private stair: going 220–300 mm',
    equalRisers:
      'Approved Document K (2013) section 1: steps in a flight should have equal rises (3 mm tolerance is our own allowance)',
    twoRPlusG: 'Approved Document K (2013) Table 1.1: 2R + G between 550 and 700 mm',
    pitch: 'Approved Document K (2013) Table 1.1: private stair pitch at most 42°',
  },
};

const US_STAIRS: StairLimits = {
  basis: 'us',
  riseMaxMm: 7.75 * MM_PER_INCH,
  goingMinMm: 10 * MM_PER_INCH,
  riserToleranceMm: 0.375 * MM_PER_INCH,
  riserToleranceIsCodeValue: true,
  sources: {
    rise: 'IRC R311.7.5.1: riser height at most 7 3/4 in',
    going: 'IRC R311.7.5.2: tread depth at least 10 in',
    equalRisers:
      'IRC R311.7.5.1: tallest riser at most 3/8 in taller than the shortest in a flight',
  },
};

const UK_GUARD: GuardLimits = {
  basis: 'uk',
  dropOverMm: 600,
  guardHeightMm: 900,
  edgeGuardHeightMm: 1100,
  source:
    'Approved Document K (2013) para 1.41: flights and landings guarded at the sides where the drop is more than 600 mm',
  heightSource:
    'Approved Document K (2013) Diagram 3.1: guard height 900 mm for stairs and landings, 1100 mm for external balconies and edges of floors used as such',
};

const US_GUARD: GuardLimits = {
  basis: 'us',
  dropOverMm: 30 * MM_PER_INCH,
  guardHeightMm: 36 * MM_PER_INCH,
  source:
    'IRC R312.1.1: guards where the walking surface is more than 30 in above the floor or grade below within 36 in horizontally',
  heightSource: 'IRC R312.1.2: guard height at least 36 in',
};

/** Stair limits for a code basis (Approved Document K Table 1.1, or IRC R311.7.5). */
export function stairLimits(basis: CodeBasis): StairLimits {
  switch (basis) {
    case 'uk':
      return UK_STAIRS;
    case 'us':
      return US_STAIRS;
    default:
      return exhaustive(basis);
  }
}

/** Guard limits for a code basis (Approved Document K para 1.41 / Diagram 3.1, or IRC R312.1). */
export function guardLimits(basis: CodeBasis): GuardLimits {
  switch (basis) {
    case 'uk':
      return UK_GUARD;
    case 'us':
      return US_GUARD;
    default:
      return exhaustive(basis);
  }
}

/** Area loads and deflection limit used for joist spans under a code basis. */
export function designLoads(basis: CodeBasis): DesignLoads {
  switch (basis) {
    case 'uk':
      return {
        basis,
        imposedKPa: 1.5,
        deadKPa: 0.5,
        deflectionLimit: 360,
        units: 'metric',
        source:
          'BS EN 1991-1-1 UK National Annex: domestic imposed load 1.5 kN/m² (from memory); dead load 0.5 kN/m² and deflection L/360 are our defaults for a boarded deck, not code values',
      };
    case 'us':
      return {
        basis,
        imposedKPa: 40 * KPA_PER_PSF,
        deadKPa: 10 * KPA_PER_PSF,
        deflectionLimit: 360,
        units: 'imperial',
        source: 'IRC R507 / AWC DCA 6: 40 psf live + 10 psf dead, deflection L/360',
      };
    default:
      return exhaustive(basis);
  }
}

/** A length as a person on this basis reads it: mm for UK, inches (to 1/8) with mm for US. */
export function formatForBasis(mm: number, basis: CodeBasis): string {
  if (basis === 'uk') return `${roundTo(mm, 1)} mm`;
  return `${inchesText(mm)} (${roundTo(mm, 1)} mm)`;
}

/**
 * Checks one flight of steps: rise range, going range, equal risers, and for UK also 2R + G and pitch.
 * Rises are listed bottom to top; an empty flight has nothing to check.
 */
export function checkStairFlight(
  flight: { risesMm: number[]; goingMm: number },
  basis: CodeBasis,
): CodeFinding[] {
  const { risesMm, goingMm } = flight;
  if (!risesMm.every((r) => Number.isFinite(r) && r >= 0) || !Number.isFinite(goingMm)) {
    throw new RangeError('Stair rises and going must be finite, non-negative millimetres');
  }
  if (risesMm.length === 0) return [];
  const lim = stairLimits(basis);
  const f = (mm: number) => formatForBasis(mm, basis);
  const out: CodeFinding[] = [];
  const maxRise = Math.max(...risesMm);
  const minRise = Math.min(...risesMm);
  const risesText = risesMm.map((r) => roundTo(r, 1)).join(', ');

  // Rise: the worst riser decides.
  if (maxRise > lim.riseMaxMm + EPS_MM) {
    out.push({
      code: 'stair-rise',
      severity: 'error',
      valueMm: maxRise,
      limitMm: lim.riseMaxMm,
      message: `Step rise ${f(maxRise)} is more than the ${f(lim.riseMaxMm)} maximum`,
      source: lim.sources.rise,
      explain: explainText(
        `Tallest rise in the flight = ${f(maxRise)} (rises: ${risesText} mm).`,
        `Limit: rise at most ${f(lim.riseMaxMm)}.`,
        lim.sources.rise,
        'Add a step or lower the deck so that each rise is within the limit.',
      ),
    });
  }
  if (lim.riseMinMm !== undefined && minRise < lim.riseMinMm - EPS_MM) {
    out.push({
      code: 'stair-rise',
      severity: 'error',
      valueMm: minRise,
      limitMm: lim.riseMinMm,
      message: `Step rise ${f(minRise)} is less than the ${f(lim.riseMinMm)} minimum`,
      source: lim.sources.rise,
      explain: explainText(
        `Shortest rise in the flight = ${f(minRise)} (rises: ${risesText} mm).`,
        `Limit: rise at least ${f(lim.riseMinMm)}.`,
        lim.sources.rise,
        'Use fewer steps so that each rise is within the limit.',
      ),
    });
  }

  // Going.
  if (goingMm < lim.goingMinMm - EPS_MM) {
    out.push({
      code: 'stair-going',
      severity: 'error',
      valueMm: goingMm,
      limitMm: lim.goingMinMm,
      message: `Step going ${f(goingMm)} is less than the ${f(lim.goingMinMm)} minimum`,
      source: lim.sources.going,
      explain: explainText(
        `Going (tread depth, nosing to nosing) = ${f(goingMm)}.`,
        `Limit: going at least ${f(lim.goingMinMm)}.`,
        lim.sources.going,
        'Make the treads deeper (more tread boards).',
      ),
    });
  }
  if (lim.goingMaxMm !== undefined && goingMm > lim.goingMaxMm + EPS_MM) {
    out.push({
      code: 'stair-going',
      severity: 'error',
      valueMm: goingMm,
      limitMm: lim.goingMaxMm,
      message: `Step going ${f(goingMm)} is more than the ${f(lim.goingMaxMm)} maximum`,
      source: lim.sources.going,
      explain: explainText(
        `Going (tread depth, nosing to nosing) = ${f(goingMm)}.`,
        `Limit: going at most ${f(lim.goingMaxMm)}.`,
        lim.sources.going,
        'Make the treads shallower (fewer tread boards).',
      ),
    });
  }

  // Equal risers.
  const spread = maxRise - minRise;
  if (risesMm.length > 1 && spread > lim.riserToleranceMm + EPS_MM) {
    out.push({
      code: 'stair-unequal-risers',
      severity: 'error',
      valueMm: spread,
      limitMm: lim.riserToleranceMm,
      message: `Rises in the flight differ by ${f(spread)}; at most ${f(lim.riserToleranceMm)} allowed`,
      source: lim.sources.equalRisers,
      explain: explainText(
        `Tallest rise ${f(maxRise)} − shortest rise ${f(minRise)} = ${f(spread)} (rises: ${risesText} mm).`,
        lim.riserToleranceIsCodeValue
          ? `Limit: difference at most ${f(lim.riserToleranceMm)}.`
          : `Limit: all rises equal; we allow ${f(lim.riserToleranceMm)} for building accuracy (our own tolerance, not a code value).`,
        lim.sources.equalRisers,
        'Adjust the step heights (or the ground at the foot of the flight) so the rises match.',
      ),
    });
  }

  // 2R + G, checked for the tallest and the shortest rise (both ends of the range matter).
  if (lim.twoRPlusGMinMm !== undefined && lim.twoRPlusGMaxMm !== undefined) {
    const hi = 2 * maxRise + goingMm;
    const lo = 2 * minRise + goingMm;
    const over = hi > lim.twoRPlusGMaxMm + EPS_MM;
    const under = lo < lim.twoRPlusGMinMm - EPS_MM;
    if (over || under) {
      const value = over ? hi : lo;
      const r = over ? maxRise : minRise;
      const limit = over ? lim.twoRPlusGMaxMm : lim.twoRPlusGMinMm;
      out.push({
        code: 'stair-2r-plus-g',
        severity: 'error',
        valueMm: value,
        limitMm: limit,
        message: `2 × rise + going = ${f(value)}, ${over ? 'more' : 'less'} than the ${f(limit)} ${over ? 'maximum' : 'minimum'}`,
        source: lim.sources.twoRPlusG ?? '',
        explain: explainText(
          `2R + G = 2 × ${f(r)} + ${f(goingMm)} = ${f(value)}.`,
          `Limit: 2R + G between ${f(lim.twoRPlusGMinMm)} and ${f(lim.twoRPlusGMaxMm)}.`,
          lim.sources.twoRPlusG ?? '',
          'Change the rise or the going so a comfortable stride fits the steps.',
        ),
      });
    }
  }

  // Pitch.
  if (lim.pitchMaxDeg !== undefined) {
    const pitchDeg = goingMm > 0 ? (Math.atan2(maxRise, goingMm) * 180) / Math.PI : 90;
    if (pitchDeg > lim.pitchMaxDeg + 1e-9) {
      out.push({
        code: 'stair-pitch',
        severity: 'error',
        message: `Stair pitch ${roundTo(pitchDeg, 1)}° is steeper than the ${lim.pitchMaxDeg}° maximum`,
        source: lim.sources.pitch ?? '',
        explain: explainText(
          `Pitch = atan(rise / going) = atan(${f(maxRise)} / ${f(goingMm)}) = ${roundTo(pitchDeg, 2)}°.`,
          `Limit: pitch at most ${lim.pitchMaxDeg}°.`,
          lim.sources.pitch ?? '',
          'Lower the rise or deepen the going.',
        ),
      });
    }
  }
  return out;
}

/**
 * Checks whether an edge with this drop to the ground needs a guard. Returns a finding when the drop
 * is more than the basis limit (UK 600 mm, US 30 in), otherwise null.
 */
export function checkGuard(dropMm: number, basis: CodeBasis): CodeFinding | null {
  if (!Number.isFinite(dropMm)) throw new RangeError('Drop must be a finite number of millimetres');
  const lim = guardLimits(basis);
  if (!(dropMm > lim.dropOverMm + EPS_MM)) return null;
  const f = (mm: number) => formatForBasis(mm, basis);
  const scope =
    basis === 'uk'
      ? `Para 1.41 is written for the sides of flights and landings; for the open edge of a raised deck the same 600 mm drop is the usual trigger (Approved Document K section 3 covers edges of floors and balconies), and building control decides. Guard height: ${f(lim.guardHeightMm)} for stairs and landings, ${f(lim.edgeGuardHeightMm ?? lim.guardHeightMm)} for external balconies and edges of floors used as such (Diagram 3.1).`
      : `Guard height at least ${f(lim.guardHeightMm)} (IRC R312.1.2).`;
  return {
    code: 'guard-required',
    severity: 'warning',
    valueMm: dropMm,
    limitMm: lim.dropOverMm,
    message:
      basis === 'uk'
        ? `Drop of ${f(dropMm)} is more than ${f(lim.dropOverMm)}: guard the stair sides and landings, and the deck edge`
        : `Walking surface ${f(dropMm)} above grade is more than ${f(lim.dropOverMm)}: a guard is required`,
    source: lim.source,
    explain: explainText(
      `Drop from the walking surface to the ground = ${f(dropMm)}.`,
      `Limit: a guard is needed where the drop is more than ${f(lim.dropOverMm)}.`,
      lim.source,
      scope,
    ),
  };
}

function explainText(numbers: string, limit: string, source: string, advice: string): string {
  return [numbers, limit, `Source: ${source}.`, advice, STANDING_CAUTION].join('\n');
}

function roundTo(v: number, dp: number): number {
  const k = 10 ** dp;
  return Math.round(v * k) / k;
}

function inchesText(mm: number): string {
  const eighths = Math.round((mm / MM_PER_INCH) * 8);
  const whole = Math.floor(eighths / 8);
  let frac = eighths - whole * 8;
  let den = 8;
  while (frac > 0 && frac % 2 === 0) {
    frac /= 2;
    den /= 2;
  }
  if (!frac) return `${whole} in`;
  return whole ? `${whole} ${frac}/${den} in` : `${frac}/${den} in`;
}

function exhaustive(x: never): never {
  throw new Error(`Unhandled code basis: ${String(x)}`);
}
