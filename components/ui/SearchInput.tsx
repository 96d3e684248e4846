'use client';
// A search box with a clear button; the caller debounces.
import type { InputHTMLAttributes } from 'react';
import { controlClasses } from './controlClasses';

type Props = Omit<InputHTMLAttributes<HTMLInputElement>, 'onChange' | 'value' | 'type'> & {
  value: string;
  onValueChange: (value: string) => void;
  label: string;
};

export function SearchInput({ value, onValueChange, label, className = '', ...rest }: Props) {
  return (
    <div className={`relative ${className}`}>
      <svg
        viewBox="0 0 20 20"
        className="pointer-events-none absolute left-3 top-1/2 size-5 -translate-y-1/2 text-ash-500"
        aria-hidden="true"
      >
        <path
          d="M8.5 3a5.5 5.5 0 1 1 0 11 5.5 5.5 0 0 1 0-11Zm4.2 9.7L17 17"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
        />
      </svg>
      <input
        type="search"
        aria-label={label}
        value={value}
        onChange={(e) => onValueChange(e.target.value)}
        className={`${controlClasses} pl-10 pr-11 [&::-webkit-search-cancel-button]:hidden`}
        {...rest}
      />
      {value ? (
        <button
          type="button"
          onClick={() => onValueChange('')}
          className="absolute right-0 top-0 grid min-h-11 min-w-11 place-items-center rounded-r-lg text-ash-500 hover:text-ash-800"
          aria-label="Clear search"
        >
          <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
            <path
              d="M5 5l10 10M15 5 5 15"
              stroke="currentColor"
              strokeWidth="2"
              strokeLinecap="round"
            />
          </svg>
        </button>
      ) : null}
    </div>
  );
}
