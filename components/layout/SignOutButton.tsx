'use client';
// Ends the session and returns to the sign-in page.
import { signOut } from 'next-auth/react';
import { useState } from 'react';

export function SignOutButton() {
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      disabled={busy}
      onClick={() => {
        setBusy(true);
        void signOut({ callbackUrl: '/sign-in' });
      }}
      title="Sign out"
      className="flex min-h-11 min-w-11 items-center justify-center gap-2 rounded-lg border border-white/20 px-2.5 text-sm font-semibold text-white hover:bg-white/10 disabled:opacity-60 sm:px-3"
    >
      <svg viewBox="0 0 20 20" className="size-5 sm:size-4" aria-hidden="true">
        <path
          d="M8 4H5a1 1 0 0 0-1 1v10a1 1 0 0 0 1 1h3M12 6l4 4-4 4M16 10H8"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
      <span className="sr-only sm:not-sr-only">Sign out</span>
    </button>
  );
}
