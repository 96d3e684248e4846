// Snapping a world point to the grid, to 45/90 degree directions and to existing points (each switchable).
import type { Pt } from '@/engine/types';
import { angleOf, dist, polar, round } from './geometry';
import { deg } from './spaces';

export interface SnapSettings {
  grid: boolean;
  angle: boolean;
  points: boolean;
}

export interface SnapContext {
  /** Grid pitch in mm. */
  gridMm: number;
  /** The fixed point the moving point is measured from (for angle snapping), if any. */
  from?: Pt | null;
  /** Points the moving point may land on. */
  points: Pt[];
  /** Capture radius in mm (from the touch radius at the current zoom). */
  radiusMm: number;
}

export interface SnapResult {
  pt: Pt;
  /** What it snapped to, for the on-screen hint. */
  to: 'point' | 'angle' | 'grid' | null;
}

/** Snaps p: an existing point wins, then a 45° direction from `from`, then the grid. */
export function snapPoint(p: Pt, s: SnapSettings, ctx: SnapContext): SnapResult {
  if (s.points) {
    let best: Pt | null = null;
    let bestD = ctx.radiusMm;
    for (const q of ctx.points) {
      const d = dist(p, q);
      if (d <= bestD) {
        best = q;
        bestD = d;
      }
    }
    if (best) return { pt: [best[0], best[1]], to: 'point' };
  }
  if (s.angle && ctx.from) {
    const a = angleOf(ctx.from, p);
    const snapped = Math.round(a / 45) * 45;
    const len = dist(ctx.from, p);
    const onRay = polar(ctx.from, len, deg(snapped));
    // Only take the direction when the finger is close to it: otherwise free angles are impossible.
    if (dist(onRay, p) <= ctx.radiusMm) {
      const lenSnapped = s.grid
        ? Math.max(ctx.gridMm, Math.round(len / ctx.gridMm) * ctx.gridMm)
        : len;
      return { pt: polar(ctx.from, lenSnapped, deg(snapped)), to: 'angle' };
    }
  }
  if (s.grid && ctx.gridMm > 0) {
    const g = ctx.gridMm;
    return { pt: [round(Math.round(p[0] / g) * g), round(Math.round(p[1] / g) * g)], to: 'grid' };
  }
  return { pt: [round(p[0]), round(p[1])], to: null };
}

/** A grid pitch in mm that gives lines roughly every 24+ px at this zoom: 100 mm, 500 mm, 1 m, 5 m ... */
export function gridPitchFor(scalePxPerMm: number): number {
  const steps = [10, 50, 100, 250, 500, 1000, 2500, 5000, 10000];
  for (const s of steps) if (s * scalePxPerMm >= 24) return s;
  return 10000;
}
