import { describe, expect, it } from 'vitest';
import { formatLength, parseLength } from './units';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
describe('formatLength', () => {
  it.each([
    [4800, 'metric', '4 800 mm'],
    [25.4, 'imperial', '1"'],
    [304.8, 'imperial', `1' 0"`],
    [4800, 'imperial', `15' 9"`],
    [196, 'imperial', '7 3/4"'],
  ] as const)('%d mm in %s is %s', (mm, sys, text) => {
    expect(formatLength(mm, sys).replace('\u2009', ' ')).toBe(text);
  });
});

describe('parseLength', () => {
  it.each([
    ['4800', 'metric', 4800],
    ['4.8m', 'metric', 4800],
    ['480 cm', 'metric', 4800],
    [`15' 9"`, 'metric', (15 * 12 + 9) * 25.4],
    ['15ft 9 1/2in', 'imperial', (15 * 12 + 9.5) * 25.4],
    ['10', 'imperial', 254],
    ['4800 mm', 'imperial', 4800],
  ] as const)('%s (%s) is %d mm', (text, sys, mm) => {
    expect(parseLength(text, sys)).toBeCloseTo(mm, 6);
  });

  it.each(['', 'abc', '10 parsecs', '3/0"'])('rejects %j', (text) => {
    expect(parseLength(text, 'imperial')).toBeNull();
  });
});
