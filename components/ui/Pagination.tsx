'use client';
// "21–40 of 43" with previous / next page buttons.
import { Button } from './Button';

export function Pagination({
  page,
  pageSize,
  total,
  noun = 'items',
  onPage,
}: {
  page: number;
  pageSize: number;
  total: number;
  noun?: string;
  onPage: (page: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav
      aria-label="Pages"
      className="flex flex-wrap items-center justify-between gap-3 text-sm text-ash-700"
    >
      <p aria-live="polite">
        {total === 0 ? (
          `No ${noun}`
        ) : (
          <>
            <span className="font-semibold text-ash-900">
              {first}–{last}
            </span>{' '}
            of <span className="font-semibold text-ash-900">{total}</span> {noun}
          </>
        )}
      </p>
      {pages > 1 ? (
        <div className="flex items-center gap-2">
          <Button
            variant="secondary"
            size="sm"
            onClick={() => onPage(page - 1)}
            disabled={page <= 1}
          >
            ‹ Previous
          </Button>
          <span className="px-1 tabular-nums">
            Page {page} of {pages}
          </span>
          <Button
            variant="secondary"
            size="sm"
            onClick={() => onPage(page + 1)}
            disabled={page >= pages}
          >
            Next ›
          </Button>
        </div>
      ) : null}
    </nav>
  );
}
