// Golden fixtures: each engine/fixtures/*.design.json must still plan to its *.plan.json (REGEN=1 rewrites them).
import { readdirSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layoutFrame, parseDesign } from './index';

const DIR = join(__dirname, 'fixtures');
const REGEN = process.env.REGEN === '1';

/** Rounds every number to 0.1 mm so float noise does not churn the fixtures. */
function rounded(v: unknown): unknown {
  if (typeof v === 'number') return Math.round(v * 10) / 10 + 0; // + 0 turns -0 into 0
  if (Array.isArray(v)) return v.map(rounded);
  if (v && typeof v === 'object') {
    return Object.fromEntries(
      Object.entries(v as Record<string, unknown>)
        .filter(([, x]) => x !== undefined)
        .map(([k, x]) => [k, rounded(x)]),
    );
  }
  return v;
}

describe('golden frame plans (layout without the take-off, which has its own tests)', () => {
  const names = readdirSync(DIR)
    .filter((f) => f.endsWith('.design.json'))
    .map((f) => f.replace(/\.design\.json$/, ''));

  it('has fixtures to check', () => {
    expect(names.length).toBeGreaterThanOrEqual(5);
  });

  for (const name of names) {
    it(name, () => {
      const parsed = parseDesign(
        JSON.parse(readFileSync(join(DIR, `${name}.design.json`), 'utf8')),
      );
      if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
      const plan = rounded(layoutFrame(parsed.design));
      const file = join(DIR, `${name}.plan.json`);
      if (REGEN || !existsSync(file)) {
        if (!REGEN) throw new Error(`${file} is missing: run with REGEN=1 to write it`);
        writeFileSync(file, `${JSON.stringify(plan, null, 1)}\n`);
      }
      expect(plan).toEqual(JSON.parse(readFileSync(file, 'utf8')));
    });
  }
});
