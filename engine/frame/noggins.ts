// Noggin (blocking) rows between neighbouring joists, by the design's noggin rule. Pure: engine only.
import type { FrameContext, JoistLine } from './model';
import { segmentsIntersect } from '../geometry';

/** True when the noggin from x0 to x1 at y would cross the deck edge (a notch between joists). */
function crossesEdge(ctx: FrameContext, x0: number, x1: number, y: number): boolean {
  const n = ctx.ring.length;
  for (let i = 0; i < n; i++) {
    if (segmentsIntersect([x0, y], [x1, y], ctx.ring[i], ctx.ring[(i + 1) % n])) return true;
  }
  return false;
}

/** One noggin between two joist lines at height y (layout frame). */
export interface NogginRaw {
  y: number;
  left: JoistLine;
  right: JoistLine;
}

/** Where noggins go within one span [a, b] under the rule. */
function nogginsInSpan(ctx: FrameContext, a: number, b: number): number[] {
  const rule = ctx.design.nogginRule;
  const L = b - a;
  switch (rule.kind) {
    case 'midspan':
      return L > rule.overMm ? [(a + b) / 2] : [];
    case 'spacing': {
      const n = Math.ceil(L / rule.maxSpacingMm - 1e-9);
      const out: number[] = [];
      for (let k = 1; k < n; k++) out.push(a + (L * k) / n);
      return out;
    }
    case 'none':
      return [];
    default: {
      const never: never = rule;
      throw new Error(`Unknown noggin rule ${JSON.stringify(never)}`);
    }
  }
}

/**
 * Noggins between each joist line and the next line to its right, placed in the left line's spans
 * (support to support, or to an end) by the noggin rule. Lines must be sorted by x.
 */
export function placeNoggins(ctx: FrameContext, lines: JoistLine[]): NogginRaw[] {
  const out: NogginRaw[] = [];
  const minGap = 1.5 * ctx.w;
  // Neighbours further apart than this have open air (or another part of the deck) between them.
  const maxGap = ctx.design.joistCentresMm + 2 * ctx.w;
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i];
    const stops = [l.y0, ...l.supports, l.y1];
    for (let s = 0; s + 1 < stops.length; s++) {
      for (const y of nogginsInSpan(ctx, stops[s], stops[s + 1])) {
        for (let j = i + 1; j < lines.length; j++) {
          const r = lines[j];
          if (r.x - l.x < 0.5) continue;
          if (r.y0 <= y && y <= r.y1) {
            if (r.x - l.x >= minGap && r.x - l.x <= maxGap && !crossesEdge(ctx, l.x, r.x, y)) {
              out.push({ y, left: l, right: r });
            }
            break;
          }
        }
      }
    }
  }
  return out;
}
