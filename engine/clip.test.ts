// Checks the Clipper2-based line clipping against an independent library (polygon-clipping).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import polygonClipping from 'polygon-clipping';
import { horizontalsInside, verticalsInside } from './clip';
import type { Pt } from './types';
import { scanRing } from './geometry';
import { propertyRuns } from './testing/decks';

/** Length of the vertical line x inside the ring, by polygon-clipping: strip area / strip width. */
function insideLengthByArea(ring: Pt[], x: number, ys: [number, number]): number {
  // For a straight edge the mean height over the strip is its height at the centre line, so a
  // 2 mm strip is exact unless a corner falls inside it (callers skip those lines).
  const h = 1;
  const strip: Pt[] = [
    [x - h, ys[0] - 10],
    [x + h, ys[0] - 10],
    [x + h, ys[1] + 10],
    [x - h, ys[1] + 10],
    [x - h, ys[0] - 10],
  ];
  const closed = [...ring, ring[0]];
  const out = polygonClipping.intersection([closed], [strip]);
  let area = 0;
  for (const poly of out) {
    poly.forEach((r, i) => {
      let a = 0;
      for (let k = 0; k + 1 < r.length; k++) a += r[k][0] * r[k + 1][1] - r[k + 1][0] * r[k][1];
      area += (i === 0 ? 1 : -1) * Math.abs(a / 2);
    });
  }
  return area / (2 * h);
}

const starArb = fc
  .array(fc.tuple(fc.integer({ min: 5, max: 100 }), fc.integer({ min: 1000, max: 9000 })), {
    minLength: 3,
    maxLength: 12,
  })
  .map((parts) => {
    const total = parts.reduce((s, [g]) => s + g, 0);
    let acc = 0;
    return parts.map(([g, r]) => {
      const ang = (2 * Math.PI * acc) / total;
      acc += g;
      return [Math.round(r * Math.cos(ang)), Math.round(r * Math.sin(ang))] as Pt;
    });
  });

describe('clipping joist lines to the outline', () => {
  it('finds the inside intervals of an L by hand', () => {
    const L: Pt[] = [
      [0, 0],
      [6000, 0],
      [6000, 2000],
      [3000, 2000],
      [3000, 4000],
      [0, 4000],
    ];
    const [a, b, c] = verticalsInside(L, [1000, 4500, 7000]);
    expect(a).toEqual([[0, 4000]]);
    expect(b).toEqual([[0, 2000]]);
    expect(c).toEqual([]);
    const [r] = horizontalsInside(L, [3000]);
    expect(r).toEqual([[0, 3000]]);
  });

  it('agrees with polygon-clipping on random simple polygons', () => {
    fc.assert(
      fc.property(
        starArb,
        fc.array(fc.integer({ min: -9000, max: 9000 }), { minLength: 1, maxLength: 20 }),
        (ring, xs) => {
          const ys = ring.map((p) => p[1]);
          const range: [number, number] = [Math.min(...ys), Math.max(...ys)];
          const got = verticalsInside(ring, xs);
          xs.forEach((x, i) => {
            if (ring.some((p) => Math.abs(p[0] - x) < 2)) return;
            // Lines within a strip's width of each other share a strip by design (see clip.ts).
            if (xs.some((o, k) => k !== i && Math.abs(o - x) < 2)) return;
            const ours = got[i].reduce((s, [a, b]) => s + (b - a), 0);
            const theirs = insideLengthByArea(ring, x, range);
            // Two float libraries on a 2 mm strip: agree within 2 mm.
            expect(Math.abs(ours - theirs)).toBeLessThan(2);
            // And against the exact scanline: Clipper's 0.1 mm grid costs under half a millimetre.
            const exact = scanRing(
              ring.map((p) => [p[1], p[0]] as Pt),
              x,
            ).reduce((s, [a, b]) => s + (b - a), 0);
            expect(Math.abs(ours - exact)).toBeLessThan(0.5);
          });
        },
      ),
      { numRuns: propertyRuns(100) },
    );
  }, 600_000);
});
