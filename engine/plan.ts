// planFrame: the design document in, the frame plan out (PRODUCT.md sections 3 and 4). Pure: engine modules only.
import type { DesignDocument } from './schema';
import type {
  BoardPiece,
  ButtJoint,
  Flag,
  FramePlan,
  FramePlanCore,
  JoistJoin,
  Member,
  Pt,
  StepPlan,
  SupportRowPlan,
} from './types';
import { boundsOf, distToSegment, signedArea } from './geometry';
import { takeOff } from './takeoff';
import { STANDING_CAUTION, checkGuard, checkStairFlight, type CodeFinding } from './codes';
import { cleanOutline, frameContext } from './frame/outline';
import { placeJoistLines } from './frame/joists';
import { bearLines, endRows, placePads, placeRows, rimUsable, userRows } from './frame/supports';
import { cutLines, rimJoinPositions, type LineJoin } from './frame/cut';
import { boardSpans, insertPairs, layBoards } from './frame/boards';
import { placeNoggins } from './frame/noggins';
import { layFlight } from './frame/steps';
import { toWorld, type FrameContext, type JoistLine, type RowSeg } from './frame/model';

const PRACTICE = 'common practice';

function cautionFlag(at: Pt): Flag {
  return { code: 'caution', severity: 'info', at, message: STANDING_CAUTION, source: PRACTICE };
}

function codeFlag(f: CodeFinding, at: Pt): Flag {
  return {
    code: f.code,
    severity: f.severity,
    at,
    valueMm: f.valueMm,
    limitMm: f.limitMm,
    message: f.message,
    source: f.source,
    explain: f.explain,
  };
}

const round1 = (v: number) => Math.round(v * 10) / 10;

/**
 * Lays out the whole frame of a parsed design document: joists, rims, support rows, pads or posts,
 * noggins, boards by course with staggered butt joints on paired joists, steps, and every check as
 * a located flag. Returns the plan without quantities or cut list (see planFrame).
 */
export function layoutFrame(design: DesignDocument): FramePlanCore {
  const cleaned = cleanOutline(design);
  if ('problem' in cleaned) {
    const at = (design.outline[0] as Pt) ?? [0, 0];
    const pts = design.outline as Pt[];
    return {
      version: 1,
      members: [],
      boards: [],
      flags: [
        {
          code: 'outline-invalid',
          severity: 'error',
          at: [at[0], at[1]],
          message: `${cleaned.problem}: draw the deck edge as one closed shape that does not cross itself`,
        },
        cautionFlag([at[0], at[1]]),
      ],
      supportRows: [],
      steps: [],
      joins: [],
      buttJoints: [],
      outline: pts.map((p) => [p[0], p[1]]),
      bounds: boundsOf(pts.length ? pts : [[0, 0]]),
      areaM2: 0,
    };
  }
  const worldRing = cleaned.ring;
  const ctx = frameContext(design, worldRing);
  const flags: Flag[] = [];
  const W = (p: Pt) => toWorld(ctx, p);

  // Joist lines, then support rows (the user's or our own), then where each line bears.
  let lines = placeJoistLines(ctx);
  const auto = design.supports.length === 0;
  let rows: RowSeg[];
  const padded = auto ? ctx.edges.filter((e) => e.kind === 'angled' && rimUsable(e)) : [];
  if (auto) {
    rows = endRows(ctx);
    bearLines(ctx, lines, rows, padded);
    rows = rows.concat(placeRows(ctx, lines));
  } else {
    rows = userRows(ctx);
  }
  rows.forEach((r, i) => {
    if (r.placed) r.id = `S${i + 1}`;
  });
  // Rims that carry joist ends: those on pads, and those with a row under both their ends.
  const reach = ctx.w + 1;
  const onRow = (p: Pt) => rows.some((r) => distToSegment(p, r.a, r.b) <= reach);
  const carried = ctx.edges.filter(
    (e) =>
      e.kind !== 'parallel' &&
      rimUsable(e) &&
      (padded.includes(e) || (onRow(e.rimA) && onRow(e.rimB))),
  );
  bearLines(ctx, lines, rows, carried);

  // Boards, butt joints and the pair joists under them.
  const layout = layBoards(ctx, lines);
  const pairs = insertPairs(ctx, layout.joints, lines);
  bearLines(ctx, pairs, rows, carried);
  lines = lines.concat(pairs).sort((a, b) => a.x - b.x || a.y0 - b.y0);

  // Stock pieces and joins.
  const joins = cutLines(ctx, lines);

  const members: Member[] = [];
  for (const l of lines) {
    for (const p of l.pieces) {
      members.push({
        id: p.id,
        kind: l.kind,
        ply: l.ply,
        a: W([l.x, p.y0]),
        b: W([l.x, p.y1]),
        lengthMm: p.y1 - p.y0,
        role: l.role,
        lineId: l.id,
      });
    }
  }
  // Rims across the joists, cut evenly from stock.
  const rimJoins = new Map<number, number[]>();
  const planJoins: JoistJoin[] = [];
  const rimJoinsOff: { at: Pt; memberId: string }[] = [];
  for (const e of ctx.edges) {
    if (e.kind === 'parallel' || !rimUsable(e)) continue;
    const L = Math.hypot(e.rimB[0] - e.rimA[0], e.rimB[1] - e.rimA[1]);
    const cuts = rimJoinPositions(L, design.joist.stockMm);
    rimJoins.set(e.index, cuts);
    const ts = [0, ...cuts, L];
    const at = (t: number): Pt => [
      e.rimA[0] + ((e.rimB[0] - e.rimA[0]) * t) / L,
      e.rimA[1] + ((e.rimB[1] - e.rimA[1]) * t) / L,
    ];
    const lineId = `R${e.index + 1}`;
    for (let k = 0; k + 1 < ts.length; k++) {
      members.push({
        id: `${lineId}.${k + 1}`,
        kind: 'rim',
        ply: 1,
        a: W(at(ts[k])),
        b: W(at(ts[k + 1])),
        lengthMm: ts[k + 1] - ts[k],
        lineId,
      });
      if (k > 0) {
        // Pads go under the joins of padded rims; other rims need a row under the join.
        const p = at(ts[k]);
        const onSupport =
          padded.includes(e) || rows.some((r) => distToSegment(p, r.a, r.b) <= ctx.w + 1);
        const memberIds: [string, string] = [`${lineId}.${k}`, `${lineId}.${k + 1}`];
        planJoins.push({ at: W(p), lineId, memberIds, onSupport });
        if (!onSupport) rimJoinsOff.push({ at: W(p), memberId: memberIds[1] });
      }
    }
  }

  // Support rows, pads and posts.
  const supportRows: SupportRowPlan[] = [];
  rows.forEach((r) => {
    const a = W(r.a);
    const b = W(r.b);
    supportRows.push({ id: r.id, a, b, kind: r.kind, placed: r.placed });
    members.push({
      id: r.id,
      kind: 'support',
      ply: 1,
      a,
      b,
      lengthMm: Math.hypot(b[0] - a[0], b[1] - a[1]),
      supportKind: r.kind,
    });
  });
  const pads = placePads(ctx, padded, rows, rimJoins);
  pads.points.forEach((p, i) => {
    const at = W(p);
    members.push({
      id: `P${i + 1}`,
      kind: ctx.usePosts ? 'post' : 'pad',
      ply: 1,
      a: at,
      b: at,
      lengthMm: ctx.usePosts ? Math.max(0, design.heightMm - design.joist.depthMm) : 0,
      heightMm: design.heightMm,
    });
  });
  for (const o of pads.overLimit) {
    flags.push({
      code: 'pad-spacing',
      severity: 'error',
      at: W(o.at),
      valueMm: round1(o.gap),
      limitMm: ctx.rowLimit,
      message: `Pads ${round1(o.gap)} mm apart under the rim: at most ${ctx.rowLimit} mm`,
      source: PRACTICE,
      explain: `Pads under perimeter rims no further apart than the joist span (${design.joist.maxSpanMm} mm).`,
    });
  }

  // Noggins.
  placeNoggins(ctx, lines).forEach((n, i) => {
    const a = W([n.left.x + ctx.w / 2, n.y]);
    const b = W([n.right.x - ctx.w / 2, n.y]);
    members.push({
      id: `N${i + 1}`,
      kind: 'noggin',
      ply: 1,
      a,
      b,
      lengthMm: n.right.x - n.left.x - ctx.w,
      role: 'blocking',
    });
  });

  // Boards.
  const boards: BoardPiece[] = [];
  const courseCount = new Map<number, number>();
  for (const bd of layout.boards) {
    const lengthMm = Math.hypot(bd.b[0] - bd.a[0], bd.b[1] - bd.a[1]);
    if (lengthMm < 1) continue;
    const k = (courseCount.get(bd.course) ?? 0) + 1;
    courseCount.set(bd.course, k);
    boards.push({
      id: `B${bd.course}.${k}`,
      course: bd.course,
      a: W(bd.a),
      b: W(bd.b),
      lengthMm,
      border: bd.border,
    });
  }

  // Joins of joist lines.
  for (const j of joins) planJoins.push(joinOut(ctx, j));
  const offSupport = [
    ...joins
      .filter((j) => !j.onSupport)
      .map((j) => ({ at: W([j.line.x, j.y]), memberId: j.above })),
    ...rimJoinsOff,
  ];
  for (const j of offSupport) {
    flags.push({
      code: 'joist-join-off-support',
      severity: 'error',
      at: j.at,
      memberId: j.memberId,
      message: 'Joist join is not over a support row: move the join or add a support under it',
      source: PRACTICE,
      explain: `Joist joins must land over a support row (${PRACTICE}). Stock ${design.joist.stockMm} mm is shorter than the distance between the supports here.`,
    });
  }

  // Butt joints.
  const buttJoints: ButtJoint[] = [];
  for (const j of layout.joints) {
    const ids: string[] = [];
    const a = pieceAt(j.line, j.at[1]);
    const b = pieceAt(j.pair, j.at[1]);
    if (a) ids.push(a);
    if (b) ids.push(b);
    const onPair = j.alongEdge || (ids.length === 2 && !!j.pair);
    buttJoints.push({ at: W(j.at), course: j.course, memberIds: ids, onPair });
    if (!onPair) {
      flags.push({
        code: 'butt-joint-unsupported',
        severity: 'error',
        at: W(j.at),
        message:
          'Board butt joint is not over a pair of joists: each board end needs its own joist',
        source: PRACTICE,
        explain: `Butt joints sit over a pair of joists so that each board end has its own bearing and fixing (${PRACTICE}).`,
      });
    }
  }

  // Spans and cantilevers of every joist line.
  const maxSpan = design.joist.maxSpanMm;
  const maxCant = design.joist.maxCantileverMm;
  for (const l of lines) {
    const stops = [
      ...(l.endSupported[0] ? [l.bearY[0]] : []),
      ...l.supports,
      ...(l.endSupported[1] ? [l.bearY[1]] : []),
    ];
    if (stops.length === 0) {
      const mid = (l.y0 + l.y1) / 2;
      flags.push(
        spanFlag(ctx, W([l.x, mid]), pieceAt(l, mid), l.y1 - l.y0, maxSpan, 'no support under it'),
      );
      continue;
    }
    for (let i = 0; i + 1 < stops.length; i++) {
      const span = stops[i + 1] - stops[i];
      if (span > maxSpan + 0.5) {
        const mid = (stops[i] + stops[i + 1]) / 2;
        flags.push(
          spanFlag(ctx, W([l.x, mid]), pieceAt(l, mid), span, maxSpan, 'between supports'),
        );
      }
    }
    const cants: [number, number][] = [];
    if (!l.endSupported[0]) cants.push([stops[0] - l.y0, l.y0]);
    // (a supported end bears just beyond it, so it has no overhang)
    if (!l.endSupported[1]) cants.push([l.y1 - stops[stops.length - 1], l.y1]);
    for (const [c, y] of cants) {
      if (c > maxCant + 0.5) {
        flags.push({
          code: 'joist-cantilever',
          severity: 'error',
          at: W([l.x, y]),
          memberId: pieceAt(l, y),
          valueMm: round1(c),
          limitMm: maxCant,
          message: `Joist overhangs its last support by ${round1(c)} mm: at most ${maxCant} mm`,
          source: limitSource(design.joist).source,
          explain: `Cantilever = distance from the last support to the joist end = ${round1(c)} mm; the joist allows ${maxCant} mm (${limitSource(design.joist).source}, from the joist settings).${limitSource(design.joist).note}`,
        });
      }
    }
  }

  // Board spans, one flag per pair of neighbouring supports.
  const boardLimit = design.board.maxSpanMm;
  const worst = new Map<string, { x: number; y: number; span: number }>();
  for (const s of boardSpans(ctx, layout.courses, lines, boardLimit + 0.5)) {
    const key = `${s.left}|${s.right}`;
    const cur = worst.get(key);
    if (!cur || s.span > cur.span) worst.set(key, s);
  }
  for (const s of worst.values()) {
    flags.push({
      code: 'board-span',
      severity: 'error',
      at: W([s.x, s.y]),
      valueMm: round1(s.span),
      limitMm: boardLimit,
      message: `Boards span ${round1(s.span)} mm between joists here: at most ${boardLimit} mm`,
      source: limitSource(design.board).source,
      explain: `Span measured along the board (clear gap + one joist width), so where a support crosses at an angle it is centres / sin(angle between board and joist). Limit ${boardLimit} mm from the board settings (${limitSource(design.board).source}).${limitSource(design.board).note}`,
    });
  }

  // Steps.
  const steps: StepPlan[] = [];
  design.steps.forEach((s, i) => {
    const flight = layFlight(design, worldRing, s, i);
    if (!flight) {
      flags.push({
        code: 'outline-invalid',
        severity: 'warning',
        at: worldRing[0],
        message: `Step ${i + 1} is not on a usable stretch of the deck edge`,
      });
      return;
    }
    steps.push(flight.plan);
    members.push(...flight.members);
    boards.push(...flight.boards);
    const rises = new Array(flight.plan.count + 1).fill(flight.plan.riseMm);
    for (const f of checkStairFlight(
      { risesMm: rises, goingMm: flight.plan.goingMm },
      design.codeBasis,
    )) {
      flags.push(codeFlag(f, flight.at));
    }
  });

  // Guards along the deck edge.
  for (let i = 0; i < worldRing.length; i++) {
    const a = worldRing[i];
    const b = worldRing[(i + 1) % worldRing.length];
    const g = checkGuard(design.heightMm, design.codeBasis);
    if (g) flags.push(codeFlag(g, [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2]));
  }
  flags.push(cautionFlag(worldRing[0]));

  return {
    version: 1,
    members,
    boards,
    flags,
    supportRows,
    steps,
    joins: planJoins,
    buttJoints,
    outline: worldRing,
    bounds: boundsOf(worldRing),
    areaM2: Math.abs(signedArea(worldRing)) / 1e6,
  };
}

/** Where a member's limit comes from: the chosen product's source when there is one. */
function limitSource(spec: { source?: string; limitExplain?: string }): {
  source: string;
  note: string;
} {
  return {
    source: spec.source ?? PRACTICE,
    note: spec.limitExplain ? ` ${spec.limitExplain}` : '',
  };
}

/** The id of the stock piece of a line that covers y. */
function pieceAt(l: JoistLine | null, y: number): string | undefined {
  if (!l) return undefined;
  y = Math.min(l.y1, Math.max(l.y0, y));
  for (const p of l.pieces) if (p.y0 - 1e-6 <= y && y <= p.y1 + 1e-6) return p.id;
  return undefined;
}

function spanFlag(
  ctx: FrameContext,
  at: Pt,
  memberId: string | undefined,
  span: number,
  limit: number,
  where: string,
): Flag {
  return {
    code: 'joist-span',
    severity: 'error',
    at,
    memberId,
    valueMm: round1(span),
    limitMm: limit,
    message: `Joist spans ${round1(span)} mm ${where}: at most ${limit} mm`,
    source: limitSource(ctx.design.joist).source,
    explain: `Span = distance between supports along the joist = ${round1(span)} mm; the joist allows ${limit} mm (${limitSource(ctx.design.joist).source}; ${PRACTICE} for a 125 x 50 mm plastic joist is at most 1.5 m; here from the joist settings). Add a support row.${limitSource(ctx.design.joist).note}`,
  };
}

function joinOut(ctx: FrameContext, j: LineJoin): JoistJoin {
  return {
    at: toWorld(ctx, [j.line.x, j.y]),
    lineId: j.line.id,
    memberIds: [j.below, j.above],
    onSupport: j.onSupport,
  };
}

/** Plans the frame and adds the take-off and cut list. */
export function planFrame(design: DesignDocument): FramePlan {
  const core = layoutFrame(design);
  const { quantities, cutList } = takeOff(core, design);
  return { ...core, quantities, cutList };
}
