// Worked examples of planFrame with counts derived by hand, each rule's source named beside it.
import { describe, expect, it } from 'vitest';
import { exampleDesign, migrateDesign, parseDesign, planFrame, type Member } from './index';
import { deck, lShape, rect } from './testing/decks';

const verticalX = (ms: Member[]) =>
  [
    ...new Set(
      ms.filter((m) => Math.abs(m.a[0] - m.b[0]) < 1e-6).map((m) => Math.round(m.a[0] * 10) / 10),
    ),
  ].sort((a, b) => a - b);

describe('the 6 m x 4 m deck of PRODUCT.md, no border course', () => {
  const design = { ...exampleDesign(), borderCourses: 0 };
  const plan = planFrame(design);
  const joistLike = plan.members.filter((m) => m.kind === 'joist' || m.kind === 'rim');

  it('puts joists at 400 mm centres from the first edge joist (common practice)', () => {
    // Edge joists sit half a joist width (25 mm) inside the two edges that run with the joists:
    // x = 25 and x = 5975. Field joists at 25 + 400k while they stay clear of the far edge joist:
    // k = 1..14 (425 .. 5625; 6025 is past the edge) -> 14 field + 2 edge = 16 joist lines.
    const field = plan.members.filter((m) => m.role === 'field');
    const edge = plan.members.filter((m) => m.role === 'edge');
    expect(verticalX(field)).toEqual(Array.from({ length: 14 }, (_, k) => 25 + 400 * (k + 1)));
    expect(verticalX(edge)).toEqual([25, 5975]);
  });

  it('places four support rows at no more than the 1.5 m joist span (common practice)', () => {
    // Rows under both end rims at y = 25 and 3975: 3950 mm apart. ceil(3950 / 1500) = 3 spans of
    // 1316.7 mm -> two rows between, at 1341.7 and 2658.3. Four rows in all.
    const ys = plan.supportRows.map((r) => r.a[1]).sort((a, b) => a - b);
    expect(ys).toHaveLength(4);
    expect(ys[0]).toBeCloseTo(25, 6);
    expect(ys[1]).toBeCloseTo(25 + 3950 / 3, 6);
    expect(ys[2]).toBeCloseTo(25 + (2 * 3950) / 3, 6);
    expect(ys[3]).toBeCloseTo(3975, 6);
    expect(plan.supportRows.every((r) => r.placed)).toBe(true);
  });

  it('joins each 3.9 m joist once, over the furthest row 3 m stock reaches (common practice)', () => {
    // A field joist runs between the end rims' inner faces: 50 .. 3950 = 3900 mm > 3000 mm stock.
    // From y = 50 the rows in reach are 1341.7 and 2658.3; the furthest is 2658.3, so the pieces
    // are 2608.3 and 1291.7 and the join is over that row.
    const line = plan.members.filter((m) => m.role === 'field' && m.a[0] === 425);
    expect(line.map((m) => m.lengthMm)).toEqual([
      expect.closeTo(2608.333, 2),
      expect.closeTo(1291.667, 2),
    ]);
    const join = plan.joins.find((j) => j.lineId === line[0].lineId)!;
    expect(join.onSupport).toBe(true);
    expect(join.at[1]).toBeCloseTo(25 + (2 * 3950) / 3, 6);
    expect(joistLike.every((m) => m.lengthMm <= 3000 + 1e-9)).toBe(true);
  });

  it('staggers board butt joints course to course, each on a pair (common practice)', () => {
    // 4000 / (140 + 5) = 27.6 -> 28 courses, the last one ripped. Each 6000 mm course needs one
    // joint. The first joint is over the furthest joist a 4800 mm board reaches from x = 0 with
    // the pair on its right: joist 4425, joint at its face x = 4450 (piece 4448 mm). The next
    // course must keep 800 mm clear (minStaggerMm) and use another joist: 3625 -> joint at 3650.
    const courses = new Set(plan.boards.map((b) => b.course));
    expect(courses.size).toBe(28);
    expect(plan.boards).toHaveLength(56);
    const byCourse = plan.buttJoints.map((j) => [j.course, j.at[0]]);
    expect(byCourse.slice(0, 4)).toEqual([
      [0, 4450],
      [1, 3650],
      [2, 4450],
      [3, 3650],
    ]);
    expect(plan.buttJoints.every((j) => j.onPair)).toBe(true);
    // Pair joists go beside joists 3625 and 4425 (at 3675 and 4475), end rim to end rim, each
    // cut at the same row as its neighbour: 2 lines x 2 pieces, ply 2.
    const pairs = plan.members.filter((m) => m.role === 'butt-pair');
    expect(verticalX(pairs)).toEqual([3675, 4475]);
    expect(pairs).toHaveLength(4);
    expect(pairs.every((m) => m.ply === 2)).toBe(true);
    expect(plan.boards.every((b) => b.lengthMm <= 4800)).toBe(true);
  });

  it('puts a noggin at mid-span of every span over 1.2 m (common practice default)', () => {
    // Each joist has three spans of 1316.7 mm (> 1200) -> one noggin in each, between it and its
    // right-hand neighbour. 18 lines (16 + 2 pairs) give 17 neighbour gaps; the two joist/pair
    // gaps are touching (no room), leaving 15 gaps x 3 = 45 noggins.
    const noggins = plan.members.filter((m) => m.kind === 'noggin');
    expect(noggins).toHaveLength(45);
    expect(noggins.every((n) => Math.abs(n.lengthMm - 350) < 1e-6 || n.lengthMm > 0)).toBe(true);
  });

  it('raises no check on this standard deck but keeps the standing caution', () => {
    expect(plan.flags.map((f) => f.code)).toEqual(['caution']);
    expect(plan.flags[0].severity).toBe('info');
    expect(plan.flags[0].message).toMatch(/guidance/);
  });
});

describe('border course, triple joists', () => {
  it('adds two border joists beside each edge joist where a border course runs with the joists', () => {
    // Common practice: a triple joist along each end where the border runs parallel to the
    // joists. Field boards end in the gap after one border board: 140 + 5/2 = 142.5 mm in; two
    // joists straddle that line at 117.5 and 167.5 mm, and with the edge joist make the triple.
    const plan = planFrame(exampleDesign());
    const border = plan.members.filter((m) => m.role === 'border');
    expect(verticalX(border)).toEqual([117.5, 167.5, 5832.5, 5882.5]);
    expect(border.every((m) => m.ply === 3)).toBe(true);
    expect(plan.members.filter((m) => m.role === 'edge').every((m) => m.ply === 3)).toBe(true);
    expect(plan.boards.filter((b) => b.border).length).toBeGreaterThanOrEqual(4);
    expect(plan.flags.filter((f) => f.severity === 'error')).toEqual([]);
  });
});

describe('user support rows and checks', () => {
  it('honours the rows the user placed and flags spans and overhangs beyond them', () => {
    // One row at y = 2000 under a 6 x 4 deck: the joists reach 1950 mm past it each way.
    // Cantilever limit 100 mm (common practice setting) -> every joist line is flagged.
    const plan = planFrame(
      deck(rect(6000, 4000), { supports: [{ a: [0, 2000], b: [6000, 2000], kind: 'blocks' }] }),
    );
    expect(plan.supportRows).toHaveLength(1);
    expect(plan.supportRows[0].placed).toBe(false);
    const over = plan.flags.filter((f) => f.code === 'joist-cantilever');
    expect(over.length).toBeGreaterThanOrEqual(2 * 14);
    expect(over.every((f) => f.valueMm! > 100 && f.limitMm === 100 && f.memberId)).toBe(true);
    expect(over[0].source).toBe('common practice');
  });

  it('flags a joist span over the limit when the user leaves out the middle rows', () => {
    // Rows only under the end rims, 3950 mm apart > 1500 mm.
    const plan = planFrame(
      deck(rect(6000, 4000), {
        supports: [
          { a: [0, 25], b: [6000, 25], kind: 'blocks' },
          { a: [0, 3975], b: [6000, 3975], kind: 'blocks' },
        ],
      }),
    );
    const spans = plan.flags.filter((f) => f.code === 'joist-span');
    expect(spans.length).toBeGreaterThanOrEqual(16);
    expect(spans[0].valueMm).toBeCloseTo(3950, 0);
    expect(spans[0].limitMm).toBe(1500);
    // 3900 mm joists on 3 m stock with nothing between the ends: the join is off support.
    expect(plan.flags.some((f) => f.code === 'joist-join-off-support')).toBe(true);
  });

  it('flags board spans when the centres are wider than the board allows', () => {
    // 600 mm centres under a board rated for 400 mm (common practice: 400 mm under composite).
    const plan = planFrame(deck(rect(3000, 2000), { joistCentresMm: 600 }));
    const f = plan.flags.filter((x) => x.code === 'board-span');
    expect(f.length).toBeGreaterThan(0);
    expect(f.every((x) => x.valueMm! > 400 && x.limitMm === 400)).toBe(true);
  });

  it('uses posts instead of pads and beams instead of block rows from the post height', () => {
    const plan = planFrame(deck(rect(6000, 4000), { heightMm: 900, postsFromHeightMm: 600 }));
    expect(plan.supportRows.every((r) => r.kind === 'beam')).toBe(true);
    const posts = plan.members.filter((m) => m.kind === 'post');
    // Each beam row 6000 mm long gets posts at no more than 1500 mm: 5 posts a row, 4 rows.
    expect(posts).toHaveLength(20);
    expect(posts.every((p) => p.heightMm === 900)).toBe(true);
  });
});

describe('angled boards and shapes', () => {
  it('runs joists at 45 degrees when boards run at 45 degrees, within the outline', () => {
    const plan = planFrame(deck(rect(6000, 4000), { boardAngleDeg: 45 }));
    const joists = plan.members.filter((m) => m.role === 'field');
    expect(joists.length).toBeGreaterThan(10);
    for (const j of joists) {
      const ang = (Math.atan2(j.b[1] - j.a[1], j.b[0] - j.a[0]) * 180) / Math.PI;
      // Boards at 45 degrees, joists across them at 135 degrees.
      expect(Math.abs(((ang + 360) % 180) - 135)).toBeLessThan(1e-6);
    }
    for (const b of plan.boards) {
      const ang = (Math.atan2(b.b[1] - b.a[1], b.b[0] - b.a[0]) * 180) / Math.PI;
      expect(Math.abs(((ang + 360) % 180) - 45)).toBeLessThan(1e-6);
    }
    // Every edge of a 45-degree deck crosses the joists at an angle: its rims stand on pads.
    expect(plan.members.some((m) => m.kind === 'pad')).toBe(true);
  });

  it('frames an L-shaped deck bigger than the stock lengths without errors', () => {
    const plan = planFrame(deck(lShape(12_000, 9000, 5000, 4000)));
    expect(plan.flags.filter((f) => f.severity === 'error')).toEqual([]);
    expect(plan.areaM2).toBeCloseTo(12 * 4 + 5 * 5, 6);
    expect(plan.joins.length).toBeGreaterThan(0);
    expect(plan.joins.every((j) => j.onSupport)).toBe(true);
  });

  it('flags an outline that crosses itself instead of framing it', () => {
    const plan = planFrame(
      deck([
        [0, 0],
        [4000, 4000],
        [4000, 0],
        [0, 4000],
      ]),
    );
    expect(plan.members).toEqual([]);
    expect(plan.flags[0].code).toBe('outline-invalid');
    expect(plan.flags.some((f) => f.code === 'caution')).toBe(true);
  });
});

describe('steps and guards', () => {
  const withSteps = (heightMm: number, codeBasis: 'uk' | 'us', count = 2) =>
    planFrame(
      deck(rect(6000, 4000), {
        heightMm,
        codeBasis,
        steps: [{ edge: 0, offsetMm: 1000, widthMm: 2000, count }],
      }),
    );

  it('splits the rise equally between ground and deck, going from the tread boards', () => {
    // 2 steps under a 450 mm deck make 3 equal rises of 150 mm (PRODUCT.md: with one step, the
    // top sits midway). Going = 3 boards x (140 + 5) = 435 mm.
    const plan = withSteps(450, 'us');
    const s = plan.steps[0];
    expect(s.count).toBe(2);
    expect(s.riseMm).toBeCloseTo(150, 9);
    expect(s.levelsMm).toEqual([150, 300]);
    expect(s.goingMm).toBe(435);
    expect(plan.boards.filter((b) => b.step === 0)).toHaveLength(6);
    // Framed at the 300 mm stair centres (common practice: closer than the deck's 400 mm):
    // 2000 mm wide -> joists at 25, 325, ... 1825 and one at 1975 = 8 per step.
    const stairJoists = plan.members.filter((m) => m.role === 'stair' && m.kind === 'joist');
    expect(stairJoists).toHaveLength(16);
    // The flight sits outside the deck edge y = 0.
    expect(Math.min(...s.outline.map((p) => p[1]))).toBeCloseTo(-870, 6);
    // IRC R311.7.5: rise 150 <= 196 mm, tread 435 >= 254 mm: no stair flags on a US basis.
    expect(plan.flags.filter((f) => f.code.startsWith('stair-'))).toEqual([]);
  });

  it('checks the flight against Approved Document K Table 1.1 on a UK basis', () => {
    // ADK Table 1.1 private stair: going 220-300 mm, 2R + G 550-700 mm. 435 mm going and
    // 2 x 150 + 435 = 735 mm are both over.
    const plan = withSteps(450, 'uk');
    const codes = plan.flags.filter((f) => f.code.startsWith('stair-')).map((f) => f.code);
    expect(codes).toContain('stair-going');
    expect(codes).toContain('stair-2r-plus-g');
    const at = plan.flags.find((f) => f.code === 'stair-going')!.at;
    expect(at).toEqual([2000, 0]);
  });

  it('flags a rise over the limit when too few steps are given (IRC R311.7.5: 196 mm)', () => {
    const plan = withSteps(900, 'us', 1);
    const rise = plan.flags.find((f) => f.code === 'stair-rise')!;
    expect(rise.valueMm).toBeCloseTo(450, 6);
    expect(rise.limitMm).toBeCloseTo(7.75 * 25.4, 6); // 7 3/4 in
  });

  it('warns that a guard is needed above 600 mm (ADK para 1.41) and 30 in (IRC R312.1.1)', () => {
    const guards = (h: number, basis: 'uk' | 'us') =>
      planFrame(deck(rect(6000, 4000), { heightMm: h, codeBasis: basis })).flags.filter(
        (f) => f.code === 'guard-required',
      );
    expect(guards(600, 'uk')).toEqual([]);
    expect(guards(601, 'uk')).toHaveLength(4); // one at the middle of each edge
    expect(guards(700, 'us')).toEqual([]); // 700 mm < 762 mm
    expect(guards(800, 'us')).toHaveLength(4);
  });
});

describe('parseDesign and migrateDesign', () => {
  it('returns located zod messages for bad input', () => {
    const r = parseDesign({ version: 1, outline: [[0, 0]], boardAngleDeg: 'x' });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      const paths = r.errors.map((e) => e.path);
      expect(paths).toContain('outline');
      expect(paths).toContain('boardAngleDeg');
      expect(paths).toContain('joist');
    }
  });

  it('fills defaults for a bare version 1 document', () => {
    const r = parseDesign({ ...exampleDesign(), codeBasis: undefined, stairCentresMm: undefined });
    expect(r.ok && r.design.stairCentresMm).toBe(300);
  });

  it('runs ordered migrators by version and refuses newer documents', () => {
    const migrators = [
      { from: 1, describe: 'one to two', up: (d: Record<string, unknown>) => ({ ...d, b: 2 }) },
      { from: 2, describe: 'two to three', up: (d: Record<string, unknown>) => ({ ...d, c: 3 }) },
    ];
    const r = migrateDesign({ version: 1, a: 1 }, migrators, 3);
    expect(r).toEqual({
      ok: true,
      doc: { version: 3, a: 1, b: 2, c: 3 },
      from: 1,
      applied: ['one to two', 'two to three'],
    });
    expect(migrateDesign({ version: 4 }, migrators, 3).ok).toBe(false);
    expect(migrateDesign({ version: 1 }, [], 2).ok).toBe(false);
    expect(migrateDesign([1, 2]).ok).toBe(false);
    expect(migrateDesign({ version: 1, x: 1 })).toEqual({
      ok: true,
      doc: { version: 1, x: 1 },
      from: 1,
      applied: [],
    });
  });
});
