// Regression designs: counterexamples the property tests once found, each checked against every engine invariant.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseDesign, planFrame } from './index';
import * as inv from './testing/invariants';

const DIR = join(__dirname, 'fixtures');

/** Each saved counterexample and the invariant it broke (the others must hold on it too). */
const CASES: Record<string, { broke: string; why: string }> = {
  'regression-reflex-corner-trim': {
    broke: 'boardGaps',
    why: 'a joist just past a reflex corner stopped at the inner face of the wrong rim, 31 mm short of the course over it',
  },
  'regression-steep-edge-trim': {
    broke: 'boardGaps',
    why: 'a joist starting on an edge nearly parallel to the joists was trimmed by the 1000 mm cap and dropped, leaving a board gap wider than the centres',
  },
  'regression-pair-past-steep-rim': {
    broke: 'buttJoints',
    why: 'a pair joist followed a steep rim slope 1100 mm back past a corner and no longer reached the two butt joints it was for',
  },
  'regression-sliver-rim-off-deck': {
    broke: 'insideOutline',
    why: 'a triangle 25 mm thick at one corner: the mitred rim centreline folded past the opposite edge and was still framed, off the deck',
  },
  'regression-last-course-on-rim-face': {
    broke: 'boardGaps',
    why: 'the last, narrow course is centred exactly on the rim face and the joist ends; the check once read that edge by float noise (a test fix, the plan was sound)',
  },
  'regression-pair-across-notch': {
    broke: 'buttJoints',
    why: 'a pair joist beside a reflex corner of an L kept only the longest inside piece, in the other arm, away from its three joints',
  },
};

const INVARIANTS = [
  'insideOutline',
  'stockLengths',
  'boardGaps',
  'joistSpans',
  'buttJoints',
  'joistJoins',
] as const;

describe('regression designs from the property tests', () => {
  const files = readdirSync(DIR)
    .filter((f) => /^regression-.*\.json$/.test(f))
    .map((f) => f.replace(/\.json$/, ''));

  it('has a described case for every regression fixture, and a fixture for every case', () => {
    expect(files.sort()).toEqual(Object.keys(CASES).sort());
  });

  for (const name of files) {
    describe(`${name} (${CASES[name]?.why ?? 'undescribed'})`, () => {
      const parsed = parseDesign(JSON.parse(readFileSync(join(DIR, `${name}.json`), 'utf8')));
      if (!parsed.ok) throw new Error(`${name}: ${JSON.stringify(parsed.errors)}`);
      const design = parsed.design;

      it('frames it (the outline is valid) and carries the standing caution', () => {
        expect(inv.planOf(design)).not.toBeNull();
        inv.caution(design, planFrame(design));
      });

      for (const check of INVARIANTS) {
        const label = check === CASES[name]?.broke ? `${check} (the one it broke)` : check;
        it(label, () => {
          const plan = inv.planOf(design);
          expect(plan).not.toBeNull();
          inv[check](design, plan!);
        });
      }
    });
  }
});
