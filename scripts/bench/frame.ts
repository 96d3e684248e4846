// Bench section: planFrame on the 30 m x 20 m L-shaped deck with steps, and on growing rectangles.
import { layoutFrame, planFrame, type DesignDocument } from '../../engine/index';
import { benchDeck, deck, rect } from '../../engine/testing/decks';

/** One 60 Hz frame, in milliseconds. */
const FRAME_MS = 1000 / 60;

interface Timing {
  wallMs: number;
  cpuMs: number;
  runs: number;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** Median wall and CPU time per call, after a warm-up, for up to `budgetMs` or `maxRuns` runs. */
function time(f: () => unknown, maxRuns = 60, budgetMs = 3000): Timing {
  for (let i = 0; i < 10; i++) f();
  const wall: number[] = [];
  const cpu: number[] = [];
  const start = performance.now();
  while (wall.length < maxRuns && (wall.length < 5 || performance.now() - start < budgetMs)) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    f();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wallMs: median(wall), cpuMs: median(cpu), runs: wall.length };
}

const fmt = (t: Timing) =>
  `median ${t.wallMs.toFixed(2)} ms wall (${(t.wallMs / FRAME_MS).toFixed(2)} frame), ` +
  `${t.cpuMs.toFixed(2)} ms CPU (${(t.cpuMs / FRAME_MS).toFixed(2)} frame), ${t.runs} runs`;

function area(d: DesignDocument): number {
  const o = d.outline;
  let s = 0;
  for (let i = 0; i < o.length; i++) {
    const a = o[i];
    const b = o[(i + 1) % o.length];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return Math.abs(s) / 2 / 1e6;
}

/** Prints the frame engine's timings (target: at most 0.25 of a 60 Hz frame for the L deck). */
export function run(): void {
  const L = benchDeck();
  const plan = layoutFrame(L);
  console.log(
    `30 m x 20 m L deck with steps: ${area(L).toFixed(0)} m2, ${plan.members.length} members, ` +
      `${plan.boards.length} boards, ${plan.flags.length} flags`,
  );
  console.log(`  layout (planFrame without take-off): ${fmt(time(() => layoutFrame(L)))}`);
  console.log(`  planFrame with take-off and cut list: ${fmt(time(() => planFrame(L), 20))}`);
  console.log('Growing rectangles (layout; cost per m2 should stay about flat):');
  for (const [w, h] of [
    [4000, 3000],
    [8000, 6000],
    [12_000, 9000],
    [16_000, 12_000],
    [24_000, 18_000],
    [32_000, 24_000],
  ]) {
    const d = deck(rect(w, h), { borderCourses: 1 });
    const t = time(() => layoutFrame(d), 40, 2000);
    const a = area(d);
    console.log(
      `  ${(w / 1000).toFixed(0)} m x ${(h / 1000).toFixed(0)} m (${a.toFixed(0)} m2): ` +
        `${t.wallMs.toFixed(2)} ms wall, ${t.cpuMs.toFixed(2)} ms CPU, ` +
        `${((t.cpuMs / a) * 1000).toFixed(1)} us CPU per m2`,
    );
  }
}
