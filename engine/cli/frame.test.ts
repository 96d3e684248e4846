// The frame command line: prints the plan for a good design, a located error for a bad one.
import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(__dirname, '..', '..');
const TMP = join(ROOT, '.tmp', 'engine-cli-test');

function frame(file: string) {
  return spawnSync(process.execPath, ['--import', 'tsx', join(ROOT, 'engine/cli/frame.ts'), file], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: 120_000,
  });
}

describe('npm run frame', () => {
  it('prints the frame plan of a design document as JSON', () => {
    const r = frame(join(ROOT, 'engine/fixtures/rect-6x4-border.design.json'));
    expect(r.status).toBe(0);
    const plan = JSON.parse(r.stdout);
    expect(plan.version).toBe(1);
    expect(plan.members.length).toBeGreaterThan(20);
    expect(plan.flags.some((f: { code: string }) => f.code === 'caution')).toBe(true);
  }, 120_000);

  it('explains bad input on stderr with the field paths and exits non-zero', () => {
    mkdirSync(TMP, { recursive: true });
    const bad = join(TMP, 'bad.json');
    writeFileSync(bad, JSON.stringify({ version: 1, outline: [[0, 0]], joistCentresMm: 50 }));
    const r = frame(bad);
    expect(r.status).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/outline: The outline needs at least three corners/);
    expect(r.stderr).toMatch(/joistCentresMm: Joist centres below 100 mm are not buildable/);
    const notJson = join(TMP, 'not.json');
    writeFileSync(notJson, '{ nope');
    expect(frame(notJson).stderr).toMatch(/not valid JSON/);
  }, 120_000);
});
