// Command line: `npm run frame -- design.json` prints the frame plan as JSON; bad input goes to stderr with a non-zero exit.
import { readFileSync } from 'node:fs';
import { parseDesign, planFrame } from '../index';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

const file = process.argv[2];
if (!file) fail('Usage: npm run frame -- path/to/design.json');
let text: string;
try {
  text = readFileSync(file, 'utf8');
} catch (e) {
  fail(`Cannot read ${file}: ${(e as Error).message}`);
}
let raw: unknown;
try {
  raw = JSON.parse(text);
} catch (e) {
  fail(`${file} is not valid JSON: ${(e as Error).message}`);
}
const parsed = parseDesign(raw);
if (!parsed.ok) {
  const lines = parsed.errors.map((e) => `  ${e.path || '(document)'}: ${e.message}`);
  fail(`${file} is not a valid design document:\n${lines.join('\n')}`);
}
process.stdout.write(`${JSON.stringify(planFrame(parsed.design), null, 2)}\n`);
