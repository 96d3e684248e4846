// Take-off rules: the counting rules for fixings, concrete and membrane, each with its source. Constants only; touches nothing.

/**
 * Every rule the take-off counts by. Each is a default a caller may override (takeOff's third
 * argument). Sources: "common practice" (PRODUCT.md section 3), "maker guidance (typical)" where
 * composite-board and clip makers commonly say so; "from memory" where the number is remembered
 * rather than read from a published page.
 */
export interface TakeOffRules {
  /** Construction screws through a rim into each joist end it meets (common practice, from memory: 2). */
  screwsPerJoistEnd: number;
  /** Screws at each rim end that butts another rim at a corner (common practice, from memory: 2). */
  screwsPerRimCorner: number;
  /** Screws at each end of a noggin, skew or through the joist (common practice, from memory: 2). */
  screwsPerNogginEnd: number;
  /** Laminated plies are screwed together along each ply-to-ply face at these centres (common practice, from memory: 300 mm, staggered). */
  laminationScrewCentresMm: number;
  /** Fewest screws in any ply-to-ply face (common practice: one near each end). */
  laminationScrewsMin: number;
  /** Screws fixing each post to the frame (common practice, from memory: two into each of the two members it meets). */
  screwsPerPost: number;
  /** Face screws per border board per joist it crosses (maker guidance (typical), from memory: 2). */
  borderScrewsPerCrossing: number;
  /** Block laid flat: length along the row, width across, thickness (common UK size, PRODUCT.md). */
  blockLengthMm: number;
  blockWidthMm: number;
  blockThicknessMm: number;
  /** Wet concrete bed under a block (common practice, PRODUCT.md: 100 mm). */
  bedMm: number;
  /** How far the bed runs past the block on every side (common practice; our default 50 mm). */
  bedMarginMm: number;
  /** Post depth in the ground (common practice, from memory: at least 600 mm). */
  postEmbedMm: number;
  /** Post hole: square side, and depth of concrete below the post's foot (common practice, from memory). */
  postHoleMm: number;
  postHoleBelowMm: number;
  /** Post section when the plan does not say (PRODUCT.md example: 100 x 100 mm). */
  postSectionMm: number;
  /** Weed membrane roll width and the overlap where two runs meet (common practice, from memory: 150 mm). */
  membraneRollWidthMm: number;
  membraneOverlapMm: number;
  /** Membrane turned past the deck edge all round (common practice; our default 100 mm). */
  membraneEdgeMm: number;
}

/** The default take-off rules. */
export const DEFAULT_RULES: TakeOffRules = {
  screwsPerJoistEnd: 2,
  screwsPerRimCorner: 2,
  screwsPerNogginEnd: 2,
  laminationScrewCentresMm: 300,
  laminationScrewsMin: 2,
  screwsPerPost: 4,
  borderScrewsPerCrossing: 2,
  blockLengthMm: 440,
  blockWidthMm: 215,
  blockThicknessMm: 100,
  bedMm: 100,
  bedMarginMm: 50,
  postEmbedMm: 600,
  postHoleMm: 300,
  postHoleBelowMm: 100,
  postSectionMm: 100,
  membraneRollWidthMm: 1500,
  membraneOverlapMm: 150,
  membraneEdgeMm: 100,
};
