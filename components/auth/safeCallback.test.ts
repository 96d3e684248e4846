import { describe, expect, it } from 'vitest';
import { safeCallback } from './safeCallback';

describe('safeCallback', () => {
  it.each([
    [undefined, '/jobs'],
    ['', '/jobs'],
    ['/jobs/123', '/jobs/123'],
    ['/settings?tab=team', '/settings?tab=team'],
    ['http://127.0.0.1:3000/designs/abc', '/designs/abc'],
    ['//evil.example/path', '/jobs'],
    ['/\\evil.example', '/jobs'],
    ['javascript:alert(1)', '/jobs'],
    ['/sign-in?callbackUrl=/jobs', '/jobs'],
    ['/api/jobs', '/jobs'],
  ])('%s -> %s', (input, expected) => {
    expect(safeCallback(input)).toBe(expected);
  });

  it('takes the first of repeated query values', () => {
    expect(safeCallback(['/settings', '/jobs'])).toBe('/settings');
  });
});
