// Take-off: counts everything the frame plan needs (stock lengths via the cut list, clips, screws, blocks, concrete, membrane, posts, fascia). Pure; touches nothing outside engine/.
import { solveCutList } from '../cutlist';
import type { DesignDocument } from '../schema';
import type {
  BoardPiece,
  CutList,
  CutListResult,
  FramePlanCore,
  Member,
  QuantityLine,
} from '../types';
import {
  crossingAlong,
  distToSegment,
  outlineEdges,
  SegmentGrid,
  segLength,
  sinBetween,
} from './geometry';
import { DEFAULT_RULES, type TakeOffRules } from './rules';

export { DEFAULT_RULES, type TakeOffRules } from './rules';

/** Members cut from joist-section stock. */
const JOIST_SECTION = new Set<Member['kind']>(['joist', 'rim', 'noggin']);

/** A board may be fixed to a member it crosses at more than about 17 degrees (|sin| > 0.3). */
const MIN_CROSSING_SIN = 0.3;

const r3 = (x: number) => Math.round(x * 1000) / 1000;

/**
 * The take-off of a frame plan: stock lengths from the cut list and every counted item, each line
 * with how it was worked out and its source. `rules` overrides the defaults in ./rules.ts.
 */
export function takeOff(
  plan: FramePlanCore,
  design: DesignDocument,
  rules: Partial<TakeOffRules> = {},
): { quantities: QuantityLine[]; cutList: CutList } {
  const R: TakeOffRules = { ...DEFAULT_RULES, ...rules };
  const lines: QuantityLine[] = [];
  const cutList = cutLists(plan, design);
  lines.push(...stockLines(cutList, design));
  lines.push(...clipLines(plan, design));
  lines.push(...screwLines(plan, design, R));
  lines.push(...groundLines(plan, design, R));
  return { quantities: lines.filter((l) => l.qty > 0), cutList };
}

/**
 * True unless the design chooses the same product for border and field boards: border boards are
 * usually a board of their own (a square edge, another colour), bought and cut on their own.
 */
function separateBorder(design: DesignDocument): boolean {
  const { board, borderBoard } = design.products;
  return !(board !== undefined && borderBoard === board);
}

/** Pieces grouped by length, for the cut list solver. */
function piecesOf(lengths: number[]): { lengthMm: number; qty: number }[] {
  const m = new Map<number, number>();
  for (const l of lengths) {
    const k = r3(l);
    if (k > 0) m.set(k, (m.get(k) ?? 0) + 1);
  }
  return [...m.entries()].map(([lengthMm, qty]) => ({ lengthMm, qty }));
}

/**
 * The cut lists. Joist-section members (joists, rims, noggins, every ply) are packed together, so
 * noggins come out of what is left of joist bars: the same as cutting noggins from joist offcuts,
 * and never dearer than doing it in two passes. Border boards get a cut list of their own unless
 * the design chooses one product for both (see separateBorder).
 */
function cutLists(plan: FramePlanCore, design: DesignDocument): CutList {
  const common = { kerfMm: design.kerfMm, minOffcutMm: design.minOffcutMm };
  const joistPieces: number[] = [];
  for (const m of plan.members)
    if (JOIST_SECTION.has(m.kind)) for (let k = 0; k < m.ply; k++) joistPieces.push(m.lengthMm);
  const apart = separateBorder(design);
  const field = plan.boards.filter((b) => !(apart && b.border)).map((b) => b.lengthMm);
  const joists = solveCutList({
    ...common,
    stockMm: design.joist.stockMm,
    pieces: piecesOf(joistPieces),
  });
  const boards = solveCutList({
    ...common,
    stockMm: design.board.stockMm,
    pieces: piecesOf(field),
  });
  const out: CutList = { joists, boards };
  const border = plan.boards.filter((b) => b.border).map((b) => b.lengthMm);
  if (apart && border.length) {
    out.borderBoards = solveCutList({
      ...common,
      stockMm: design.board.stockMm,
      pieces: piecesOf(border),
    });
  }
  return out;
}

/** How a cut list was reached, in words. */
function cutBasis(r: CutListResult, what: string, kerf: number): string {
  const pieces = r.stock.reduce((a, s) => a + s.cuts.length, 0);
  const proof = r.optimal
    ? 'proven fewest bars'
    : `within ${r.count - r.lowerBound} bar(s) of the lower bound ${r.lowerBound}`;
  const reusable = r.stock.filter((s) => s.offcutMm > 0).length;
  return `Cut list: ${pieces} ${what} cut from stock with a ${kerf} mm saw kerf, ${proof}; ${reusable} bar(s) leave an offcut.`;
}

function stockLines(cut: CutList, design: DesignDocument): QuantityLine[] {
  const lines: QuantityLine[] = [];
  const add = (r: CutListResult, key: string, label: string, product: string, what: string) => {
    const byStock = new Map<number, number>();
    for (const s of r.stock)
      if (!s.fromOffcut) byStock.set(s.stockMm, (byStock.get(s.stockMm) ?? 0) + 1);
    for (const [stockMm, qty] of byStock)
      lines.push({
        key: `${key}-${stockMm}`,
        label: `${label}, ${stockMm} mm lengths`,
        unit: 'length',
        qty,
        stockMm,
        product,
        basis: cutBasis(r, what, design.kerfMm),
      });
    if (r.tooLong?.length)
      lines.push({
        key: `${key}-too-long`,
        label: `${label}: pieces longer than stock (split before cutting)`,
        unit: 'each',
        qty: r.tooLong.length,
        basis: `Pieces of ${[...new Set(r.tooLong)].join(', ')} mm are longer than the stock; the frame must be split at a support.`,
      });
  };
  const j = design.joist;
  add(
    cut.joists,
    'joists',
    `Joists ${j.depthMm} x ${j.widthMm}`,
    'joist',
    'joist, rim and noggin pieces (each ply)',
  );
  const b = design.board;
  add(cut.boards, 'boards', `Deck boards ${b.widthMm} wide`, 'board', 'board pieces');
  if (cut.borderBoards)
    add(
      cut.borderBoards,
      'border-boards',
      `Border boards ${b.widthMm} wide`,
      'borderBoard',
      'border board pieces',
    );
  return lines;
}

/** Members boards are fixed to: joists and rims (rims only count where a board crosses them). */
function fixingMembers(plan: FramePlanCore): Member[] {
  return plan.members.filter((m) => m.kind === 'joist' || m.kind === 'rim');
}

/** Board pieces filed in a grid, with the tolerances crossings are judged by. */
interface BoardIndex {
  boards: BoardPiece[];
  grid: SegmentGrid;
  tolBoard: number;
  tolMember: number;
}

function indexBoards(boards: BoardPiece[], design: DesignDocument): BoardIndex {
  const tolBoard = design.joist.widthMm / 4; // a board end resting on the joist still bears on it
  const tolMember = design.board.widthMm / 2; // a board half over a joist end still gets fixed
  return { boards, grid: new SegmentGrid(boards, 600, tolBoard), tolBoard, tolMember };
}

/**
 * Distances along member m (from m.a) where board pieces cross it.
 * WARNING: keep this exported. When it was module-private, the production minifier inlined it into
 * crossingsByLine and lost its `idx` parameter (ReferenceError in the plan and materials routes).
 */
export function crossingsOn(m: Member, idx: BoardIndex): number[] {
  const { tolBoard, tolMember } = idx;
  const at: number[] = [];
  const near = idx.grid.near(
    Math.min(m.a[0], m.b[0]) - tolMember,
    Math.min(m.a[1], m.b[1]) - tolMember,
    Math.max(m.a[0], m.b[0]) + tolMember,
    Math.max(m.a[1], m.b[1]) + tolMember,
  );
  for (const i of near) {
    const bd = idx.boards[i];
    if (sinBetween(bd.a, bd.b, m.a, m.b) < MIN_CROSSING_SIN) continue;
    const t = crossingAlong(bd.a, bd.b, m.a, m.b, tolBoard, tolMember);
    if (t !== null) at.push(t);
  }
  return at;
}

/**
 * Hidden clips. Rule (maker guidance (typical), from memory): a clip at every board/joist
 * crossing, sitting in the gap between two boards; so along each joist a run of n touching field
 * boards takes one starter clip at the first board's outer edge, n - 1 middle clips in the gaps and
 * one finishing clip at the last board. Runs break where the next board is more than 1.5 board
 * pitches away (a border course, a step, a hole). Border boards are face-screwed, not clipped.
 */
export function countClips(
  plan: FramePlanCore,
  design: DesignDocument,
): { starter: number; middle: number; finishing: number; crossings: number } {
  const field = plan.boards.filter((b) => !b.border);
  const pitch = design.board.widthMm + design.board.gapMm;
  let starter = 0;
  let middle = 0;
  let crossings = 0;
  for (const at of crossingsByLine(plan, indexBoards(field, design))) {
    if (at.length === 0) continue;
    crossings += at.length;
    let runs = 1;
    for (let i = 1; i < at.length; i++) if (at[i] - at[i - 1] > 1.5 * pitch) runs++;
    starter += runs;
    middle += at.length - runs;
  }
  return { starter, middle, finishing: starter, crossings };
}

/**
 * Board crossings along each joist line (members sharing a lineId are one line, so a board over a
 * join is counted once), as distances along the line, sorted, duplicates within 1 mm removed.
 */
function crossingsByLine(plan: FramePlanCore, idx: BoardIndex): number[][] {
  const groups = new Map<string, Member[]>();
  for (const m of fixingMembers(plan)) {
    const k = m.lineId ?? `member:${m.id}`;
    const g = groups.get(k);
    if (g) g.push(m);
    else groups.set(k, [m]);
  }
  const out: number[][] = [];
  for (const members of groups.values()) {
    const o = members[0].a;
    const len = segLength(members[0].a, members[0].b) || 1;
    const ux = (members[0].b[0] - o[0]) / len;
    const uy = (members[0].b[1] - o[1]) / len;
    const at: number[] = [];
    for (const m of members) {
      const mu = segLength(m.a, m.b) || 1;
      for (const t of crossingsOn(m, idx)) {
        const x = m.a[0] + ((m.b[0] - m.a[0]) * t) / mu;
        const y = m.a[1] + ((m.b[1] - m.a[1]) * t) / mu;
        at.push((x - o[0]) * ux + (y - o[1]) * uy);
      }
    }
    at.sort((x, y) => x - y);
    out.push(at.filter((t, i) => i === 0 || t - at[i - 1] > 1));
  }
  return out;
}

function clipLines(plan: FramePlanCore, design: DesignDocument): QuantityLine[] {
  const c = countClips(plan, design);
  const src = 'maker guidance (typical), from memory';
  const basis = `${c.crossings} field board/joist crossings: one clip per crossing in the board gaps, a starter and a finishing clip per run of boards along each joist (${src}).`;
  return [
    {
      key: 'clips-starter',
      label: 'Hidden clips, starter',
      unit: 'each',
      qty: c.starter,
      product: 'clip',
      variant: 'starter',
      basis,
    },
    {
      key: 'clips-middle',
      label: 'Hidden clips, middle',
      unit: 'each',
      qty: c.middle,
      product: 'clip',
      variant: 'middle',
      basis,
    },
    {
      key: 'clips-finishing',
      label: 'Hidden clips, finishing',
      unit: 'each',
      qty: c.finishing,
      product: 'clip',
      variant: 'finishing',
      basis,
    },
  ];
}

/** Screw counts by connection, each rule in ./rules.ts. */
export function countScrews(
  plan: FramePlanCore,
  design: DesignDocument,
  rules: Partial<TakeOffRules> = {},
): {
  joistEnds: number;
  rimCorners: number;
  noggins: number;
  laminations: number;
  posts: number;
  borderFace: number;
} {
  const R: TakeOffRules = { ...DEFAULT_RULES, ...rules };
  const rims = plan.members.filter((m) => m.kind === 'rim');
  const reach = design.joist.widthMm + 2; // centreline to centreline where a joist end meets a rim
  const rimGrid = new SegmentGrid(rims, 600, reach);
  const rimsNear = (p: [number, number]) =>
    rimGrid.near(p[0], p[1], p[0], p[1]).map((i) => rims[i]);
  let joistEnds = 0;
  let rimCorners = 0;
  let noggins = 0;
  let laminations = 0;
  let posts = 0;
  for (const m of plan.members) {
    switch (m.kind) {
      case 'joist': {
        for (const end of [m.a, m.b])
          if (rims.some((r) => distToSegment(end, r.a, r.b) <= reach))
            joistEnds += R.screwsPerJoistEnd * m.ply;
        break;
      }
      case 'rim': {
        for (const end of [m.a, m.b])
          if (
            rimsNear(end).some(
              (r) =>
                r !== m &&
                sinBetween(m.a, m.b, r.a, r.b) >= MIN_CROSSING_SIN &&
                distToSegment(end, r.a, r.b) <= reach,
            )
          )
            rimCorners += R.screwsPerRimCorner * m.ply;
        break;
      }
      case 'noggin':
        noggins += 2 * R.screwsPerNogginEnd * m.ply;
        break;
      case 'post':
        posts += R.screwsPerPost;
        break;
      case 'support':
      case 'pad':
        break;
      default: {
        const never: never = m.kind;
        throw new Error(`unknown member kind ${String(never)}`);
      }
    }
    // Plies laminated together; a butt-pair joist is screwed to the joist beside it.
    const faces =
      m.kind === 'post' || m.kind === 'pad' || m.kind === 'support'
        ? 0
        : m.ply - 1 + (m.role === 'butt-pair' && m.ply === 1 ? 1 : 0);
    if (faces > 0)
      laminations +=
        faces *
        Math.max(R.laminationScrewsMin, Math.floor(m.lengthMm / R.laminationScrewCentresMm) + 1);
  }
  const borderBoards = plan.boards.filter((b) => b.border);
  let borderFace = 0;
  if (borderBoards.length)
    for (const at of crossingsByLine(plan, indexBoards(borderBoards, design)))
      borderFace += at.length * R.borderScrewsPerCrossing;
  return { joistEnds, rimCorners, noggins, laminations, posts, borderFace };
}

function screwLines(plan: FramePlanCore, design: DesignDocument, R: TakeOffRules): QuantityLine[] {
  const s = countScrews(plan, design, R);
  const frame = s.joistEnds + s.rimCorners + s.noggins + s.laminations + s.posts;
  return [
    {
      key: 'screws-frame',
      label: 'Construction screws (frame)',
      unit: 'each',
      qty: frame,
      product: 'screw',
      basis:
        `Common practice, pre-drilled in plastic (counts from memory): joist ends into rims ${s.joistEnds} (${R.screwsPerJoistEnd} per end per ply), ` +
        `rim corners ${s.rimCorners} (${R.screwsPerRimCorner} per end), noggins ${s.noggins} (${R.screwsPerNogginEnd} per end), ` +
        `ply laminations ${s.laminations} (${R.laminationScrewCentresMm} mm centres, at least ${R.laminationScrewsMin} per face), posts ${s.posts} (${R.screwsPerPost} each). Joist joins over a support are not counted.`,
    },
    {
      key: 'screws-border',
      label: 'Face screws for border boards',
      unit: 'each',
      qty: s.borderFace,
      product: 'borderScrew',
      basis: `${R.borderScrewsPerCrossing} per border board per joist crossed (maker guidance (typical), from memory).`,
    },
  ];
}

/** Blocks, concrete, membrane, posts and fascia: everything measured off the ground plan. */
function groundLines(plan: FramePlanCore, design: DesignDocument, R: TakeOffRules): QuantityLine[] {
  const lines: QuantityLine[] = [];
  const rows = plan.supportRows.length
    ? plan.supportRows.filter((r) => r.kind === 'blocks')
    : plan.members.filter((m) => m.kind === 'support' && (m.supportKind ?? 'blocks') === 'blocks');
  const pads = plan.members.filter((m) => m.kind === 'pad');
  const posts = plan.members.filter((m) => m.kind === 'post');
  let rowBlocks = 0;
  let stripM3 = 0;
  const perRow: string[] = [];
  const bedW = R.blockWidthMm + 2 * R.bedMarginMm;
  for (const r of rows) {
    const n = Math.max(1, Math.ceil(segLength(r.a, r.b) / R.blockLengthMm - 1e-9));
    rowBlocks += n;
    perRow.push(`${'id' in r ? r.id : 'row'} ${n}`);
    stripM3 += ((n * R.blockLengthMm + 2 * R.bedMarginMm) * bedW * R.bedMm) / 1e9;
  }
  const padM3 = (pads.length * (R.blockLengthMm + 2 * R.bedMarginMm) * bedW * R.bedMm) / 1e9;
  const holeDepth = R.postEmbedMm + R.postHoleBelowMm;
  const postM3 =
    (posts.length *
      (R.postHoleMm * R.postHoleMm * holeDepth -
        R.postSectionMm * R.postSectionMm * R.postEmbedMm)) /
    1e9;
  const digMm = R.blockThicknessMm + R.bedMm;
  lines.push({
    key: 'blocks',
    label: `Solid blocks ${R.blockLengthMm} x ${R.blockWidthMm} x ${R.blockThicknessMm}, laid flat`,
    unit: 'each',
    qty: rowBlocks + pads.length,
    product: 'block',
    basis: `Blocks laid end to end along each support row, its length / ${R.blockLengthMm} mm rounded up (${perRow.join(', ') || 'no rows'}: ${rowBlocks}), and one block per pad (${pads.length}) (common practice).`,
  });
  lines.push({
    key: 'concrete',
    label: 'Concrete',
    unit: 'm3',
    qty: r3(stripM3 + padM3 + postM3),
    product: 'concrete',
    basis:
      `Blocks laid flat on a ${R.bedMm} mm wet concrete bed, ${R.bedMarginMm} mm wider than the block all round; the trench bottom is ${digMm} mm below the block top (common practice). ` +
      `Strips ${r3(stripM3)} m3, pads ${r3(padM3)} m3, post holes ${r3(postM3)} m3 (${R.postHoleMm} mm square, post ${R.postEmbedMm} mm in the ground on ${R.postHoleBelowMm} mm of concrete; common practice, from memory).`,
  });
  // Membrane: the plan area plus a margin round the edge, in runs of roll width that overlap.
  const edges = outlineEdges(plan.outline);
  const perimeterMm = edges.reduce((a, [p, q]) => a + segLength(p, q), 0);
  const cover = plan.areaM2 + (perimeterMm / 1000) * (R.membraneEdgeMm / 1000);
  const factor = R.membraneRollWidthMm / (R.membraneRollWidthMm - R.membraneOverlapMm);
  lines.push({
    key: 'membrane',
    label: 'Weed membrane',
    unit: 'm2',
    qty: Math.round(cover * factor * 100) / 100,
    product: 'membrane',
    basis: `Deck area ${r3(plan.areaM2)} m2 plus ${R.membraneEdgeMm} mm past the edge all round, in ${R.membraneRollWidthMm} mm runs overlapping ${R.membraneOverlapMm} mm (x ${r3(factor)}) (common practice, overlap from memory).`,
  });
  // Posts, grouped by the length each needs (height above ground plus the part in the ground), to 100 mm.
  const byLen = new Map<number, number>();
  for (const p of posts) {
    const len = Math.ceil(((p.heightMm ?? design.heightMm) + R.postEmbedMm) / 100) * 100;
    byLen.set(len, (byLen.get(len) ?? 0) + 1);
  }
  for (const [len, qty] of [...byLen.entries()].sort((a, b) => a[0] - b[0]))
    lines.push({
      key: `posts-${len}`,
      label: `Posts, ${len} mm each`,
      unit: 'each',
      qty,
      pieceMm: len,
      product: 'post',
      basis: `Deck height above the ground at the post plus ${R.postEmbedMm} mm in the ground, rounded up to 100 mm (common practice, from memory).`,
    });
  // Beams: support rows carried on posts, by length (their section and stock come from the catalogue).
  const beams = plan.members.filter((m) => m.kind === 'support' && m.supportKind === 'beam');
  const beamMm = beams.reduce((a, m) => a + m.lengthMm * m.ply, 0);
  lines.push({
    key: 'beams',
    label: 'Beams on posts',
    unit: 'm',
    qty: r3(beamMm / 1000),
    product: 'beam',
    basis: `${beams.length} support row(s) of kind beam, their full length (every ply); joins over posts as the plan shows.`,
  });
  // Fascia round every outline edge that does not stand against a wall.
  const walls = plan.supportRows.filter((r) => r.kind === 'wall');
  const nearWall = (p: [number, number]) => walls.some((w) => distToSegment(p, w.a, w.b) <= 100);
  let fasciaMm = 0;
  for (const [p, q] of edges) if (!(nearWall(p) && nearWall(q))) fasciaMm += segLength(p, q);
  lines.push({
    key: 'fascia',
    label: 'Fascia',
    unit: 'm',
    qty: r3(fasciaMm / 1000),
    product: 'fascia',
    basis: 'Every outline edge not against a wall (common practice).',
  });
  return lines;
}
