// `npm run span -- spec.json`: prints the engineered allowable span of a rectangular joist as JSON.
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import { engineeredSpan, spanInputSchema } from '../span';

function fail(message: string): never {
  process.stderr.write(`span: ${message}\n`);
  process.exit(1);
}

const file = process.argv.slice(2).find((a) => a !== '--');
if (!file) fail('usage: npm run span -- path/to/spec.json');

let raw: unknown;
try {
  raw = JSON.parse(readFileSync(file, 'utf8'));
} catch (e) {
  fail(`cannot read ${file}: ${(e as Error).message}`);
}

const parsed = spanInputSchema.safeParse(raw);
if (!parsed.success) fail(`bad input in ${file}:\n${z.prettifyError(parsed.error)}`);

try {
  const r = engineeredSpan(parsed.data);
  const round = (v: number) => (Number.isFinite(v) ? Math.round(v * 10) / 10 : null);
  const out = {
    allowableSpanMm: round(r.allowableSpanMm),
    governs: r.governs,
    bendingSpanMm: round(r.bendingSpanMm),
    deflectionSpanMm: round(r.deflectionSpanMm),
    shearSpanMm: round(r.shearSpanMm),
  };
  process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
} catch (e) {
  fail((e as Error).message);
}
