// A full-page message for dead ends (403, 404): what happened, and a way back.
import type { ReactNode } from 'react';
import { Logo } from '@/components/ui/Logo';

export function StatusPage({
  code,
  title,
  children,
  actions,
}: {
  code: string;
  title: string;
  children: ReactNode;
  actions: ReactNode;
}) {
  return (
    <div className="flex min-h-dvh flex-col items-center justify-center gap-8 px-4 py-10">
      <Logo size={36} />
      <div className="w-full max-w-lg rounded-2xl border border-ash-200 bg-white p-6 text-center shadow-card sm:p-10">
        <p className="font-mono text-sm font-semibold tracking-widest text-larch-700">{code}</p>
        <h1 className="mt-2 text-2xl font-bold tracking-tight text-ash-950">{title}</h1>
        <div className="mt-3 text-ash-700">{children}</div>
        <div className="mt-6 flex flex-col justify-center gap-2 sm:flex-row">{actions}</div>
      </div>
    </div>
  );
}
