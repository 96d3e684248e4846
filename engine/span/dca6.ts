// AWC DCA 6 Table 2 / IRC R507.6 joist spans (from memory) and their reproduction by beam theory with NDS values. Pure.
import { engineeredSpan, type SpanResult } from '.';
import {
  adjustedValues,
  DRESSED_IN,
  NOMINAL_SIZES,
  psfToKPa,
  psiToMPa,
  type AdjustedValues,
  type LumberSpecies,
  type NominalSize,
} from './nds';

/** Species groups as the deck table lists them. */
export type Dca6Group = 'southern-pine' | 'df-hf-spf';

export const DCA6_GROUPS: Record<
  Dca6Group,
  { label: string; species: LumberSpecies[]; incised: boolean }
> = {
  'southern-pine': { label: 'Southern Pine No. 2', species: ['southern-pine'], incised: false },
  'df-hf-spf': {
    label: 'Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir No. 2 (incised)',
    species: ['douglas-fir-larch', 'hem-fir', 'spruce-pine-fir'],
    incised: true,
  },
};

export const DCA6_CENTRES_IN = [12, 16, 24] as const;

/**
 * AWC DCA 6 Table 2 / IRC R507.6 allowable joist spans, feet-inches, by group, size and centres
 * (12, 16, 24 in). Basis: 40 psf live + 10 psf dead, No. 2, wet service, L/360.
 * WARNING: typed from memory of the published table, not copied from it.
 */
export const DCA6_TABLE2: Record<Dca6Group, Record<NominalSize, [string, string, string]>> = {
  'southern-pine': {
    '2x6': ['9-11', '9-0', '7-7'],
    '2x8': ['13-1', '11-10', '9-8'],
    '2x10': ['16-2', '14-0', '11-5'],
    '2x12': ['18-0', '16-6', '13-6'],
  },
  'df-hf-spf': {
    '2x6': ['9-6', '8-8', '7-2'],
    '2x8': ['12-6', '11-1', '9-1'],
    '2x10': ['15-8', '13-7', '11-1'],
    '2x12': ['18-0', '15-9', '12-10'],
  },
};

/** Parses "13-1" (feet-inches) into inches. */
export function feetInches(text: string): number {
  const m = /^(\d+)-(\d+)$/.exec(text);
  if (!m) throw new Error(`Not feet-inches: ${text}`);
  return Number(m[1]) * 12 + Number(m[2]);
}

/** One species' working for one cell. */
export interface SpeciesSpan {
  species: LumberSpecies;
  values: AdjustedValues;
  result: SpanResult;
  spanIn: number;
}

/** One reproduced table cell: the table value, beam theory's value, and the working. */
export interface Dca6Cell {
  group: Dca6Group;
  size: NominalSize;
  centresIn: number;
  tableText: string;
  tableIn: number;
  computedIn: number;
  diffIn: number;
  governingSpecies: LumberSpecies;
  governs: SpanResult['governs'];
  bySpecies: SpeciesSpan[];
}

const MM_PER_IN = 25.4;

/** Beam-theory span of one table cell: the least over the group's species (each with its own NDS values). */
export function reproduceCell(group: Dca6Group, size: NominalSize, centresIn: number): Dca6Cell {
  const g = DCA6_GROUPS[group];
  const idx = DCA6_CENTRES_IN.indexOf(centresIn as (typeof DCA6_CENTRES_IN)[number]);
  if (idx < 0) throw new RangeError(`The table has no ${centresIn} in column`);
  const bySpecies = g.species.map((species): SpeciesSpan => {
    const values = adjustedValues(species, size, {
      wet: true,
      incised: g.incised,
      repetitive: true,
    });
    const result = engineeredSpan({
      section: { bMm: DRESSED_IN[size].b * MM_PER_IN, dMm: DRESSED_IN[size].d * MM_PER_IN },
      material: {
        EMPa: psiToMPa(values.E),
        fbMPa: psiToMPa(values.Fb),
        fvMPa: psiToMPa(values.Fv),
      },
      centresMm: centresIn * MM_PER_IN,
      loads: { imposedKPa: psfToKPa(40), deadKPa: psfToKPa(10) },
      deflectionLimit: 360,
    });
    return { species, values, result, spanIn: result.allowableSpanMm / MM_PER_IN };
  });
  const gov = bySpecies.reduce((a, b) => (b.spanIn < a.spanIn ? b : a));
  const tableText = DCA6_TABLE2[group][size][idx];
  const tableIn = feetInches(tableText);
  return {
    group,
    size,
    centresIn,
    tableText,
    tableIn,
    computedIn: gov.spanIn,
    diffIn: gov.spanIn - tableIn,
    governingSpecies: gov.species,
    governs: gov.result.governs,
    bySpecies,
  };
}

/** Every 2x6-2x12 cell at 12/16/24 in for both groups. */
export function reproduceTable2(): Dca6Cell[] {
  const cells: Dca6Cell[] = [];
  for (const group of Object.keys(DCA6_GROUPS) as Dca6Group[]) {
    for (const size of NOMINAL_SIZES) {
      for (const c of DCA6_CENTRES_IN) cells.push(reproduceCell(group, size, c));
    }
  }
  return cells;
}

/** Formats inches as feet-inches to a tenth of an inch: 141.9 -> 11' 9.9". */
export function ftIn(inches: number): string {
  const ft = Math.floor(inches / 12);
  return `${ft}' ${(inches - ft * 12).toFixed(1)}"`;
}
