// Clips framing lines to the deck outline with the Clipper2 polygon library. Pure: imports only clipper2-js and engine geometry.
import { Clipper, FillRule, Path64, Paths64 } from 'clipper2-js';
import type { Pt } from './types';
import { EPS } from './geometry';

/** Clipper2 works on integers: 10 units per millimetre keeps 0.1 mm and products well inside 2^53. */
const SCALE = 10;
/** Half-width of the thin strip that stands for a line (mm). */
const HALF = 0.5;

function toPath(ring: Pt[]): Path64 {
  const path = new Path64();
  // Plain {x, y} records: Clipper2 only reads the fields, and Point64's constructor is costly.
  for (const [x, y] of ring) path.push({ x: Math.round(x * SCALE), y: Math.round(y * SCALE) });
  return path;
}

/** y-intervals where the vertical line at x lies inside a (small) result polygon. */
function verticalScan(poly: Path64, x: number): [number, number][] {
  const ys: number[] = [];
  const n = poly.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = poly[i].x / SCALE;
    const yi = poly[i].y / SCALE;
    const xj = poly[j].x / SCALE;
    const yj = poly[j].y / SCALE;
    if (xi > x !== xj > x) ys.push(yi + ((x - xi) * (yj - yi)) / (xj - xi));
  }
  ys.sort((a, b) => a - b);
  const out: [number, number][] = [];
  for (let k = 0; k + 1 < ys.length; k += 2)
    if (ys[k + 1] - ys[k] > EPS) out.push([ys[k], ys[k + 1]]);
  return out;
}

/**
 * For each vertical line x = xs[i], the sorted y-intervals where it lies inside the ring. Every
 * line becomes a 1 mm strip and all strips are intersected with the outline in one library call;
 * the centreline of each resulting piece gives the interval. Lines closer than 1 mm share a strip
 * and get the same intervals.
 */
export function verticalsInside(ring: Pt[], xs: number[]): [number, number][][] {
  const result: [number, number][][] = xs.map(() => []);
  if (xs.length === 0 || ring.length < 3) return result;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const p of ring) {
    if (p[1] < minY) minY = p[1];
    if (p[1] > maxY) maxY = p[1];
  }
  // Sort the lines and merge any that would overlap, so each strip maps back unambiguously.
  const order = xs.map((x, i) => i).sort((a, b) => xs[a] - xs[b]);
  const groups: { x: number; members: number[] }[] = [];
  for (const i of order) {
    const last = groups[groups.length - 1];
    if (last && xs[i] - last.x < 2 * HALF + 0.2) last.members.push(i);
    else groups.push({ x: xs[i], members: [i] });
  }
  const strips = new Paths64();
  for (const g of groups) {
    strips.push(
      toPath([
        [g.x - HALF, minY - 10],
        [g.x + HALF, minY - 10],
        [g.x + HALF, maxY + 10],
        [g.x - HALF, maxY + 10],
      ]),
    );
  }
  const clipPaths = new Paths64();
  clipPaths.push(toPath(ring));
  const pieces = Clipper.Intersect(strips, clipPaths, FillRule.NonZero);
  const gx = groups.map((g) => g.x);
  for (const piece of pieces) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const p of piece) {
      if (p.x < lo) lo = p.x;
      if (p.x > hi) hi = p.x;
    }
    const mid = (lo + hi) / 2 / SCALE;
    const g = groups[nearestIndex(gx, mid)];
    const ivs = verticalScan(piece, g.x);
    for (const m of g.members) result[m].push(...ivs);
  }
  for (const list of result) list.sort((a, b) => a[0] - b[0]);
  return result;
}

/** For each horizontal line y = ys[i], the sorted x-intervals where it lies inside the ring. */
export function horizontalsInside(ring: Pt[], ys: number[]): [number, number][][] {
  // Transpose, clip as verticals, and read the intervals back as x.
  const swapped: Pt[] = ring.map((p) => [p[1], p[0]]);
  // Transposing reverses the winding; Clipper's non-zero rule does not mind.
  return verticalsInside(swapped, ys);
}

function nearestIndex(sorted: number[], v: number): number {
  let lo = 0;
  let hi = sorted.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  if (lo > 0 && Math.abs(sorted[lo - 1] - v) < Math.abs(sorted[lo] - v)) return lo - 1;
  return lo;
}
