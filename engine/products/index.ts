// Turns the catalogue products chosen for a design into the engine's joist and board specs, with where each limit comes from. Pure.
import { designLoads, STANDING_CAUTION } from '../codes';
import type { CodeBasis, DesignDocument } from '../schema';
import { engineeredSpan } from '../span';
import type { CatalogueProduct, SpanTableRow } from './schema';

export * from './schema';

/** The joist spec of the design document, plus the source and the working of its limits. */
export interface JoistSpecFromProduct {
  widthMm: number;
  depthMm: number;
  stockMm: number;
  maxSpanMm: number;
  maxCantileverMm: number;
  /** Where the span comes from: the maker's table (which row), or an engineered span. */
  source: string;
  /** The working: table row or formulas and numbers with units, the limit, the caution. */
  explain: string;
  /** How the span was found. */
  basis: 'span-table' | 'span-table-extrapolated' | 'engineered';
  productId: string;
}

/** The board spec of the design document, plus the source of its span limit. */
export interface BoardSpecFromProduct {
  widthMm: number;
  gapMm: number;
  endGapMm: number;
  stockMm: number;
  maxSpanMm: number;
  source: string;
  explain: string;
  productId: string;
}

export interface SpecOptions {
  /** Angle between the boards and the joists, degrees; 90 means laid square (the default). */
  boardToJoistDeg?: number;
  /** Side gap between boards (common practice about 5 mm). */
  gapMm?: number;
  /** End gap at butt joints (the board maker's figure, 3-5 mm). */
  endGapMm?: number;
}

/** Default board gaps, common practice (PRODUCT.md section 3). */
export const DEFAULT_GAP_MM = 5;
export const DEFAULT_END_GAP_MM = 4;

/** Result of looking up a maker's span table at some centres. */
export interface SpanTableLookup {
  row: SpanTableRow;
  maxSpanMm: number;
  maxCantileverMm: number;
  extrapolated: boolean;
}

/**
 * Reads a maker's span table at the given centres, conservatively: the row for the same or the
 * next wider centres. Beyond the widest row the widest row's span is scaled by (its centres /
 * centres), which is at least as severe as bending (∝ s^-1/2), deflection (∝ s^-1/3) and shear (∝ s^-1).
 * Returns null for an empty table.
 */
export function lookupSpanTable(table: SpanTableRow[], centresMm: number): SpanTableLookup | null {
  if (table.length === 0) return null;
  if (!(centresMm > 0)) throw new RangeError('Centres must be above 0 mm');
  const rows = [...table].sort((a, b) => a.centresMm - b.centresMm);
  const row = rows.find((r) => r.centresMm >= centresMm - 1e-9);
  if (row) {
    return {
      row,
      maxSpanMm: row.maxSpanMm,
      maxCantileverMm: row.maxCantileverMm,
      extrapolated: false,
    };
  }
  const widest = rows[rows.length - 1];
  const k = widest.centresMm / centresMm;
  return {
    row: widest,
    maxSpanMm: Math.floor(widest.maxSpanMm * k),
    maxCantileverMm: Math.floor(widest.maxCantileverMm * k),
    extrapolated: true,
  };
}

function longestStock(p: CatalogueProduct): number {
  if (p.stockLengthsMm.length === 0) {
    throw new RangeError(`${p.name}: no stock length in the catalogue`);
  }
  return Math.max(...p.stockLengthsMm);
}

/** The joist (or beam) spec from its product at the given centres under the code basis. */
export function joistSpecFromProduct(
  p: CatalogueProduct,
  basis: CodeBasis,
  centresMm: number,
): JoistSpecFromProduct {
  if (p.kind !== 'joist' && p.kind !== 'beam') {
    throw new RangeError(`${p.name} is a ${p.kind}, not a joist or beam`);
  }
  const widthMm = p.dimensions.widthMm;
  const depthMm = p.dimensions.depthMm;
  if (widthMm === undefined || depthMm === undefined) {
    throw new RangeError(`${p.name}: width and depth are needed`);
  }
  const stockMm = longestStock(p);
  const table = p.spanTable ?? [];
  const looked = lookupSpanTable(table, centresMm);

  if (looked && !(looked.extrapolated && p.material)) {
    const { row, maxSpanMm, maxCantileverMm, extrapolated } = looked;
    const source = extrapolated
      ? `${p.name}: maker's span table, widest row (${row.centresMm} mm centres) scaled to ${centresMm} mm centres`
      : `${p.name}: maker's span table, row for ${row.centresMm} mm centres`;
    const lines = [
      `Joist centres ${centresMm} mm.`,
      extrapolated
        ? `The maker's table stops at ${row.centresMm} mm centres (span ${row.maxSpanMm} mm, cantilever ${row.maxCantileverMm} mm). Beyond it we scale by ${row.centresMm}/${centresMm}: span ${maxSpanMm} mm, cantilever ${maxCantileverMm} mm. This is our conservative estimate, not the maker's figure: ask the maker.`
        : row.centresMm === centresMm
          ? `Maker's table at ${row.centresMm} mm centres: span at most ${row.maxSpanMm} mm, cantilever at most ${row.maxCantileverMm} mm.`
          : `The maker's table has no row for ${centresMm} mm; the row for the next wider centres (${row.centresMm} mm) is used: span at most ${row.maxSpanMm} mm, cantilever at most ${row.maxCantileverMm} mm.`,
      `Source: the maker's published span table as entered in the catalogue.`,
      STANDING_CAUTION,
    ];
    return {
      widthMm,
      depthMm,
      stockMm,
      maxSpanMm,
      maxCantileverMm,
      source,
      explain: lines.join('\n'),
      basis: extrapolated ? 'span-table-extrapolated' : 'span-table',
      productId: p.id,
    };
  }

  if (!p.material) {
    throw new RangeError(`${p.name}: neither a span table nor material properties`);
  }
  const loads = designLoads(basis);
  const r = engineeredSpan({
    section: { bMm: widthMm, dMm: depthMm },
    material: p.material,
    centresMm,
    loads: { imposedKPa: loads.imposedKPa, deadKPa: loads.deadKPa },
    deflectionLimit: loads.deflectionLimit,
  });
  const maxSpanMm = Math.floor(r.allowableSpanMm);
  // AWC DCA 6: a joist overhang at most a quarter of the back span.
  const maxCantileverMm = Math.floor(maxSpanMm / 4);
  return {
    widthMm,
    depthMm,
    stockMm,
    maxSpanMm,
    maxCantileverMm,
    source: `${p.name}: engineered span (AWC Design Aid No. 6), ${r.governs} governs; loads ${loads.source}`,
    explain: [
      `Design loads (${basis.toUpperCase()}): imposed ${round3(loads.imposedKPa)} kN/m², dead ${round3(loads.deadKPa)} kN/m², deflection L/${loads.deflectionLimit}. ${loads.source}.`,
      r.explain.replace(`\n${STANDING_CAUTION}`, ''),
      `Cantilever at most a quarter of the back span: ${maxSpanMm} / 4 = ${maxCantileverMm} mm (AWC DCA 6).`,
      STANDING_CAUTION,
    ].join('\n'),
    basis: 'engineered',
    productId: p.id,
  };
}

/** The board spec from its product: the span limit is the maker's joist centres for the laying angle. */
export function boardSpecFromProduct(
  p: CatalogueProduct,
  opts: SpecOptions = {},
): BoardSpecFromProduct {
  if (p.kind !== 'board') throw new RangeError(`${p.name} is a ${p.kind}, not a board`);
  const widthMm = p.dimensions.widthMm;
  if (widthMm === undefined) throw new RangeError(`${p.name}: width is needed`);
  const angle = opts.boardToJoistDeg ?? 90;
  const sin = Math.abs(Math.sin((angle * Math.PI) / 180));
  if (sin < 0.1)
    throw new RangeError('Boards nearly parallel to the joists cannot be carried by them');
  const square = Math.abs(sin - 1) < 1.6e-4; // within about 1 degree of square
  const limits = p.boardMaxCentres ?? { straightMm: 400, angledMm: 300 };
  const fromMaker = !!p.boardMaxCentres;
  const centresLimit = square ? limits.straightMm : limits.angledMm;
  // The engine checks the board's effective span, centres / sin(angle), against maxSpanMm.
  const maxSpanMm = Math.floor(centresLimit / sin);
  const sourceText = fromMaker
    ? `${p.name}: maker's maximum joist centres (${square ? 'square' : 'angled'})`
    : `${p.name}: common practice for composite boards (no maker's figure in the catalogue)`;
  return {
    widthMm,
    gapMm: opts.gapMm ?? DEFAULT_GAP_MM,
    endGapMm: opts.endGapMm ?? DEFAULT_END_GAP_MM,
    stockMm: longestStock(p),
    maxSpanMm,
    source: sourceText,
    explain: [
      `Boards at ${round3(angle)}° to the joists: joist centres at most ${centresLimit} mm (${square ? 'laid square' : 'laid at an angle'}).`,
      square
        ? `Board span limit = ${maxSpanMm} mm.`
        : `Effective board span = centres / sin(angle), so the limit along the board is ${centresLimit} / sin ${round3(angle)}° = ${maxSpanMm} mm.`,
      `Source: ${fromMaker ? "the board maker's figures as entered in the catalogue" : 'common practice (400 mm square, 300 mm at an angle)'}.`,
      STANDING_CAUTION,
    ].join('\n'),
    productId: p.id,
  };
}

/** What specsFromProducts returns: a spec per chosen product, or null where no product was chosen. */
export interface SpecsFromProducts {
  joist: JoistSpecFromProduct | null;
  board: BoardSpecFromProduct | null;
}

/**
 * The design's joist and board specs from the chosen catalogue products: the joist span from the
 * maker's table (next wider centres) when present, else engineered under the code basis loads.
 */
export function specsFromProducts(
  products: { joist?: CatalogueProduct | null; board?: CatalogueProduct | null },
  codeBasis: CodeBasis,
  centresMm: number,
  opts: SpecOptions = {},
): SpecsFromProducts {
  if (!Number.isFinite(centresMm) || centresMm <= 0) {
    throw new RangeError('Joist centres must be a positive number of millimetres');
  }
  return {
    joist: products.joist ? joistSpecFromProduct(products.joist, codeBasis, centresMm) : null,
    board: products.board ? boardSpecFromProduct(products.board, opts) : null,
  };
}

function round3(v: number): number {
  return Math.round(v * 1000) / 1000;
}

/**
 * The design with its joist and board specs replaced by those from the chosen products (limits,
 * their source and working carried along for flag explanations). Returns the same design when
 * nothing changes.
 */
export function withProductSpecs(design: DesignDocument, specs: SpecsFromProducts): DesignDocument {
  let next = design;
  if (specs.joist) {
    const { widthMm, depthMm, stockMm, maxSpanMm, maxCantileverMm, source, explain } = specs.joist;
    const joist = {
      widthMm,
      depthMm,
      stockMm,
      maxSpanMm,
      maxCantileverMm,
      source,
      limitExplain: explain,
    };
    if (!sameSpec(design.joist, joist)) next = { ...next, joist };
  }
  if (specs.board) {
    const { widthMm, gapMm, endGapMm, stockMm, maxSpanMm, source, explain } = specs.board;
    const board = { widthMm, gapMm, endGapMm, stockMm, maxSpanMm, source, limitExplain: explain };
    if (!sameSpec(design.board, board)) next = { ...next, board };
  }
  return next;
}

function sameSpec(a: object, b: object): boolean {
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
  return (
    ka.length === kb.length &&
    kb.every((k) => (a as Record<string, unknown>)[k] === (b as Record<string, unknown>)[k])
  );
}
