// Steps on a stretch of the outline edge: flight footprint, levels, step frames and tread boards. Pure: engine only.
import type { DesignDocument, StepInput } from '../schema';
import type { BoardPiece, Member, Pt, StepPlan } from '../types';
import { pointInRing } from '../geometry';

/** One flight of steps laid out: its plan, frame members, tread boards and flag point. */
export interface StepLayout {
  plan: StepPlan;
  members: Member[];
  boards: BoardPiece[];
  /** Midpoint of the flight on the deck edge: where its flags sit. */
  at: Pt;
}

/**
 * Lays out one flight in world millimetres. Rises are split equally between ground and deck
 * (count steps make count + 1 rises); the going is the tread boards and their gaps. Returns null
 * when the edge does not exist or the stretch is too short for a step.
 */
export function layFlight(
  design: DesignDocument,
  worldRing: Pt[],
  step: StepInput,
  index: number,
): StepLayout | null {
  const pts = design.outline as Pt[];
  if (step.edge >= pts.length) return null;
  const a = pts[step.edge];
  const b = pts[(step.edge + 1) % pts.length];
  const L = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (L < 1) return null;
  const u: Pt = [(b[0] - a[0]) / L, (b[1] - a[1]) / L];
  let out: Pt = [u[1], -u[0]];
  const mid: Pt = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  if (pointInRing([mid[0] + out[0], mid[1] + out[1]], worldRing)) out = [-out[0], -out[1]];
  const start = Math.min(step.offsetMm, L);
  const width = step.widthMm > 0 ? Math.min(step.widthMm, L - start) : L - start;
  const bw = design.board.widthMm;
  const gap = design.board.gapMm;
  const w = design.joist.widthMm;
  if (width < 2 * w + bw) return null;
  const n = step.count;
  const rise = design.heightMm / (n + 1);
  const going = step.treadBoards * (bw + gap);
  const p0: Pt = [a[0] + u[0] * start, a[1] + u[1] * start];
  const at = (along: number, outward: number): Pt => [
    p0[0] + u[0] * along + out[0] * outward,
    p0[1] + u[1] * along + out[1] * outward,
  ];
  const members: Member[] = [];
  const boards: BoardPiece[] = [];
  const sc = design.stairCentresMm;
  const tag = `T${index + 1}`;
  const seg = (id: string, kind: Member['kind'], p: Pt, q: Pt, extra: Partial<Member>): Member => ({
    id,
    kind,
    ply: 1,
    a: p,
    b: q,
    lengthMm: Math.hypot(q[0] - p[0], q[1] - p[1]),
    step: index,
    ...extra,
  });
  const levels: number[] = [];
  for (let j = 1; j <= n; j++) {
    const level = rise * j;
    levels.push(level);
    const d0 = (n - j) * going;
    const d1 = d0 + going;
    const sid = `${tag}.${j}`;
    members.push(
      seg(`${sid}.R1`, 'rim', at(0, d0 + w / 2), at(width, d0 + w / 2), { role: 'stair' }),
    );
    members.push(
      seg(`${sid}.R2`, 'rim', at(0, d1 - w / 2), at(width, d1 - w / 2), { role: 'stair' }),
    );
    const xs: number[] = [];
    for (let x = w / 2; x < width - w; x += sc) xs.push(x);
    xs.push(width - w / 2);
    xs.forEach((x, k) => {
      members.push(
        seg(`${sid}.J${k + 1}`, 'joist', at(x, d0 + w), at(x, d1 - w), { role: 'stair' }),
      );
    });
    for (const x of [w / 2, width - w / 2]) {
      const p = at(x, d1 - w / 2);
      members.push({
        ...seg(`${sid}.P${x < width / 2 ? 1 : 2}`, 'pad', p, p, {}),
        lengthMm: 0,
        heightMm: level,
      });
    }
    const pieces = Math.max(1, Math.ceil(width / design.board.stockMm - 1e-9));
    for (let q = 0; q < step.treadBoards; q++) {
      const d = d0 + gap / 2 + bw / 2 + q * (bw + gap);
      for (let k = 0; k < pieces; k++) {
        const s = (width * k) / pieces + (k > 0 ? design.board.endGapMm / 2 : 0);
        const e = (width * (k + 1)) / pieces - (k + 1 < pieces ? design.board.endGapMm / 2 : 0);
        boards.push({
          id: `${sid}.B${q + 1}.${k + 1}`,
          course: q,
          a: at(s, d),
          b: at(e, d),
          lengthMm: e - s,
          border: false,
          step: index,
        });
      }
    }
  }
  const depth = n * going;
  return {
    plan: {
      index,
      outline: [at(0, 0), at(width, 0), at(width, depth), at(0, depth)],
      count: n,
      riseMm: rise,
      goingMm: going,
      treadBoards: step.treadBoards,
      levelsMm: levels,
    },
    members,
    boards,
    at: at(width / 2, 0),
  };
}
