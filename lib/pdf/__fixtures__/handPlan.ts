// TEST FIXTURE ONLY: a frame plan laid out by hand for a rectangular deck, so the PDF can be built and
// tested without the engine. Not trade logic; never import it outside tests.
import { designDocumentSchema, type DesignDocument } from '@/engine/schema';
import type { BoardPiece, FramePlan, Member, Pt, SupportRowPlan } from '@/engine/types';

export interface HandPlanOptions {
  widthMm?: number;
  depthMm?: number;
  /** Adds a two-step flight on the front edge. */
  steps?: boolean;
}

/** A hand-made frame plan for a widthMm x depthMm deck with boards along x (test fixture). */
export function handPlan(opts: HandPlanOptions = {}): { plan: FramePlan; design: DesignDocument } {
  const W = opts.widthMm ?? 6000;
  const D = opts.depthMm ?? 4000;
  const withSteps = opts.steps ?? true;
  const design = designDocumentSchema.parse({
    version: 1,
    outline: [
      [0, 0],
      [W, 0],
      [W, D],
      [0, D],
    ],
    boardAngleDeg: 0,
    heightMm: 450,
    joistCentresMm: 400,
    borderCourses: 1,
    supports: [],
    steps: withSteps ? [{ edge: 0, offsetMm: 2000, widthMm: 1500, count: 2, treadBoards: 3 }] : [],
    joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
    board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
  });
  const members: Member[] = [];
  let n = 0;
  const id = (p: string) => `${p}${++n}`;
  const add = (m: Omit<Member, 'id' | 'lengthMm'> & { id?: string }) => {
    const lengthMm = Math.hypot(m.b[0] - m.a[0], m.b[1] - m.a[1]);
    const member = { ...m, id: m.id ?? id(m.kind), lengthMm } as Member;
    members.push(member);
    return member;
  };
  // Support rows every 1 333 mm or less along y.
  const rowsY: number[] = [];
  const bays = Math.ceil(D / 1400);
  for (let i = 0; i <= bays; i++) rowsY.push(Math.round((D * i) / bays));
  const supportRows: SupportRowPlan[] = rowsY.map((y, i) => ({
    id: `row${i + 1}`,
    a: [0, y],
    b: [W, y],
    kind: 'blocks',
    placed: true,
  }));
  for (const r of supportRows)
    add({ kind: 'support', ply: 1, a: r.a, b: r.b, supportKind: 'blocks', id: r.id });
  // Joists along y, cut at the support nearest 3 000 mm.
  const xs: number[] = [];
  for (let x = 25; x < W - 25; x += 400) xs.push(x);
  xs.push(W - 25);
  const splitAt = rowsY.filter((y) => y > 0 && y < D && y <= 3000).pop();
  xs.forEach((x, i) => {
    const border = i === 0 || i === xs.length - 1;
    const lineId = `L${i}`;
    const role = border ? 'border' : 'field';
    const ply = border ? 3 : 1;
    if (D > 3000 && splitAt) {
      add({ kind: 'joist', ply, role, lineId, a: [x, 0], b: [x, splitAt] });
      add({ kind: 'joist', ply, role, lineId, a: [x, splitAt], b: [x, D] });
    } else add({ kind: 'joist', ply, role, lineId, a: [x, 0], b: [x, D] });
  });
  // A pair beside the joist under each staggered butt joint.
  for (let x = 4800; x < W; x += 4800) {
    const near = xs.reduce((a, b) => (Math.abs(b - x) < Math.abs(a - x) ? b : a));
    add({ kind: 'joist', ply: 2, role: 'butt-pair', a: [near + 50, 0], b: [near + 50, D] });
  }
  add({ kind: 'rim', ply: 1, role: 'edge', a: [0, 0], b: [W, 0] });
  add({ kind: 'rim', ply: 1, role: 'edge', a: [0, D], b: [W, D] });
  // Noggin rows at mid-span of each bay.
  for (let i = 0; i < rowsY.length - 1; i++) {
    const y = (rowsY[i] + rowsY[i + 1]) / 2;
    for (let k = 0; k < xs.length - 1; k++)
      add({
        kind: 'noggin',
        ply: 1,
        role: 'blocking',
        a: [xs[k] + 25, y],
        b: [xs[k + 1] - 25, y],
      });
  }
  // Two pads and a post to show the symbols.
  add({ kind: 'pad', ply: 1, a: [W, D / 2], b: [W, D / 2], heightMm: 450 });
  add({ kind: 'pad', ply: 1, a: [0, D / 2], b: [0, D / 2], heightMm: 450 });
  add({ kind: 'post', ply: 1, a: [W, 0], b: [W, 0], heightMm: 700 });
  const boards: BoardPiece[] = [];
  const courses = Math.ceil(D / 145);
  for (let c = 0; c < courses; c++) {
    const y = c * 145 + 70;
    const cut = c % 2 ? 4800 : Math.min(W, 2400);
    const pts: Pt[] = [
      [0, y],
      [Math.min(cut, W), y],
    ];
    boards.push({
      id: `b${c}a`,
      course: c,
      a: pts[0],
      b: pts[1],
      lengthMm: pts[1][0],
      border: false,
    });
    if (cut < W)
      boards.push({
        id: `b${c}b`,
        course: c,
        a: [cut, y],
        b: [W, y],
        lengthMm: W - cut,
        border: false,
      });
  }
  const plan: FramePlan = {
    version: 1,
    members,
    boards,
    flags: [
      {
        code: 'guard-required',
        severity: 'warning',
        at: [W, 0],
        message:
          'Check whether a guard is needed where the deck edge stands high above the ground.',
        source: 'Approved Document K para 1.41',
      },
      {
        code: 'joist-cantilever',
        severity: 'error',
        at: [W - 25, D],
        valueMm: 150,
        limitMm: 100,
        message: 'Joist overhang 150 mm is over the 100 mm limit.',
        source: 'common practice',
      },
    ],
    supportRows,
    steps: withSteps
      ? [
          {
            index: 0,
            outline: [
              [2000, 0],
              [3500, 0],
              [3500, -870],
              [2000, -870],
            ],
            count: 2,
            riseMm: 150,
            goingMm: 435,
            treadBoards: 3,
            levelsMm: [150, 300],
          },
        ]
      : [],
    joins: [],
    buttJoints: [],
    quantities: [
      {
        key: 'joist-3000',
        label: 'Joist 125 x 50 mm, 3.0 m',
        unit: 'length',
        qty: 34,
        stockMm: 3000,
        basis: 'cut list',
      },
      {
        key: 'board-4800',
        label: 'Board 140 mm, 4.8 m',
        unit: 'length',
        qty: 56,
        stockMm: 4800,
        basis: 'cut list',
      },
      {
        key: 'clips',
        label: 'Hidden clips',
        unit: 'each',
        qty: 420,
        basis: 'one per board/joist crossing (common practice)',
      },
      {
        key: 'concrete',
        label: 'Concrete',
        unit: 'm3',
        qty: 0.35,
        basis: '100 mm bed under each row',
      },
    ],
    cutList: {
      joists: {
        count: 3,
        lowerBound: 3,
        optimal: true,
        stock: [
          { stockMm: 3000, cuts: [1485, 1485], offcutMm: 24 },
          { stockMm: 3000, cuts: [1485, 1485], offcutMm: 24 },
          { stockMm: 3000, cuts: [2667], offcutMm: 330 },
        ],
      },
      boards: {
        count: 2,
        lowerBound: 2,
        optimal: true,
        stock: [
          { stockMm: 4800, cuts: [2400, 2397], offcutMm: 0 },
          { stockMm: 4800, cuts: [1200], offcutMm: 3597 },
        ],
      },
    },
    outline: design.outline as Pt[],
    bounds: { minX: 0, minY: withSteps ? -870 : 0, maxX: W, maxY: D },
    areaM2: (W * D) / 1e6,
  };
  return { plan, design };
}
