'use client';
// A square toolbar button (44 px) with an icon, a label for screen readers and a tooltip with its shortcut.
import type { ButtonHTMLAttributes, ReactNode } from 'react';

type Props = ButtonHTMLAttributes<HTMLButtonElement> & {
  label: string;
  hint?: string;
  active?: boolean;
  children: ReactNode;
  showLabel?: boolean;
};

export function ToolButton({
  label,
  hint,
  active,
  children,
  showLabel,
  className = '',
  ...rest
}: Props) {
  return (
    <button
      type="button"
      aria-label={label}
      aria-pressed={active === undefined ? undefined : active}
      title={hint ? `${label} (${hint})` : label}
      className={
        'inline-flex min-h-11 min-w-11 shrink-0 items-center justify-center gap-1.5 rounded-lg px-2 text-sm font-semibold ' +
        'transition-colors disabled:cursor-not-allowed disabled:opacity-40 ' +
        (active
          ? 'bg-spruce-700 text-white shadow-sm'
          : 'text-spruce-900 hover:bg-spruce-50 active:bg-spruce-100') +
        ` ${className}`
      }
      {...rest}
    >
      {children}
      {showLabel ? <span>{label}</span> : null}
    </button>
  );
}

/** Small line icons of our own (24 px grid, stroke = currentColor). */
export function Icon({ d, className = 'size-5' }: { d: string; className?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      className={className}
      aria-hidden="true"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <path d={d} />
    </svg>
  );
}

export const icons = {
  select: 'M5 3l12 9-5 1 3 6-2.5 1-3-6L5 17z',
  outline: 'M4 18L6 5l12 2 2 11zM4 18h0',
  support: 'M3 10h18M3 14h18M6 10v4M12 10v4M18 10v4',
  undo: 'M9 7L4 12l5 5M4 12h11a5 5 0 010 10h-3',
  redo: 'M15 7l5 5-5 5M20 12H9a5 5 0 000 10h3',
  trash: 'M4 7h16M9 7V4h6v3M6 7l1 13h10l1-13',
  fit: 'M4 9V4h5M20 9V4h-5M4 15v5h5M20 15v5h-5',
  plus: 'M12 5v14M5 12h14',
  minus: 'M5 12h14',
  boards: 'M3 6h18M3 10h18M3 14h18M3 18h18',
  grid: 'M4 4h16v16H4zM4 10h16M4 16h16M10 4v16M16 4v16',
  angle: 'M4 20h16M4 20L16 8',
  point: 'M12 12m-3 0a3 3 0 106 0 3 3 0 10-6 0M12 3v3M12 18v3M3 12h3M18 12h3',
  dims: 'M4 8v8M20 8v8M4 12h16',
} as const;
