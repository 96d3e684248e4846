import type { ReactNode } from 'react';
import { AppHeader } from '@/components/layout/AppHeader';
import { requireUser } from '@/components/layout/currentUser';

// The signed-in shell. The proxy already turns strangers away; this check is the second lock.
export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const user = await requireUser();
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-lg bg-white px-4 py-3 font-semibold text-spruce-900 focus:not-sr-only focus:fixed focus:left-3 focus:top-3"
      >
        Skip to content
      </a>
      <AppHeader user={user} />
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-3 py-5 sm:px-5 sm:py-7">
        {children}
      </main>
      <footer className="border-t border-ash-200 py-4 text-center text-xs text-ash-600">
        Joistwright · frame checks are guidance; local building codes and a qualified engineer
        decide.
      </footer>
    </div>
  );
}
