// The design document (PRODUCT.md section 4, version 1): its zod schema, shared by engine, API and editor. Touches nothing but zod.
import { z } from 'zod';

/** Largest coordinate the engine accepts, in mm (1 km): keeps arithmetic well inside float precision. */
export const MAX_COORD_MM = 1_000_000;

const mm = (label: string) =>
  z
    .number({ error: `${label} must be a number of millimetres` })
    .finite(`${label} must be a finite number`);

export const pointSchema = z.tuple([
  mm('x').min(-MAX_COORD_MM).max(MAX_COORD_MM),
  mm('y').min(-MAX_COORD_MM).max(MAX_COORD_MM),
]);

export const supportKindSchema = z.enum(['blocks', 'beam', 'wall']);

export const supportRowSchema = z.object({
  a: pointSchema,
  b: pointSchema,
  kind: supportKindSchema.default('blocks'),
});

export const stepSchema = z.object({
  /** Index of the outline edge from point `edge` to point `edge + 1` (wrapping). */
  edge: z.number().int().min(0),
  /** Where the flight starts along the edge, measured from the edge's first point. */
  offsetMm: mm('Step offset').min(0).default(0),
  /** Flight width along the edge; 0 or missing means the whole edge. */
  widthMm: mm('Step width').min(0).default(0),
  count: z.number().int().min(1, 'A flight needs at least one step').max(20),
  treadBoards: z.number().int().min(1).max(6).default(3),
});

export const joistSpecSchema = z.object({
  widthMm: mm('Joist width').positive(),
  depthMm: mm('Joist depth').positive(),
  stockMm: mm('Joist stock length').positive(),
  maxSpanMm: mm('Joist maximum span').positive(),
  maxCantileverMm: mm('Joist maximum cantilever').min(0),
  /** Where maxSpanMm / maxCantileverMm come from (set when chosen from the catalogue; see engine/products). */
  source: z.string().max(500).optional(),
  /** The working behind those limits: table row or formulas with numbers, for flag explanations. */
  limitExplain: z.string().max(4000).optional(),
});

export const boardSpecSchema = z.object({
  widthMm: mm('Board width').positive(),
  gapMm: mm('Board side gap').min(0),
  endGapMm: mm('Board end gap').min(0),
  stockMm: mm('Board stock length').positive(),
  maxSpanMm: mm('Board maximum span').positive(),
  /** Where maxSpanMm comes from (set when chosen from the catalogue; see engine/products). */
  source: z.string().max(500).optional(),
  /** The working behind that limit, for flag explanations. */
  limitExplain: z.string().max(4000).optional(),
});

export const nogginRuleSchema = z.discriminatedUnion('kind', [
  /** One row at mid-span of every span longer than overMm (the default, over 1200 mm). */
  z.object({ kind: z.literal('midspan'), overMm: mm('Noggin threshold').min(0) }),
  /** Rows so that no unblocked length of joist exceeds maxSpacingMm. */
  z.object({ kind: z.literal('spacing'), maxSpacingMm: mm('Noggin spacing').positive() }),
  z.object({ kind: z.literal('none') }),
]);

export const codeBasisSchema = z.enum(['uk', 'us']);

/** Catalogue product ids chosen for this design (optional; the specs above stay the engine's input). */
export const productChoiceSchema = z
  .object({
    joist: z.string().optional(),
    board: z.string().optional(),
    borderBoard: z.string().optional(),
    post: z.string().optional(),
    block: z.string().optional(),
    fascia: z.string().optional(),
    membrane: z.string().optional(),
    clip: z.string().optional(),
    screw: z.string().optional(),
  })
  .default({});

export const designDocumentSchema = z.object({
  version: z.literal(1),
  outline: z.array(pointSchema).min(3, 'The outline needs at least three corners').max(200),
  boardAngleDeg: z.number().finite().min(-360).max(360),
  heightMm: mm('Deck height').min(0).max(10_000),
  joistCentresMm: mm('Joist centres')
    .min(100, 'Joist centres below 100 mm are not buildable')
    .max(1200),
  borderCourses: z.number().int().min(0).max(3),
  supports: z.array(supportRowSchema).max(200).default([]),
  steps: z.array(stepSchema).max(20).default([]),
  joist: joistSpecSchema,
  board: boardSpecSchema,
  // Extensions to version 1: every one optional with a default, so a bare v1 document is valid.
  codeBasis: codeBasisSchema.default('uk'),
  stairCentresMm: mm('Stair joist centres').min(100).max(1200).default(300),
  /** Minimum distance between butt joints in neighbouring courses. */
  minStaggerMm: mm('Minimum stagger').min(0).default(800),
  nogginRule: nogginRuleSchema.default({ kind: 'midspan', overMm: 1200 }),
  /** Deck heights at or above this use posts instead of block pads. */
  postsFromHeightMm: mm('Post height threshold').min(0).default(600),
  /** Saw kerf used by the cut list. */
  kerfMm: mm('Saw kerf').min(0).max(10).default(3),
  /** Offcuts shorter than this are waste, not reusable stock. */
  minOffcutMm: mm('Minimum useful offcut').min(0).default(300),
  products: productChoiceSchema,
});

/** A design document as stored and edited (defaults filled in). */
export type DesignDocument = z.output<typeof designDocumentSchema>;
/** A design document as accepted on input (extensions may be missing). */
export type DesignDocumentInput = z.input<typeof designDocumentSchema>;
export type SupportRowInput = z.output<typeof supportRowSchema>;
export type StepInput = z.output<typeof stepSchema>;
export type NogginRule = z.output<typeof nogginRuleSchema>;
export type CodeBasis = z.output<typeof codeBasisSchema>;

/** The 6 m x 4 m example from PRODUCT.md section 4, with defaults filled in. */
export function exampleDesign(): DesignDocument {
  return designDocumentSchema.parse({
    version: 1,
    outline: [
      [0, 0],
      [6000, 0],
      [6000, 4000],
      [0, 4000],
    ],
    boardAngleDeg: 0,
    heightMm: 450,
    joistCentresMm: 400,
    borderCourses: 1,
    supports: [],
    steps: [],
    joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
    board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
  });
}
