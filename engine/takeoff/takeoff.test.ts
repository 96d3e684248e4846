import { describe, expect, it } from 'vitest';
import { handDeck } from './handDeck';
import { countClips, countScrews, takeOff } from './index';
import { DEFAULT_RULES } from './rules';

const line = (q: ReturnType<typeof takeOff>['quantities'], key: string) => {
  const l = q.find((x) => x.key === key);
  if (!l) throw new Error(`no line ${key}; have ${q.map((x) => x.key).join(', ')}`);
  return l;
};

describe('takeOff on the hand-built 6 x 4 m deck', () => {
  const { plan, design, joistXs } = handDeck();
  const { quantities, cutList } = takeOff(plan, design);

  it('cuts every joist, rim and noggin piece from joist stock, and every board piece from board stock', () => {
    const joistPieces = plan.members.filter((m) =>
      ['joist', 'rim', 'noggin'].includes(m.kind),
    ).length;
    const cut = cutList.joists.stock.flatMap((s) => s.cuts);
    expect(cut.length).toBe(joistPieces);
    expect(cut.sort()).toEqual(
      plan.members
        .filter((m) => ['joist', 'rim', 'noggin'].includes(m.kind))
        .map((m) => m.lengthMm)
        .sort(),
    );
    expect(cutList.boards.stock.flatMap((s) => s.cuts).length).toBe(plan.boards.length);
    expect(line(quantities, 'joists-3000').qty).toBe(cutList.joists.count);
    expect(line(quantities, 'boards-4800').qty).toBe(cutList.boards.count);
    // 27 pieces of 4798 mm need a bar each; 27 of 1198 mm go three to a bar (four need
    // 4 x 1198 + 3 x 3 = 4801 mm): 36 bars, and no plan can do better.
    expect(cutList.boards.count).toBe(36);
    expect(cutList.boards.optimal).toBe(true);
  });

  it('counts clips per joist line: n boards crossing take 1 starter, n - 1 middle, 1 finishing (maker guidance (typical), from memory)', () => {
    const c = countClips(plan, design);
    // Every one of the 18 joist lines is crossed by all 27 courses, in one run.
    expect(joistXs.length).toBe(18);
    expect(c.crossings).toBe(18 * 27);
    expect(c.starter).toBe(18);
    expect(c.finishing).toBe(18);
    expect(c.middle).toBe(18 * 26);
    expect(line(quantities, 'clips-middle').variant).toBe('middle');
  });

  it('counts frame screws by connection (common practice, counts from memory)', () => {
    const s = countScrews(plan, design);
    // Two joist ends per line meet a rim (the join over the row at y = 2700 does not).
    expect(s.joistEnds).toBe(18 * 2 * DEFAULT_RULES.screwsPerJoistEnd);
    // Rims are collinear pieces along y = 25 and y = 3975: no corners in this frame.
    expect(s.rimCorners).toBe(0);
    // 3 noggin rows x 15 gaps (the two pairs have no gap), 2 screws at each end.
    expect(plan.members.filter((m) => m.kind === 'noggin').length).toBe(45);
    expect(s.noggins).toBe(45 * 2 * DEFAULT_RULES.screwsPerNogginEnd);
    // The two butt-pair lines, 2650 + 1250 mm: floor(2650/300)+1 = 9 and floor(1250/300)+1 = 5 screws each.
    expect(s.laminations).toBe(2 * (9 + 5));
    expect(s.posts).toBe(0);
    expect(line(quantities, 'screws-frame').qty).toBe(s.joistEnds + s.noggins + s.laminations);
  });

  it('counts blocks row by row: ceil(6000 / 440) = 14 per row, four rows (common practice, 440 mm block)', () => {
    expect(line(quantities, 'blocks').qty).toBe(4 * 14);
    expect(line(quantities, 'blocks').basis).toContain('s0 14, s1 14, s2 14, s3 14');
  });

  it('works out concrete for block strips: 100 mm bed, 50 mm past the block (common practice)', () => {
    // Each strip (14 x 440 + 100) mm long, (215 + 100) mm wide, 100 mm deep.
    const expected = (4 * (14 * 440 + 100) * 315 * 100) / 1e9;
    expect(line(quantities, 'concrete').qty).toBeCloseTo(expected, 3);
    expect(line(quantities, 'concrete').basis).toContain('200 mm below the block top');
  });

  it('adds membrane overlaps: (24 m2 + 20 m x 0.1 m) x 1500 / 1350 (common practice, 150 mm overlap from memory)', () => {
    expect(line(quantities, 'membrane').qty).toBeCloseTo((26 * 1500) / 1350, 2);
  });

  it('runs fascia round the whole outline when no edge stands against a wall (common practice)', () => {
    expect(line(quantities, 'fascia').qty).toBeCloseTo(20, 6);
  });

  it('drops fascia along a wall support row', () => {
    const { plan: p2, design: d2 } = handDeck();
    p2.supportRows.push({ id: 'w', a: [0, 4000], b: [6000, 4000], kind: 'wall', placed: false });
    expect(line(takeOff(p2, d2).quantities, 'fascia').qty).toBeCloseTo(14, 6);
  });

  it('every line says how it was worked out', () => {
    for (const q of quantities) expect(q.basis.length).toBeGreaterThan(20);
    expect(quantities.every((q) => q.qty > 0)).toBe(true);
  });
});

describe('takeOff variants', () => {
  it('face-screws border boards instead of clipping them, 2 per joist crossed (maker guidance (typical), from memory)', () => {
    const { plan, design } = handDeck({ borderCourse: true });
    const c = countClips(plan, design);
    expect(c.crossings).toBe(18 * 25);
    const s = countScrews(plan, design);
    expect(s.borderFace).toBe(18 * 2 * DEFAULT_RULES.borderScrewsPerCrossing);
  });

  it('packs border boards together with the field boards only when the design chooses one product for both', () => {
    const { plan, design } = handDeck({ borderCourse: true });
    design.products = { board: 'b1', borderBoard: 'b1' };
    const { cutList, quantities } = takeOff(plan, design);
    expect(cutList.borderBoards).toBeUndefined();
    expect(cutList.boards.stock.flatMap((s) => s.cuts).filter((l) => l === 3000)).toHaveLength(4);
    expect(quantities.some((q) => q.key.startsWith('border-boards'))).toBe(false);
  });

  it('packs border boards apart otherwise (usually another product)', () => {
    const { plan, design } = handDeck({ borderCourse: true });
    design.products = { board: 'b1' };
    const { cutList, quantities } = takeOff(plan, design);
    expect(cutList.borderBoards?.stock.flatMap((s) => s.cuts)).toEqual([3000, 3000, 3000, 3000]);
    expect(line(quantities, 'border-boards-4800').qty).toBe(4);
    expect(line(quantities, 'border-boards-4800').product).toBe('borderBoard');
  });

  it('adds posts: height + 600 mm in the ground, 4 screws each, concrete round them (common practice, from memory)', () => {
    const { plan, design } = handDeck({ posts: true });
    const q = takeOff(plan, design).quantities;
    expect(line(q, 'posts-1500').qty).toBe(2);
    expect(line(q, 'posts-1500').pieceMm).toBe(1500);
    expect(countScrews(plan, design).posts).toBe(8);
    const base = (4 * (14 * 440 + 100) * 315 * 100) / 1e9;
    const holes = (2 * (300 * 300 * 700 - 100 * 100 * 600)) / 1e9;
    expect(line(q, 'concrete').qty).toBeCloseTo(base + holes, 3);
  });

  it('lists beam rows by length, every ply', () => {
    const { plan, design } = handDeck();
    plan.members.push({
      id: 'B1',
      kind: 'support',
      ply: 2,
      a: [0, 1400],
      b: [6000, 1400],
      lengthMm: 6000,
      supportKind: 'beam',
    });
    expect(line(takeOff(plan, design).quantities, 'beams').qty).toBe(12);
    expect(takeOff(handDeck().plan, design).quantities.some((q) => q.key === 'beams')).toBe(false);
  });

  it('counts each ply of a laminated member as a piece to cut and screws the plies together', () => {
    const { plan, design } = handDeck();
    const edge = plan.members.find((m) => m.id === 'j0a')!;
    edge.ply = 3;
    const s = countScrews(plan, design);
    // Two extra faces of 2650 mm: 9 screws each; the end at the rim now has 3 plies to fix.
    expect(s.laminations).toBe(2 * (9 + 5) + 2 * 9);
    expect(s.joistEnds).toBe(18 * 2 * 2 + 2 * 2);
    const { cutList } = takeOff(plan, design);
    expect(cutList.joists.stock.flatMap((x) => x.cuts).filter((l) => l === 2650).length).toBe(
      18 + 2,
    );
  });
});
