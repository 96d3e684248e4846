// Bench section: the cut list on deck-sized and known-optimum instances (pieces, stock used, lower bound, time).
import { layoutFrame } from '../../engine';
import { clearCutListCache, solveCutList } from '../../engine/cutlist';
import { benchDeck } from '../../engine/testing/decks';
import { deckLike, perfectFit, triplets, type Instance } from '../../engine/cutlist/instances';
import { handDeck } from '../../engine/takeoff/handDeck';
import { takeOff } from '../../engine/takeoff';

/** One row of the cut list bench. */
export interface CutListBenchRow {
  name: string;
  pieces: number;
  lengths: number;
  stockUsed: number;
  lowerBound: number;
  /** ceil(total length incl. kerf / stock): the simplest bound. */
  simpleBound: number;
  optimum?: number;
  optimal: boolean;
  /** Median and fastest CPU milliseconds over the runs (cache off). */
  ms: number;
  minMs: number;
}

function cpuMs(f: () => void): number {
  const t = process.cpuUsage();
  f();
  const d = process.cpuUsage(t);
  return (d.user + d.system) / 1000;
}

function bench(inst: Instance, runs: number): CutListBenchRow {
  const times: number[] = [];
  let r = solveCutList(inst, { cache: false });
  for (let k = 0; k < runs; k++)
    times.push(cpuMs(() => (r = solveCutList(inst, { cache: false }))));
  times.sort((a, b) => a - b);
  const pieces = inst.pieces.reduce((a, p) => a + p.qty, 0);
  const total = inst.pieces.reduce((a, p) => a + p.qty * (p.lengthMm + inst.kerfMm), 0);
  return {
    name: inst.name,
    pieces,
    lengths: inst.pieces.length,
    stockUsed: r.count,
    lowerBound: r.lowerBound,
    simpleBound: Math.ceil(total / (inst.stockMm + inst.kerfMm) - 1e-9),
    optimum: inst.optimum,
    optimal: r.optimal,
    ms: times[Math.floor(times.length / 2)],
    minMs: times[0],
  };
}

/** The instances the bench runs: the hand-built example deck, deck-like lists, perfect-fit and triplet sets. */
export function benchInstances(): Instance[] {
  const { plan, design } = handDeck();
  const cut = takeOff(plan, design).cutList;
  const fromCut = (name: string, stockMm: number, cuts: number[]): Instance => {
    const m = new Map<number, number>();
    for (const c of cuts) m.set(c, (m.get(c) ?? 0) + 1);
    return {
      name,
      stockMm,
      kerfMm: design.kerfMm,
      pieces: [...m].map(([lengthMm, qty]) => ({ lengthMm, qty })),
    };
  };
  return [
    fromCut(
      '6 x 4 m deck, joists',
      design.joist.stockMm,
      cut.joists.stock.flatMap((s) => s.cuts),
    ),
    fromCut(
      '6 x 4 m deck, boards',
      design.board.stockMm,
      cut.boards.stock.flatMap((s) => s.cuts),
    ),
    deckLike(1, 'joists', 40, 12000),
    deckLike(2, 'boards', 80, 12000),
    deckLike(3, 'joists', 75, 20000),
    deckLike(4, 'boards', 140, 30000),
    perfectFit(1, 20, 4800, 3),
    perfectFit(2, 50, 4800, 3),
    perfectFit(3, 100, 3000, 3, 5),
    triplets(1, 20),
    triplets(2, 40),
  ];
}

/** CPU ms of the whole take-off (cut lists solved cold) of the 30 x 20 m L-shaped bench deck: median and fastest. */
function benchTakeOff(runs: number): { ms: number; minMs: number; joists: number; boards: number } {
  const design = benchDeck();
  const core = layoutFrame(design);
  const times: number[] = [];
  let out = takeOff(core, design);
  for (let k = 0; k < runs; k++) {
    clearCutListCache();
    times.push(cpuMs(() => (out = takeOff(core, design))));
  }
  times.sort((a, b) => a - b);
  const pieces = (r: typeof out.cutList.joists) => r.stock.reduce((a, s) => a + s.cuts.length, 0);
  return {
    ms: times[Math.floor(times.length / 2)],
    minMs: times[0],
    joists: pieces(out.cutList.joists),
    boards:
      pieces(out.cutList.boards) +
      (out.cutList.borderBoards ? pieces(out.cutList.borderBoards) : 0),
  };
}

/** Runs the cut list bench, prints a table and returns its rows. */
export function run(opts: { runs?: number; print?: boolean } = {}): CutListBenchRow[] {
  const runs = opts.runs ?? 15;
  const rows = benchInstances().map((i) => bench(i, runs));
  const t = benchTakeOff(runs);
  if (opts.print !== false) {
    console.log('\nCut list (CPU ms of one solve, median and fastest of %d runs, cache off)', runs);
    console.log(
      [
        'instance'.padEnd(26),
        'pieces',
        'lengths',
        'stock',
        'bound',
        'ceil',
        'optimum',
        'proven',
        'ms',
        'min ms',
      ].join('  '),
    );
    for (const r of rows)
      console.log(
        [
          r.name.padEnd(26),
          String(r.pieces).padStart(6),
          String(r.lengths).padStart(7),
          String(r.stockUsed).padStart(5),
          String(r.lowerBound).padStart(5),
          String(r.simpleBound).padStart(4),
          String(r.optimum ?? '-').padStart(7),
          (r.optimal ? 'yes' : 'no').padStart(6),
          r.ms.toFixed(1).padStart(6),
          r.minMs.toFixed(1).padStart(6),
        ].join('  '),
      );
    console.log(
      'Take-off of the 30 x 20 m L-shaped bench deck (%d joist and %d board pieces, cut lists cold): %s ms median, %s ms fastest (CPU)',
      t.joists,
      t.boards,
      t.ms.toFixed(1),
      t.minMs.toFixed(1),
    );
  }
  return rows;
}

// Run on its own: `npx tsx scripts/bench/cutlist.ts`.
if (process.argv[1] && /bench[\\/]cutlist\.ts$/.test(process.argv[1])) run();
