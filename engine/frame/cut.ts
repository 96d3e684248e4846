// Cuts joist lines and rims into stock-length pieces, with joist joins over supports. Pure: engine only.
import type { FrameContext, JoistLine } from './model';

/** A join between two pieces of one line (layout frame y), and whether it sits over a support. */
export interface LineJoin {
  line: JoistLine;
  y: number;
  onSupport: boolean;
  below: string;
  above: string;
}

/**
 * Splits each line into pieces no longer than stock, choosing for every join the furthest support
 * that stock reaches; where none is within reach the join falls at full stock length, off support.
 */
export function cutLines(ctx: FrameContext, lines: JoistLine[]): LineJoin[] {
  const stock = ctx.design.joist.stockMm;
  const joins: LineJoin[] = [];
  for (const line of lines) {
    const cuts: { y: number; on: boolean }[] = [];
    let start = line.y0;
    let guard = 0;
    while (line.y1 - start > stock + 1e-6 && guard++ < 1000) {
      let best: number | null = null;
      for (const s of line.supports) {
        if (s > start + 1 && s - start <= stock + 1e-6) best = s;
      }
      if (best === null) {
        cuts.push({ y: start + stock, on: false });
        start += stock;
      } else {
        cuts.push({ y: best, on: true });
        start = best;
      }
    }
    const bounds = [line.y0, ...cuts.map((c) => c.y), line.y1];
    line.pieces = [];
    for (let i = 0; i + 1 < bounds.length; i++) {
      line.pieces.push({ id: `${line.id}.${i + 1}`, y0: bounds[i], y1: bounds[i + 1] });
    }
    cuts.forEach((c, i) => {
      joins.push({
        line,
        y: c.y,
        onSupport: c.on,
        below: line.pieces[i].id,
        above: line.pieces[i + 1].id,
      });
    });
  }
  return joins;
}

/** Equal divisions of a rim of length L so each piece fits the stock: the join positions. */
export function rimJoinPositions(L: number, stock: number): number[] {
  const n = Math.max(1, Math.ceil(L / stock - 1e-9));
  const out: number[] = [];
  for (let k = 1; k < n; k++) out.push((L * k) / n);
  return out;
}
