// Sawn-lumber design values (NDS Supplement, No. 2 grade) and NDS adjustment factors for deck joists. Pure data and arithmetic.

/** Species or species group with NDS Supplement reference design values in this module. */
export type LumberSpecies = 'southern-pine' | 'douglas-fir-larch' | 'hem-fir' | 'spruce-pine-fir';

/** Nominal joist sizes covered by the deck span tables. */
export type NominalSize = '2x6' | '2x8' | '2x10' | '2x12';

export const NOMINAL_SIZES: NominalSize[] = ['2x6', '2x8', '2x10', '2x12'];

/** Dressed (actual) dry sizes of nominal lumber, inches (ALSC / PS 20 standard dressed sizes). */
export const DRESSED_IN: Record<NominalSize, { b: number; d: number }> = {
  '2x6': { b: 1.5, d: 5.5 },
  '2x8': { b: 1.5, d: 7.25 },
  '2x10': { b: 1.5, d: 9.25 },
  '2x12': { b: 1.5, d: 11.25 },
};

/** Reference design values in psi for No. 2 grade: bending Fb, shear Fv, modulus of elasticity E. */
export interface ReferenceValues {
  Fb: number;
  Fv: number;
  E: number;
  /** True when Fb is tabulated per width already (NDS Table 4B, Southern Pine), so CF = 1.0. */
  fbIsSizeSpecific: boolean;
  source: string;
}

// WARNING: every number below is from memory of the NDS Supplement (2015/2018 editions, after the
// 2013 Southern Pine revision), not copied from the document. Check against the Supplement before
// relying on them for anything but the reproduction test.
const SP_FB_BY_SIZE: Record<NominalSize, number> = {
  '2x6': 1000,
  '2x8': 925,
  '2x10': 800,
  '2x12': 750,
};

/** NDS Supplement reference design values, No. 2 grade (from memory). */
export function referenceValues(species: LumberSpecies, size: NominalSize): ReferenceValues {
  switch (species) {
    case 'southern-pine':
      return {
        Fb: SP_FB_BY_SIZE[size],
        Fv: 175,
        E: 1_400_000,
        fbIsSizeSpecific: true,
        source: 'NDS Supplement Table 4B, Southern Pine No. 2 (from memory)',
      };
    case 'douglas-fir-larch':
      return {
        Fb: 900,
        Fv: 180,
        E: 1_600_000,
        fbIsSizeSpecific: false,
        source: 'NDS Supplement Table 4A, Douglas Fir-Larch No. 2 (from memory)',
      };
    case 'hem-fir':
      return {
        Fb: 850,
        Fv: 150,
        E: 1_300_000,
        fbIsSizeSpecific: false,
        source: 'NDS Supplement Table 4A, Hem-Fir No. 2 (from memory)',
      };
    case 'spruce-pine-fir':
      return {
        Fb: 875,
        Fv: 135,
        E: 1_400_000,
        fbIsSizeSpecific: false,
        source: 'NDS Supplement Table 4A, Spruce-Pine-Fir No. 1/No. 2 (from memory)',
      };
    default: {
      const never: never = species;
      throw new Error(`Unknown species ${String(never)}`);
    }
  }
}

/** NDS Table 4A size factor CF on Fb for 2 in thick lumber by nominal width (from memory). */
export function sizeFactorFb(size: NominalSize): number {
  return { '2x6': 1.3, '2x8': 1.2, '2x10': 1.1, '2x12': 1.0 }[size];
}

/** Which NDS adjustments apply. */
export interface AdjustmentOptions {
  /** Wet service (CM): Fb 0.85 unless Fb·CF ≤ 1150 psi, Fv 0.97, E 0.9 (NDS Tables 4A/4B). */
  wet: boolean;
  /** Incising (Ci, NDS 4.3.8): Fb 0.80, Fv 0.80, E 0.95. */
  incised: boolean;
  /** Repetitive member (Cr, NDS 4.3.9): 1.15 on Fb for three or more members at 24 in or less. */
  repetitive: boolean;
}

/** Adjusted design values in psi with each factor used, for the explanation. */
export interface AdjustedValues {
  Fb: number;
  Fv: number;
  E: number;
  factors: {
    CF: number;
    CMb: number;
    CMv: number;
    CME: number;
    Ci: number;
    CiE: number;
    Cr: number;
  };
  reference: ReferenceValues;
}

const PSI_PER_MPA = 145.0377377;

/** Applies size, wet-service, incising and repetitive-member factors to No. 2 reference values. */
export function adjustedValues(
  species: LumberSpecies,
  size: NominalSize,
  opts: AdjustmentOptions,
): AdjustedValues {
  const ref = referenceValues(species, size);
  const CF = ref.fbIsSizeSpecific ? 1 : sizeFactorFb(size);
  const CMb = opts.wet && ref.Fb * CF > 1150 ? 0.85 : 1;
  const CMv = opts.wet ? 0.97 : 1;
  const CME = opts.wet ? 0.9 : 1;
  const Ci = opts.incised ? 0.8 : 1;
  const CiE = opts.incised ? 0.95 : 1;
  const Cr = opts.repetitive ? 1.15 : 1;
  return {
    Fb: ref.Fb * CF * CMb * Ci * Cr,
    Fv: ref.Fv * CMv * Ci,
    E: ref.E * CME * CiE,
    factors: { CF, CMb, CMv, CME, Ci, CiE, Cr },
    reference: ref,
  };
}

/** Converts psi to MPa. */
export function psiToMPa(psi: number): number {
  return psi / PSI_PER_MPA;
}

/** Converts pounds per square foot to kPa. */
export function psfToKPa(psf: number): number {
  return psf * 0.047880259;
}
