// Take-off geometry: the few plan-view measurements the counting rules need (crossings, distances, perimeter). Pure arithmetic; touches nothing outside engine/.
import type { Pt } from '../types';

/** |sin| of the angle between two directions; 0 when either is a point. */
export function sinBetween(a: Pt, b: Pt, c: Pt, d: Pt): number {
  const ux = b[0] - a[0];
  const uy = b[1] - a[1];
  const vx = d[0] - c[0];
  const vy = d[1] - c[1];
  const lu = Math.hypot(ux, uy);
  const lv = Math.hypot(vx, vy);
  if (lu === 0 || lv === 0) return 0;
  return Math.abs(ux * vy - uy * vx) / (lu * lv);
}

/**
 * Where segment a-b crosses segment c-d, as the distance from c along c-d; null when they miss.
 * `tolAB` and `tolCD` stretch each segment at both ends (a board end resting on a joist, a board
 * edge over a joist end).
 */
export function crossingAlong(
  a: Pt,
  b: Pt,
  c: Pt,
  d: Pt,
  tolAB: number,
  tolCD: number,
): number | null {
  const rx = b[0] - a[0];
  const ry = b[1] - a[1];
  const sx = d[0] - c[0];
  const sy = d[1] - c[1];
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-12) return null;
  const qx = c[0] - a[0];
  const qy = c[1] - a[1];
  const s = (qx * sy - qy * sx) / den; // along a-b
  const t = (qx * ry - qy * rx) / den; // along c-d
  const lab = Math.hypot(rx, ry);
  const lcd = Math.hypot(sx, sy);
  if (s * lab < -tolAB || (s - 1) * lab > tolAB) return null;
  if (t * lcd < -tolCD || (t - 1) * lcd > tolCD) return null;
  return t * lcd;
}

/** Distance from point p to segment a-b. */
export function distToSegment(p: Pt, a: Pt, b: Pt): number {
  const vx = b[0] - a[0];
  const vy = b[1] - a[1];
  const l2 = vx * vx + vy * vy;
  let t = l2 === 0 ? 0 : ((p[0] - a[0]) * vx + (p[1] - a[1]) * vy) / l2;
  t = Math.max(0, Math.min(1, t));
  return Math.hypot(p[0] - (a[0] + t * vx), p[1] - (a[1] + t * vy));
}

/** Length of a segment. */
export function segLength(a: Pt, b: Pt): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** The closed outline's edges as [from, to] pairs. */
export function outlineEdges(outline: Pt[]): [Pt, Pt][] {
  return outline.map((p, i) => [p, outline[(i + 1) % outline.length]] as [Pt, Pt]);
}

/**
 * A uniform grid over segments, for finding the few segments near another one without testing
 * them all (a 30 x 20 m deck has about a thousand board pieces and a thousand members).
 */
export class SegmentGrid {
  private readonly cells = new Map<number, number[]>();
  private stamp: Uint32Array;
  private round = 0;

  /** Files each segment under every cell its box (grown by `pad`) touches. */
  constructor(
    private readonly segs: { a: Pt; b: Pt }[],
    private readonly cell = 600,
    pad = 0,
  ) {
    this.stamp = new Uint32Array(segs.length);
    segs.forEach((s, i) => {
      this.eachCell(
        Math.min(s.a[0], s.b[0]) - pad,
        Math.min(s.a[1], s.b[1]) - pad,
        Math.max(s.a[0], s.b[0]) + pad,
        Math.max(s.a[1], s.b[1]) + pad,
        (k) => {
          const list = this.cells.get(k);
          if (list) list.push(i);
          else this.cells.set(k, [i]);
        },
      );
    });
  }

  private eachCell(x0: number, y0: number, x1: number, y1: number, f: (key: number) => void) {
    const c = this.cell;
    const i0 = Math.floor(x0 / c);
    const i1 = Math.floor(x1 / c);
    const j0 = Math.floor(y0 / c);
    const j1 = Math.floor(y1 / c);
    for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) f((i + 4096) * 8192 + (j + 4096));
  }

  /** Indices of segments filed in any cell the box touches, each once. */
  near(x0: number, y0: number, x1: number, y1: number): number[] {
    this.round++;
    if (this.round === 0xffffffff) {
      this.stamp.fill(0);
      this.round = 1;
    }
    const out: number[] = [];
    const c = this.cell;
    const i1 = Math.floor(x1 / c);
    const j0 = Math.floor(y0 / c);
    const j1 = Math.floor(y1 / c);
    for (let i = Math.floor(x0 / c); i <= i1; i++)
      for (let j = j0; j <= j1; j++) {
        const list = this.cells.get((i + 4096) * 8192 + (j + 4096));
        if (!list) continue;
        for (let k = 0; k < list.length; k++) {
          const s = list[k];
          if (this.stamp[s] === this.round) continue;
          this.stamp[s] = this.round;
          out.push(s);
        }
      }
    return out;
  }
}
