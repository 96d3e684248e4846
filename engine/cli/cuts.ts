// Command line: `npm run cuts -- pieces.json` prints the optimised cut list as JSON; bad input goes to stderr with a non-zero exit.
import { readFileSync } from 'node:fs';
import { solveCutList } from '../cutlist';

function fail(message: string): never {
  process.stderr.write(`cuts: ${message}\n`);
  process.exit(1);
}

/** Reads the pieces file named on the command line ("-" for standard input) and prints its cut list. */
function main(argv: string[]): void {
  const file = argv[0];
  if (!file || argv.length > 1)
    fail(
      'usage: npm run cuts -- pieces.json   (input: { "stockMm": 4800 | [..], "kerfMm": 3, "pieces": [{ "lengthMm": 1200, "qty": 4 }], "minOffcutMm"?, "offcuts"?: [..] })',
    );
  let text: string;
  try {
    text = readFileSync(file === '-' ? 0 : file, 'utf8');
  } catch (e) {
    fail(`cannot read ${file}: ${(e as Error).message}`);
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (e) {
    fail(`${file} is not valid JSON: ${(e as Error).message}`);
  }
  let result;
  try {
    result = solveCutList(input as Parameters<typeof solveCutList>[0]);
  } catch (e) {
    fail((e as Error).message);
  }
  if (result.tooLong?.length)
    fail(
      `pieces longer than the longest stock cannot be cut: ${[...new Set(result.tooLong)].join(', ')} mm (split them first)`,
    );
  process.stdout.write(JSON.stringify(result, null, 2) + '\n');
}

main(process.argv.slice(2));
