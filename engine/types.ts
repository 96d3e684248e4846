// The frame plan (PRODUCT.md section 4): plain data the engine returns. Types only; imports nothing at run time.

/** A point in world millimetres, plan view, y up. */
export type Pt = [number, number];

export type MemberKind = 'joist' | 'rim' | 'noggin' | 'support' | 'post' | 'pad';
export type Ply = 1 | 2 | 3;

/** Why a member is there, beyond its kind: lets the canvas, take-off and PDF tell them apart. */
export type MemberRole =
  | 'field' // an ordinary joist at the set centres
  | 'butt-pair' // joist added beside another so each board end at a butt joint has its own bearing
  | 'border' // joists laminated under a border course (ply 3)
  | 'stair' // part of a step frame
  | 'edge' // joist running along an outline edge that is parallel to the joists
  | 'blocking'; // noggin

export interface Member {
  id: string;
  kind: MemberKind;
  ply: Ply;
  a: Pt;
  b: Pt;
  lengthMm: number;
  role?: MemberRole;
  /** Members cut from stock along one joist line share a lineId (joins fall between them). */
  lineId?: string;
  /** Index into FramePlan.steps for members of a step frame. */
  step?: number;
  /** For support members: the support kind. */
  supportKind?: 'blocks' | 'beam' | 'wall';
  /** For pads and posts: the deck height above ground at that point. */
  heightMm?: number;
}

export interface BoardPiece {
  id: string;
  course: number;
  a: Pt;
  b: Pt;
  lengthMm: number;
  border: boolean;
  /** Index into FramePlan.steps for tread boards. */
  step?: number;
}

export type Severity = 'error' | 'warning' | 'info';

export type FlagCode =
  | 'joist-span'
  | 'joist-cantilever'
  | 'board-span'
  | 'butt-joint-unsupported'
  | 'joist-join-off-support'
  | 'pad-spacing'
  | 'stair-rise'
  | 'stair-going'
  | 'stair-unequal-risers'
  | 'stair-2r-plus-g'
  | 'stair-pitch'
  | 'guard-required'
  | 'outline-invalid'
  | 'caution';

export interface Flag {
  code: FlagCode;
  severity: Severity;
  at: Pt;
  memberId?: string;
  valueMm?: number;
  limitMm?: number;
  message: string;
  /** Where the limit comes from: "common practice", a code clause, a maker's table. */
  source?: string;
  /** The why: the formula and numbers with units, for the flag's explanation panel. */
  explain?: string;
}

export interface SupportRowPlan {
  id: string;
  a: Pt;
  b: Pt;
  kind: 'blocks' | 'beam' | 'wall';
  /** True where the engine placed it, false where the user did. */
  placed: boolean;
}

export interface StepPlan {
  index: number;
  /** The flight's footprint on plan, outside the deck edge. */
  outline: Pt[];
  count: number;
  riseMm: number;
  goingMm: number;
  treadBoards: number;
  /** Height of each step's top above ground, lowest first. */
  levelsMm: number[];
}

export interface JoistJoin {
  at: Pt;
  lineId: string;
  memberIds: [string, string];
  onSupport: boolean;
}

export interface ButtJoint {
  at: Pt;
  course: number;
  /** The pair of joists carrying the two board ends, where there is one. */
  memberIds: string[];
  onPair: boolean;
}

/** One line of the take-off, unpriced; pricing happens against the firm's catalogue. */
export interface QuantityLine {
  key: string;
  label: string;
  unit: 'each' | 'm' | 'm2' | 'm3' | 'length';
  qty: number;
  /** Stock length for items bought by length. */
  stockMm?: number;
  /** Which product choice prices this line (see DesignDocument.products). */
  product?: string;
  /** How the number was worked out, and its source. */
  basis: string;
  /** Which variant of the product, where the catalogue has several (clips: starter, middle, finishing). */
  variant?: string;
  /** For 'each' lines of things cut to length (posts): the length each one needs, mm. */
  pieceMm?: number;
}

export interface CutStock {
  stockMm: number;
  cuts: number[];
  offcutMm: number;
  /** True when this piece is a reusable offcut from earlier in the job, not new stock. */
  fromOffcut?: boolean;
}

export interface CutListResult {
  count: number;
  stock: CutStock[];
  /** A proven lower bound on count: at least ceil(total demand incl. kerf / longest stock), raised by the L2 or LP bound where they are stronger. */
  lowerBound: number;
  /** True when the count was proven optimal. */
  optimal: boolean;
  /** Total length of new stock bought, mm (several stock lengths: the objective minimised first). */
  totalStockMm?: number;
  /** Pieces longer than every stock length and offcut: not cut, for the caller to split or flag. */
  tooLong?: number[];
}

export interface CutList {
  joists: CutListResult;
  boards: CutListResult;
  borderBoards?: CutListResult;
}

export interface FramePlan {
  version: 1;
  members: Member[];
  boards: BoardPiece[];
  flags: Flag[];
  supportRows: SupportRowPlan[];
  steps: StepPlan[];
  joins: JoistJoin[];
  buttJoints: ButtJoint[];
  quantities: QuantityLine[];
  cutList: CutList;
  /** Outline as used (counter-clockwise, duplicates removed). */
  outline: Pt[];
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  areaM2: number;
}

/** The frame plan before take-off: what the layout produces and takeOff() consumes. */
export type FramePlanCore = Omit<FramePlan, 'quantities' | 'cutList'>;
