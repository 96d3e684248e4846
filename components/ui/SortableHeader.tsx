'use client';
// A table column header that sorts by its column; aria-sort tells screen readers the current order.
import type { ReactNode } from 'react';

export function SortableHeader<K extends string>({
  column,
  label,
  sort,
  dir,
  onSort,
  className = '',
}: {
  column: K;
  label: ReactNode;
  sort: K;
  dir: 'asc' | 'desc';
  onSort: (column: K) => void;
  className?: string;
}) {
  const active = sort === column;
  return (
    <th
      scope="col"
      aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : 'none'}
      className={`px-1 py-1 text-left ${className}`}
    >
      <button
        type="button"
        onClick={() => onSort(column)}
        className={`group inline-flex min-h-11 items-center gap-1.5 rounded-md px-2 text-xs font-semibold uppercase tracking-wide hover:bg-ash-100 ${
          active ? 'text-spruce-800' : 'text-ash-600'
        }`}
      >
        {label}
        <svg
          viewBox="0 0 12 12"
          className={`size-3 transition-transform ${active ? '' : 'opacity-0 group-hover:opacity-40'} ${
            active && dir === 'asc' ? 'rotate-180' : ''
          }`}
          aria-hidden="true"
        >
          <path d="M2 4.5 6 8.5l4-4" fill="none" stroke="currentColor" strokeWidth="1.8" />
        </svg>
      </button>
    </th>
  );
}
