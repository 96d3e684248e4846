// Cut list test instances: seeded generators for random, perfect-fit, triplet and deck-like problems (tests and the bench share them). Pure; touches nothing outside engine/cutlist.

/** A cut list problem with a single stock length. */
export interface Instance {
  name: string;
  stockMm: number;
  kerfMm: number;
  pieces: { lengthMm: number; qty: number }[];
  /** The optimum, where it is known by construction. */
  optimum?: number;
}

/** A small deterministic pseudo-random generator (mulberry32), so every run sees the same instances. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const int = (r: () => number, lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));

/** Pieces as {lengthMm, qty} lines from a list of lengths. */
export function group(lengths: number[]): { lengthMm: number; qty: number }[] {
  const m = new Map<number, number>();
  for (const l of lengths) m.set(l, (m.get(l) ?? 0) + 1);
  return [...m.entries()].map(([lengthMm, qty]) => ({ lengthMm, qty }));
}

/**
 * Perfect fit by construction: `bars` stock bars are each cut into 2..maxParts parts with the saw
 * kerf between them and nothing left over, so the parts exactly use `bars` bars and no plan can use
 * fewer (the total length with kerfs equals the stock). The optimum is `bars`.
 */
export function perfectFit(
  seed: number,
  bars: number,
  stockMm: number,
  kerfMm: number,
  maxParts = 4,
  minPart = 200,
): Instance {
  const r = rng(seed);
  const lengths: number[] = [];
  for (let b = 0; b < bars; b++) {
    const parts = int(r, 2, maxParts);
    // Cut points on the bar, at whole mm, each part at least minPart long.
    const usable = stockMm - (parts - 1) * kerfMm;
    const cuts: number[] = [];
    let left = usable;
    for (let k = parts; k > 1; k--) {
      const piece = int(r, minPart, Math.max(minPart, left - (k - 1) * minPart));
      cuts.push(piece);
      left -= piece;
    }
    cuts.push(left);
    lengths.push(...cuts);
  }
  return {
    name: `perfect-fit ${bars} bars`,
    stockMm,
    kerfMm,
    pieces: group(lengths),
    optimum: bars,
  };
}

/**
 * Triplet instances in the manner of Falkenauer's "t" class (the recipe from memory, not the
 * published files): every bar holds exactly three pieces, one long (380-490 of 1000), one middle
 * (250 to half of what is left) and the rest, scaled to the stock; no kerf. Optimum = bars. Hard for
 * greedy packing because every bar must be exactly full.
 */
export function triplets(seed: number, bars: number, stockMm = 1000): Instance {
  const r = rng(seed);
  const lengths: number[] = [];
  const s = stockMm / 1000;
  for (let b = 0; b < bars; b++) {
    const a = int(r, Math.ceil(380 * s), Math.floor(490 * s));
    const left = stockMm - a;
    const m = int(r, Math.ceil(250 * s), Math.floor(left / 2));
    lengths.push(a, m, left - m);
  }
  return {
    name: `triplets ${bars} bars`,
    stockMm,
    kerfMm: 0,
    pieces: group(lengths),
    optimum: bars,
  };
}

/** Small random instances for comparing with an exact ILP: n pieces of 10-80% of the stock. */
export function smallRandom(seed: number, n: number, stockMm = 3000, kerfMm = 3): Instance {
  const r = rng(seed);
  const lengths = Array.from({ length: n }, () =>
    int(r, Math.round(stockMm * 0.1), Math.round(stockMm * 0.8)),
  );
  return { name: `random ${n}`, stockMm, kerfMm, pieces: group(lengths) };
}

/**
 * A deck-like joist or board list: `lines` runs of a deck `lengthMm` long, each split into stock-sized
 * pieces at support positions (joists) or staggered joints (boards), plus short pieces (noggins,
 * step treads). Realistic, not adversarial.
 */
export function deckLike(
  seed: number,
  kind: 'joists' | 'boards',
  lines: number,
  lengthMm: number,
): Instance {
  const r = rng(seed);
  const stockMm = kind === 'joists' ? 3000 : 4800;
  const lengths: number[] = [];
  // Joists join over support rows shared by every line (every ~1.3-1.5 m); boards stagger their
  // joints course to course, in a few repeating patterns.
  const step = int(r, 1300, 1500);
  for (let i = 0; i < lines; i++) {
    let left = lengthMm;
    let piece = kind === 'joists' ? step * 2 : stockMm - 400 * int(r, 0, 3);
    while (left > 0) {
      const cut = Math.min(piece, left);
      lengths.push(cut - (left > cut ? 2 : 0));
      left -= cut;
      piece = kind === 'joists' ? step * 2 : stockMm - 400 * int(r, 0, 1);
    }
  }
  if (kind === 'joists') {
    const noggins = lines * Math.ceil(lengthMm / 1400);
    // Most noggins fill a 400 mm bay; a few odd bays at the ends and beside joist pairs.
    const odd = [int(r, 200, 349), int(r, 200, 349), 324, 325];
    for (let k = 0; k < noggins; k++) lengths.push(r() < 0.8 ? 350 : odd[int(r, 0, 3)]);
  }
  return {
    name: `deck ${kind} ${lines} x ${lengthMm}`,
    stockMm,
    kerfMm: 3,
    pieces: group(lengths),
  };
}
