// Plane geometry on plain [x, y] millimetre points for the framing engine. Pure maths: imports nothing.
import type { Pt } from './types';

/** Lengths closer than this (mm) are treated as equal. */
export const EPS = 1e-6;

/** Rotates a point about the origin by `rad` radians (counter-clockwise, y up). */
export function rotate(p: Pt, cos: number, sin: number): Pt {
  return [p[0] * cos - p[1] * sin, p[0] * sin + p[1] * cos];
}

/** Distance between two points. */
export function dist(a: Pt, b: Pt): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Signed area of a ring (positive when counter-clockwise, y up). */
export function signedArea(ring: Pt[]): number {
  let s = 0;
  for (let i = 0, n = ring.length; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s / 2;
}

/**
 * Cleans an outline: drops a repeated closing point, coincident points and straight-through corners,
 * and returns it counter-clockwise. May return fewer than three points for a degenerate outline.
 */
export function normaliseRing(input: Pt[]): Pt[] {
  let ring: Pt[] = input.map((p) => [p[0], p[1]]);
  // Coincident neighbours (including a closing point equal to the first).
  ring = ring.filter((p, i) => dist(p, ring[(i + 1) % ring.length]) > 0.01);
  // Collinear corners, repeated until none are left.
  let changed = true;
  while (changed && ring.length >= 3) {
    changed = false;
    for (let i = 0; i < ring.length && ring.length >= 3; i++) {
      const a = ring[(i + ring.length - 1) % ring.length];
      const b = ring[i];
      const c = ring[(i + 1) % ring.length];
      const cross = (b[0] - a[0]) * (c[1] - b[1]) - (b[1] - a[1]) * (c[0] - b[0]);
      const scale = dist(a, b) * dist(b, c);
      if (Math.abs(cross) <= 1e-9 * scale || dist(a, c) < 0.01) {
        ring.splice(i, 1);
        changed = true;
        i--;
      }
    }
  }
  if (ring.length >= 3 && signedArea(ring) < 0) ring.reverse();
  return ring;
}

function orient(a: Pt, b: Pt, c: Pt): number {
  return (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
}

function onSegment(a: Pt, b: Pt, p: Pt): boolean {
  return (
    Math.min(a[0], b[0]) - EPS <= p[0] &&
    p[0] <= Math.max(a[0], b[0]) + EPS &&
    Math.min(a[1], b[1]) - EPS <= p[1] &&
    p[1] <= Math.max(a[1], b[1]) + EPS
  );
}

/** True when segments ab and cd touch or cross. */
export function segmentsIntersect(a: Pt, b: Pt, c: Pt, d: Pt): boolean {
  const d1 = orient(c, d, a);
  const d2 = orient(c, d, b);
  const d3 = orient(a, b, c);
  const d4 = orient(a, b, d);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    return true;
  }
  if (d1 === 0 && onSegment(c, d, a)) return true;
  if (d2 === 0 && onSegment(c, d, b)) return true;
  if (d3 === 0 && onSegment(a, b, c)) return true;
  if (d4 === 0 && onSegment(a, b, d)) return true;
  return false;
}

/**
 * Explains why a ring is not a simple polygon (edges crossing or touching away from their shared
 * corner), or returns null when it is simple. O(n^2), fine for outlines of a few hundred corners.
 */
export function simplePolygonProblem(ring: Pt[]): string | null {
  const n = ring.length;
  if (n < 3) return 'The outline needs at least three distinct corners';
  if (Math.abs(signedArea(ring)) < 1) return 'The outline encloses no area';
  for (let i = 0; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    for (let j = i + 1; j < n; j++) {
      if (j === i || (j + 1) % n === i || (i + 1) % n === j) continue;
      const c = ring[j];
      const d = ring[(j + 1) % n];
      if (segmentsIntersect(a, b, c, d)) {
        return `Outline edges ${i + 1} and ${j + 1} cross or touch`;
      }
    }
  }
  return null;
}

/** Even-odd point-in-polygon test (points on an edge may go either way). */
export function pointInRing(p: Pt, ring: Pt[]): boolean {
  let inside = false;
  const [x, y] = p;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Distance from point p to segment ab. */
export function distToSegment(p: Pt, a: Pt, b: Pt): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  let t = len2 > 0 ? ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2 : 0;
  t = Math.max(0, Math.min(1, t));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

/** Distance from point p to the ring's boundary. */
export function distToRing(p: Pt, ring: Pt[]): number {
  let best = Infinity;
  for (let i = 0; i < ring.length; i++) {
    const d = distToSegment(p, ring[i], ring[(i + 1) % ring.length]);
    if (d < best) best = d;
  }
  return best;
}

/**
 * Inside intervals [x0, x1] of the horizontal line at y across a ring (even-odd), sorted.
 * A scanline, used for board courses and quick tests; joists are clipped by the polygon library.
 */
export function scanRing(ring: Pt[], y: number): [number, number][] {
  const xs: number[] = [];
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y) xs.push(xi + ((y - yi) * (xj - xi)) / (yj - yi));
  }
  xs.sort((a, b) => a - b);
  const out: [number, number][] = [];
  for (let k = 0; k + 1 < xs.length; k += 2)
    if (xs[k + 1] - xs[k] > EPS) out.push([xs[k], xs[k + 1]]);
  return out;
}

/** Intersection of two sorted lists of disjoint intervals. */
export function intersectIntervals(
  a: [number, number][],
  b: [number, number][],
): [number, number][] {
  const out: [number, number][] = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const lo = Math.max(a[i][0], b[j][0]);
    const hi = Math.min(a[i][1], b[j][1]);
    if (hi - lo > EPS) out.push([lo, hi]);
    if (a[i][1] < b[j][1]) i++;
    else j++;
  }
  return out;
}

/** Removes [lo, hi] from a sorted list of disjoint intervals. */
export function subtractInterval(
  list: [number, number][],
  lo: number,
  hi: number,
): [number, number][] {
  const out: [number, number][] = [];
  for (const [a, b] of list) {
    if (hi <= a || lo >= b) {
      out.push([a, b]);
      continue;
    }
    if (lo > a) out.push([a, lo]);
    if (hi < b) out.push([hi, b]);
  }
  return out;
}

/**
 * Offsets a counter-clockwise ring inward by d with mitred corners (each corner moves to where the
 * two offset edges meet). WARNING: no clean-up of the self-overlaps that appear where the deck is
 * narrower than 2d; callers use it for rim and border centrelines and intersect with the outline.
 */
export function insetRing(ring: Pt[], d: number): Pt[] {
  const n = ring.length;
  const out: Pt[] = [];
  for (let i = 0; i < n; i++) {
    const p0 = ring[(i + n - 1) % n];
    const p1 = ring[i];
    const p2 = ring[(i + 1) % n];
    const n1 = inwardNormal(p0, p1);
    const n2 = inwardNormal(p1, p2);
    const bx = n1[0] + n2[0];
    const by = n1[1] + n2[1];
    const dot = n1[0] * n2[0] + n1[1] * n2[1];
    const len = Math.hypot(bx, by);
    if (len < 1e-9) {
      out.push([p1[0] + n1[0] * d, p1[1] + n1[1] * d]);
    } else {
      // The mitre point sits on the bisector at d / cos(half the turn); (1 + dot) / 2 = cos^2.
      // It must stay on both offset lines (rims run parallel to their edges), so it is only
      // capped for near-reversals, where the deck is a spike thinner than a joist anyway.
      const cosHalf = Math.sqrt(Math.max((1 + dot) / 2, 0));
      const m = d / Math.max(cosHalf, 0.01);
      out.push([p1[0] + (bx / len) * m, p1[1] + (by / len) * m]);
    }
  }
  return out;
}

/** Unit normal pointing into a counter-clockwise ring from edge a -> b. */
export function inwardNormal(a: Pt, b: Pt): Pt {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  return [-dy / len, dx / len];
}

/** Axis-aligned bounds of a set of points. */
export function boundsOf(pts: Pt[]): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of pts) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/** The point where segment ab crosses the vertical line at x, or null. */
export function crossVertical(a: Pt, b: Pt, x: number): number | null {
  if ((a[0] - x) * (b[0] - x) > 0 || a[0] === b[0]) return null;
  return a[1] + ((x - a[0]) * (b[1] - a[1])) / (b[0] - a[0]);
}
