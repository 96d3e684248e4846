import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '..', '..');
const dir = join(root, '.tmp', 'cuts-cli-test');

/** Runs `tsx engine/cli/cuts.ts <file>` the way `npm run cuts -- file` does. */
function cuts(content: string | null, name = 'pieces.json') {
  mkdirSync(dir, { recursive: true });
  const file = join(dir, name);
  if (content !== null) writeFileSync(file, content);
  const r = spawnSync(
    join(root, 'node_modules', '.bin', 'tsx'),
    [join(root, 'engine', 'cli', 'cuts.ts'), file],
    {
      encoding: 'utf8',
      timeout: 60_000,
    },
  );
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('npm run cuts', () => {
  it('prints the cut list of the example input as JSON', () => {
    const r = cuts(
      JSON.stringify({ stockMm: 4800, kerfMm: 3, pieces: [{ lengthMm: 1200, qty: 4 }] }),
    );
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    // 4 x 1200 + 3 kerfs = 4809 mm: one bar short, so two bars (kerf model in engine/cutlist/model.ts).
    expect(out.count).toBe(2);
    expect(out.stock.flatMap((s: { cuts: number[] }) => s.cuts)).toEqual([1200, 1200, 1200, 1200]);
    expect(out.stock[0]).toEqual({
      stockMm: 4800,
      cuts: [1200, 1200, 1200],
      offcutMm: 4800 - 3600 - 9,
    });
    expect(out.lowerBound).toBe(2);
    expect(out.optimal).toBe(true);
  }, 60_000);

  it('takes a list of stock lengths', () => {
    const r = cuts(
      JSON.stringify({ stockMm: [3000, 4800], kerfMm: 3, pieces: [{ lengthMm: 2900, qty: 2 }] }),
      'list.json',
    );
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).stock.map((s: { stockMm: number }) => s.stockMm)).toEqual([
      3000, 3000,
    ]);
  }, 60_000);

  it.each([
    ['{ not json', /not valid JSON/],
    [
      JSON.stringify({ stockMm: 4800, kerfMm: 3, pieces: [{ lengthMm: 0, qty: 1 }] }),
      /lengthMm must be more than 0/,
    ],
    [
      JSON.stringify({ stockMm: 3000, kerfMm: 3, pieces: [{ lengthMm: 3600, qty: 1 }] }),
      /longer than the longest stock/,
    ],
  ])(
    'refuses bad input with a clear message and a non-zero exit: %s',
    (content, message) => {
      const r = cuts(content, 'bad.json');
      expect(r.code).not.toBe(0);
      expect(r.err).toMatch(message);
      expect(r.out).toBe('');
    },
    60_000,
  );

  it('says so when the file is missing', () => {
    const r = cuts(null, 'missing.json');
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(/cannot read/);
  }, 60_000);
});
