// Prepares the outline for layout: cleans it, rotates it so boards run along +x, classifies its edges. Pure: engine only.
import type { DesignDocument } from '../schema';
import type { Pt } from '../types';
import {
  boundsOf,
  distToRing,
  insetRing,
  normaliseRing,
  pointInRing,
  segmentsIntersect,
  simplePolygonProblem,
} from '../geometry';
import type { EdgeInfo, EdgeKind, FrameContext } from './model';

/** An edge within this fraction of the joist direction counts as running with the joists. */
const PARALLEL_TOL = 1e-3;
/** sin(30 degrees): edges closer than this to the board direction carry a support row. */
const ROW_EDGE_SIN = 0.5;

/** The cleaned world outline (counter-clockwise) or the reason it cannot be framed. */
export function cleanOutline(design: DesignDocument): { ring: Pt[] } | { problem: string } {
  const ring = normaliseRing(design.outline as Pt[]);
  const problem = simplePolygonProblem(ring);
  return problem ? { problem } : { ring };
}

/** Builds the layout context for a valid, cleaned world outline. */
export function frameContext(design: DesignDocument, worldRing: Pt[]): FrameContext {
  const rad = (design.boardAngleDeg * Math.PI) / 180;
  const cos = Math.cos(rad);
  const sin = Math.sin(rad);
  // Rotate by -angle so boards run along +x.
  const ring: Pt[] = worldRing.map((p) => [p[0] * cos + p[1] * sin, -p[0] * sin + p[1] * cos]);
  const w = design.joist.widthMm;
  const rim = insetRing(ring, w / 2);
  const n = ring.length;
  const edges: EdgeInfo[] = [];
  for (let i = 0; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const ux = (b[0] - a[0]) / length;
    const uy = (b[1] - a[1]) / length;
    let kind: EdgeKind;
    if (Math.abs(ux) < PARALLEL_TOL) kind = 'parallel';
    else if (Math.abs(uy) <= ROW_EDGE_SIN) kind = 'row';
    else kind = 'angled';
    const rimA = rim[i];
    const rimB = rim[(i + 1) % n];
    const mid: Pt = [(rimA[0] + rimB[0]) / 2, (rimA[1] + rimB[1]) / 2];
    const rimInside =
      [rimA, rimB, mid].every((p) => onDeck(ring, p)) &&
      ring.every((p, k) => !segmentsIntersect(rimA, rimB, p, ring[(k + 1) % n]));
    edges.push({ index: i, a, b, length, ux, uy, kind, rimA, rimB, rimInside });
  }
  return {
    design,
    ring,
    edges,
    cos,
    sin,
    bounds: boundsOf(ring),
    w,
    rowLimit: Math.min(design.joist.maxSpanMm, design.joist.stockMm),
    usePosts: design.heightMm >= design.postsFromHeightMm,
  };
}

/** Inside the outline, or on its edge within rounding (0.5 mm). */
function onDeck(ring: Pt[], p: Pt): boolean {
  return pointInRing(p, ring) || distToRing(p, ring) <= 0.5;
}
