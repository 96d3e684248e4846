import { describe, expect, it } from 'vitest';
import { exampleDesign, planFrame } from '@/engine';
import { formatMoney, groupLines, groupOf, quantityText } from './materialsTable';

describe('groupOf', () => {
  it.each([
    ['joist', 'frame'],
    ['beam', 'frame'],
    ['board', 'boards'],
    ['borderBoard', 'boards'],
    ['clip', 'fixings'],
    ['screw', 'fixings'],
    ['block', 'footings'],
    ['concrete', 'footings'],
    ['post', 'footings'],
    ['membrane', 'sundries'],
  ])('puts a %s line under %s', (product, group) => {
    expect(groupOf({ product, key: 'x' })).toBe(group);
  });

  it('falls back to sundries for a line it does not know', () => {
    expect(groupOf({ key: 'delivery' })).toBe('sundries');
  });
});

describe('groupLines', () => {
  it('keeps every line of a real take-off exactly once, frame first', () => {
    const lines = planFrame(exampleDesign()).quantities.map((q, i) => ({ ...q, amount: i + 0.5 }));
    const groups = groupLines(lines);
    expect(groups.flatMap((g) => g.lines).length).toBe(lines.length);
    expect(new Set(groups.flatMap((g) => g.lines.map((l) => l.key))).size).toBe(lines.length);
    expect(groups[0].group).toBe('frame');
    const total = groups.reduce((s, g) => s + g.amount, 0);
    expect(total).toBeCloseTo(
      lines.reduce((s, l) => s + l.amount, 0),
      6,
    );
  });
});

describe('formatting', () => {
  it('writes money in the firm currency and quantities with their unit', () => {
    expect(formatMoney(1234.5, 'GBP')).toBe('£1,234.50');
    expect(quantityText(62, 'length')).toBe('62 lengths');
    expect(quantityText(0.857, 'm3')).toBe('0.86 m³');
  });
});
