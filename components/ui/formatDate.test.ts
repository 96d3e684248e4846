import { describe, expect, it } from 'vitest';
import { formatDate, formatRelative } from './formatDate';

describe('formatRelative', () => {
  const now = new Date('2026-12-01T12:00:00Z');
  it.each([
    ['2026-12-01T11:59:50Z', 'just now'],
    ['2026-12-01T11:55:00Z', '5 minutes ago'],
    ['2026-12-01T09:00:00Z', '3 hours ago'],
    ['2026-11-30T12:00:00Z', 'yesterday'],
    ['2026-11-28T12:00:00Z', '3 days ago'],
  ])('%s reads "%s"', (iso, expected) => {
    expect(formatRelative(iso, now)).toBe(expected);
  });

  it('falls back to the date after a week', () => {
    expect(formatRelative('2026-11-01T12:00:00Z', now)).toBe(formatDate('2026-11-01T12:00:00Z'));
  });

  it('shows a dash for a value that is not a date', () => {
    expect(formatRelative('not a date', now)).toBe('—');
  });
});
