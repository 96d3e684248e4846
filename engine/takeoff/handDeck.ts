// A hand-built frame plan of the 6 m x 4 m example deck, for take-off tests and the bench; built by rule, not by the layout engine. Pure data; touches nothing outside engine/.
import { exampleDesign, type DesignDocument } from '../schema';
import type { BoardPiece, FramePlanCore, Member, Pt, SupportRowPlan } from '../types';

/**
 * The example deck framed by hand: boards along x, joists along y between two rims (y = 25 and
 * y = 3975, each rim two 3000 mm pieces), joist lines at 400 mm centres with the outer joists at
 * x = 25 and 5975; butt joints alternate course to course at x = 4800 and x = 1200, each over a
 * pair of joists 52 mm apart (centres at joint -/+ 26) in place of the ordinary line there.
 * Support rows of blocks at y = 100, 1400, 2700, 3900 (spans 1300 mm); every joist line is two
 * pieces joined over the row at y = 2700 (50-2700 and 2700-3950). One noggin row at mid-span of each
 * span (each over 1200 mm). 27 board courses at 145 mm pitch (140 + 5 gap), no border course.
 */
export function handDeck(opts: { borderCourse?: boolean; posts?: boolean } = {}): {
  plan: FramePlanCore;
  design: DesignDocument;
  joistXs: number[];
} {
  const design = exampleDesign();
  design.borderCourses = opts.borderCourse ? 1 : 0;
  const members: Member[] = [];
  const joistXs = [25, 400, 800, 1174, 1226];
  for (let x = 1600; x <= 4400; x += 400) joistXs.push(x);
  joistXs.push(4774, 4826, 5200, 5600, 5975);
  const pairs = new Set([1226, 4826]);
  joistXs.forEach((x, i) => {
    const role = x === 25 || x === 5975 ? 'edge' : pairs.has(x) ? 'butt-pair' : 'field';
    const lineId = `L${i}`;
    members.push({
      id: `j${i}a`,
      kind: 'joist',
      ply: 1,
      a: [x, 50],
      b: [x, 2700],
      lengthMm: 2650,
      role,
      lineId,
    });
    members.push({
      id: `j${i}b`,
      kind: 'joist',
      ply: 1,
      a: [x, 2700],
      b: [x, 3950],
      lengthMm: 1250,
      role,
      lineId,
    });
  });
  for (const y of [25, 3975]) {
    members.push({
      id: `r${y}a`,
      kind: 'rim',
      ply: 1,
      a: [0, y],
      b: [3000, y],
      lengthMm: 3000,
      lineId: `R${y}`,
    });
    members.push({
      id: `r${y}b`,
      kind: 'rim',
      ply: 1,
      a: [3000, y],
      b: [6000, y],
      lengthMm: 3000,
      lineId: `R${y}`,
    });
  }
  // Noggins at mid-span of the three spans, in every gap between neighbouring joist lines (none inside a pair).
  let n = 0;
  for (const y of [750, 2050, 3300])
    for (let i = 0; i + 1 < joistXs.length; i++) {
      const x0 = joistXs[i];
      const x1 = joistXs[i + 1];
      if (x1 - x0 < 100) continue;
      members.push({
        id: `n${n++}`,
        kind: 'noggin',
        ply: 1,
        a: [x0 + 25, y],
        b: [x1 - 25, y],
        lengthMm: x1 - x0 - 50,
        role: 'blocking',
      });
    }
  const supportRows: SupportRowPlan[] = [100, 1400, 2700, 3900].map((y, i) => ({
    id: `s${i}`,
    a: [0, y] as Pt,
    b: [6000, y] as Pt,
    kind: 'blocks' as const,
    placed: true,
  }));
  if (opts.posts)
    for (const [i, x] of [25, 5975].entries())
      members.push({
        id: `p${i}`,
        kind: 'post',
        ply: 1,
        a: [x, 3900],
        b: [x, 3900],
        lengthMm: 0,
        heightMm: 900,
      });
  const boards: BoardPiece[] = [];
  for (let c = 0; c < 27; c++) {
    const y = 72.5 + 145 * c;
    const border = !!opts.borderCourse && (c === 0 || c === 26);
    if (border) {
      boards.push({ id: `b${c}`, course: c, a: [0, y], b: [3000, y], lengthMm: 3000, border });
      boards.push({ id: `b${c}'`, course: c, a: [3000, y], b: [6000, y], lengthMm: 3000, border });
      continue;
    }
    const joint = c % 2 === 0 ? 4800 : 1200;
    boards.push({
      id: `b${c}`,
      course: c,
      a: [0, y],
      b: [joint - 2, y],
      lengthMm: joint - 2,
      border,
    });
    boards.push({
      id: `b${c}'`,
      course: c,
      a: [joint + 2, y],
      b: [6000, y],
      lengthMm: 6000 - joint - 2,
      border,
    });
  }
  const outline: Pt[] = [
    [0, 0],
    [6000, 0],
    [6000, 4000],
    [0, 4000],
  ];
  const plan: FramePlanCore = {
    version: 1,
    members,
    boards,
    flags: [],
    supportRows,
    steps: [],
    joins: [],
    buttJoints: [],
    outline,
    bounds: { minX: 0, minY: 0, maxX: 6000, maxY: 4000 },
    areaM2: 24,
  };
  return { plan, design, joistXs };
}
