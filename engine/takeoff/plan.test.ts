// Take-off on real layout output: the golden fixture designs and random designs from the engine's test decks.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutFrame, parseDesign, planFrame } from '../index';
import type { DesignDocument } from '../schema';
import { benchDeck, designArb } from '../testing/decks';
import type { FramePlanCore, Member } from '../types';
import { crossingAlong, segLength, sinBetween } from './geometry';
import { countClips, takeOff } from './index';
import { DEFAULT_RULES } from './rules';

const FIXTURES = join(__dirname, '..', 'fixtures');
const designs: [string, DesignDocument][] = readdirSync(FIXTURES)
  .filter((f) => f.endsWith('.design.json'))
  .map((f) => {
    const parsed = parseDesign(JSON.parse(readFileSync(join(FIXTURES, f), 'utf8')));
    if (!parsed.ok) throw new Error(`${f}: ${JSON.stringify(parsed.errors)}`);
    return [f.replace('.design.json', ''), parsed.design];
  });

const sorted = (xs: number[]) => xs.map((x) => Math.round(x * 1000) / 1000).sort((a, b) => a - b);

/** Clip crossings counted the slow way (every board against every joist line), to check the grid. */
function bruteCrossings(plan: FramePlanCore, design: DesignDocument): number {
  const field = plan.boards.filter((b) => !b.border);
  const lines = new Map<string, Member[]>();
  for (const m of plan.members)
    if (m.kind === 'joist' || m.kind === 'rim') {
      const k = m.lineId ?? m.id;
      lines.set(k, [...(lines.get(k) ?? []), m]);
    }
  let n = 0;
  for (const members of lines.values()) {
    const seen: number[] = [];
    const o = members[0].a;
    const u = [
      (members[0].b[0] - o[0]) / segLength(members[0].a, members[0].b),
      (members[0].b[1] - o[1]) / segLength(members[0].a, members[0].b),
    ];
    for (const m of members)
      for (const b of field) {
        if (sinBetween(b.a, b.b, m.a, m.b) < 0.3) continue;
        const t = crossingAlong(
          b.a,
          b.b,
          m.a,
          m.b,
          design.joist.widthMm / 4,
          design.board.widthMm / 2,
        );
        if (t === null) continue;
        const L = segLength(m.a, m.b);
        const x = m.a[0] + ((m.b[0] - m.a[0]) * t) / L;
        const y = m.a[1] + ((m.b[1] - m.a[1]) * t) / L;
        const s = (x - o[0]) * u[0] + (y - o[1]) * u[1];
        if (!seen.some((v) => Math.abs(v - s) <= 1)) seen.push(s);
      }
    n += seen.length;
  }
  return n;
}

/** Invariants every take-off must keep, whatever the design. */
function checkTakeOff(plan: FramePlanCore, design: DesignDocument) {
  const { quantities, cutList } = takeOff(plan, design);
  // Every ply of every joist-section member is cut exactly once (or flagged too long).
  const joistPieces = plan.members
    .filter((m) => m.kind === 'joist' || m.kind === 'rim' || m.kind === 'noggin')
    .flatMap((m) => Array<number>(m.ply).fill(m.lengthMm));
  expect(
    sorted(cutList.joists.stock.flatMap((s) => s.cuts).concat(cutList.joists.tooLong ?? [])),
  ).toEqual(sorted(joistPieces));
  const boardCuts = cutList.boards.stock
    .flatMap((s) => s.cuts)
    .concat(cutList.borderBoards?.stock.flatMap((s) => s.cuts) ?? [], cutList.boards.tooLong ?? []);
  expect(sorted(boardCuts)).toEqual(sorted(plan.boards.map((b) => b.lengthMm)));
  for (const r of [cutList.joists, cutList.boards])
    expect(r.count).toBeGreaterThanOrEqual(r.lowerBound);
  // Lines: unique keys, positive finite quantities, each with its basis.
  expect(new Set(quantities.map((q) => q.key)).size).toBe(quantities.length);
  for (const q of quantities) {
    expect(Number.isFinite(q.qty) && q.qty > 0).toBe(true);
    expect(q.basis.length).toBeGreaterThan(10);
  }
  // Clips: one starter and one finishing per run, so starter + middle = crossings.
  const c = countClips(plan, design);
  expect(c.starter).toBe(c.finishing);
  expect(c.starter + c.middle).toBe(c.crossings);
  // Blocks: each blocks row's length / 440 rounded up, plus one a pad (common practice).
  const rowBlocks = plan.supportRows
    .filter((r) => r.kind === 'blocks')
    .reduce(
      (a, r) =>
        a + Math.max(1, Math.ceil(segLength(r.a, r.b) / DEFAULT_RULES.blockLengthMm - 1e-9)),
      0,
    );
  const pads = plan.members.filter((m) => m.kind === 'pad').length;
  const blocks = quantities.find((q) => q.key === 'blocks');
  expect(blocks?.qty ?? 0).toBe(rowBlocks + pads);
  return { quantities, cutList, clips: c };
}

describe('takeOff on the golden fixture designs (real layout output)', () => {
  it.each(designs)('%s', (_name, design) => {
    const plan = layoutFrame(design);
    const { clips } = checkTakeOff(plan, design);
    expect(clips.crossings).toBe(bruteCrossings(plan, design));
  });

  it('planFrame carries exactly this take-off', () => {
    const [, design] = designs[0];
    const plan = planFrame(design);
    const { quantities, cutList, ...core } = plan;
    const again = takeOff(core, design);
    expect(quantities).toEqual(again.quantities);
    expect(cutList).toEqual(again.cutList);
  });

  it('the 30 x 20 m L-shaped bench deck: cut lists within one bar of their lower bounds', () => {
    const design = benchDeck();
    const plan = layoutFrame(design);
    const { cutList } = checkTakeOff(plan, design);
    expect(cutList.joists.count - cutList.joists.lowerBound).toBeLessThanOrEqual(1);
    expect(cutList.boards.count - cutList.boards.lowerBound).toBeLessThanOrEqual(1);
  });
});

describe('takeOff on random designs (property test over the engine test decks)', () => {
  it('keeps its invariants and its grid agrees with the slow count', () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const plan = layoutFrame(design);
        const { clips } = checkTakeOff(plan, design);
        expect(clips.crossings).toBe(bruteCrossings(plan, design));
      }),
      { numRuns: 40 },
    );
  }, 120_000);
});
