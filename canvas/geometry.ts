// Plan geometry the editor needs (hit tests, side lengths, snapping): world millimetres, pure functions.
import type { Pt } from '@/engine/types';
import { deg, rad, toDegrees, toRadians, type Degrees } from './spaces';

export const dist = (a: Pt, b: Pt) => Math.hypot(b[0] - a[0], b[1] - a[1]);
export const add = (a: Pt, b: Pt): Pt => [a[0] + b[0], a[1] + b[1]];
export const sub = (a: Pt, b: Pt): Pt => [a[0] - b[0], a[1] - b[1]];
export const mid = (a: Pt, b: Pt): Pt => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];

/** Direction of a → b in degrees, counter-clockwise from +x, in [0, 360). */
export function angleOf(a: Pt, b: Pt): Degrees {
  const d = toDegrees(rad(Math.atan2(b[1] - a[1], b[0] - a[0])));
  return deg(((d % 360) + 360) % 360);
}

/** The point at `length` mm from `from` in direction `angle`. */
export function polar(from: Pt, length: number, angle: Degrees): Pt {
  const r = toRadians(angle);
  return [round(from[0] + length * Math.cos(r)), round(from[1] + length * Math.sin(r))];
}

/** Rounds to 0.01 mm so typed lengths stay exact on save (no 5999.999999). */
export function round(n: number): number {
  return Math.round(n * 100) / 100 + 0; // + 0 turns -0 into 0
}

/** The side from corner i to the next corner (wrapping). */
export function sideOf(outline: Pt[], i: number): [Pt, Pt] {
  return [outline[i], outline[(i + 1) % outline.length]];
}

/** Closest point on segment a-b to p, and the parameter t in [0, 1]. */
export function closestOnSegment(p: Pt, a: Pt, b: Pt): { pt: Pt; t: number; d: number } {
  const ab = sub(b, a);
  const len2 = ab[0] * ab[0] + ab[1] * ab[1];
  const t =
    len2 === 0
      ? 0
      : Math.max(0, Math.min(1, ((p[0] - a[0]) * ab[0] + (p[1] - a[1]) * ab[1]) / len2));
  const pt: Pt = [a[0] + ab[0] * t, a[1] + ab[1] * t];
  return { pt, t, d: dist(p, pt) };
}

/** Signed area (positive when counter-clockwise). */
export function signedArea(poly: Pt[]): number {
  let s = 0;
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i];
    const b = poly[(i + 1) % poly.length];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s / 2;
}

/** Bounding box of a set of points (or null when empty). */
export function boundsOf(points: Pt[]) {
  if (!points.length) return null;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

function segmentsCross(a: Pt, b: Pt, c: Pt, d: Pt): boolean {
  const o = (p: Pt, q: Pt, r: Pt) =>
    Math.sign((q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]));
  return o(a, b, c) * o(a, b, d) < 0 && o(c, d, a) * o(c, d, b) < 0;
}

/** True when no two non-adjacent sides cross (the engine wants a simple polygon). */
export function isSimple(poly: Pt[]): boolean {
  const n = poly.length;
  if (n < 3) return false;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      if (j === i + 1 || (i === 0 && j === n - 1)) continue;
      if (segmentsCross(poly[i], poly[(i + 1) % n], poly[j], poly[(j + 1) % n])) return false;
    }
  }
  return true;
}

/** Point-in-polygon by ray casting. */
export function inside(p: Pt, poly: Pt[]): boolean {
  let hit = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [xi, yi] = poly[i];
    const [xj, yj] = poly[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) hit = !hit;
  }
  return hit;
}
