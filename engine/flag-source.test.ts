// A flag cites where its limit came from: the chosen product's table when the design names one.
import { describe, expect, it } from 'vitest';
import { planFrame } from './index';
import { exampleDesign } from './schema';

// A user support row pair 2.4 m apart under a joist allowed 1.5 m: the span check must fire.
function overSpanDesign() {
  const d = exampleDesign();
  d.supports = [
    { a: [0, 50], b: [6000, 50], kind: 'blocks' },
    { a: [0, 2450], b: [6000, 2450], kind: 'blocks' },
    { a: [0, 3950], b: [6000, 3950], kind: 'blocks' },
  ];
  return d;
}

describe('span flags name the source of their limit', () => {
  it('cites common practice when the joist comes from the design settings (PRODUCT.md section 3)', () => {
    const flag = planFrame(overSpanDesign()).flags.find((f) => f.code === 'joist-span');
    expect(flag?.source).toBe('common practice');
  });

  it("cites the maker's table and its working when a catalogue product set the limit", () => {
    const d = overSpanDesign();
    d.joist = {
      ...d.joist,
      source: "maker's span table (Example joist, 400 mm centres)",
      limitExplain: 'Table row 400 mm centres: 1500 mm.',
    };
    const flag = planFrame(d).flags.find((f) => f.code === 'joist-span');
    expect(flag?.source).toBe("maker's span table (Example joist, 400 mm centres)");
    expect(flag?.explain).toContain('Table row 400 mm centres: 1500 mm.');
  });
});
