// Dates as people on site read them: "1 Dec 2026, 14:02" and "3 hours ago".
const dateTime = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});
const dateOnly = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
});
const relative = new Intl.RelativeTimeFormat('en-GB', { numeric: 'auto' });

function toDate(value: string | Date): Date | null {
  const d = value instanceof Date ? value : new Date(value);
  return Number.isNaN(d.getTime()) ? null : d;
}

/** "1 Dec 2026, 14:02" (or "—" when the value is not a date). */
export function formatDateTime(value: string | Date): string {
  const d = toDate(value);
  return d ? dateTime.format(d) : '—';
}

/** "1 Dec 2026". */
export function formatDate(value: string | Date): string {
  const d = toDate(value);
  return d ? dateOnly.format(d) : '—';
}

/** "just now", "5 minutes ago", "yesterday", then the date itself after a week. */
export function formatRelative(value: string | Date, now: Date = new Date()): string {
  const d = toDate(value);
  if (!d) return '—';
  const seconds = Math.round((d.getTime() - now.getTime()) / 1000);
  const abs = Math.abs(seconds);
  if (abs < 45) return 'just now';
  if (abs < 3600) return relative.format(Math.round(seconds / 60), 'minute');
  if (abs < 86_400) return relative.format(Math.round(seconds / 3600), 'hour');
  if (abs < 7 * 86_400) return relative.format(Math.round(seconds / 86_400), 'day');
  return dateOnly.format(d);
}
