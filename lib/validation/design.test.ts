import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/engine/schema';
import { designCreateSchema, designSaveSchema } from './design';

describe('designCreateSchema', () => {
  it('needs only a name (the server supplies the starter document)', () => {
    expect(designCreateSchema.parse({ name: ' Option A ' })).toEqual({ name: 'Option A' });
  });
  it('refuses a blank name', () => {
    expect(designCreateSchema.safeParse({ name: ' ' }).success).toBe(false);
  });
  it('fills document defaults through the engine schema', () => {
    const { document } = designCreateSchema.parse({
      name: 'x',
      document: {
        version: 1,
        outline: [
          [0, 0],
          [3000, 0],
          [3000, 2000],
        ],
        boardAngleDeg: 0,
        heightMm: 300,
        joistCentresMm: 400,
        borderCourses: 0,
        joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
        board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
      },
    });
    expect(document?.supports).toEqual([]);
    expect(document?.stairCentresMm).toBe(300);
  });
});

describe('designSaveSchema', () => {
  it('accepts the example with a version', () => {
    expect(designSaveSchema.parse({ version: 3, document: exampleDesign() }).version).toBe(3);
  });
  it.each([
    [{ document: exampleDesign() }, 'version'],
    [{ version: 0, document: exampleDesign() }, 'version'],
    [{ version: 1.5, document: exampleDesign() }, 'version'],
    [{ version: 1 }, 'document'],
    [
      { version: 1, document: { ...exampleDesign(), joistCentresMm: 50 } },
      'document.joistCentresMm',
    ],
    [{ version: 1, document: { ...exampleDesign(), outline: [[0, 0]] } }, 'document.outline'],
    [{ version: 1, document: exampleDesign(), name: '' }, 'name'],
  ])('refuses %#', (input, path) => {
    const r = designSaveSchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path.join('.')).toBe(path);
  });
});
