import type { ReactNode } from 'react';
import { Logo } from '@/components/ui/Logo';

// Signed-out pages: the brand on a spruce panel beside (or, on a phone, above) the form.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="grid min-h-dvh grid-cols-1 grid-rows-[auto_1fr] lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)] lg:grid-rows-1">
      <section className="relative overflow-hidden bg-spruce-800 px-6 py-6 text-white sm:px-10 lg:py-12">
        <BoardPattern />
        <div className="relative flex h-full flex-col gap-6 lg:justify-between">
          <div>
            <Logo tone="light" size={40} />
            <p className="mt-3 max-w-md text-spruce-100 lg:hidden">
              Deck frames laid out and checked as you sketch on site.
            </p>
          </div>
          <div className="hidden max-w-md lg:block">
            <h2 className="text-3xl font-semibold leading-tight tracking-tight">
              Sketch the deck on site. The frame lays itself out and checks itself as you draw.
            </h2>
            <ul className="mt-6 space-y-3 text-spruce-100">
              <li className="flex gap-3">
                <Dot /> Joists, support rows, noggins and pads placed to the product’s spans
              </li>
              <li className="flex gap-3">
                <Dot /> Over-span, cantilever, step and guard checks before anything is ordered
              </li>
              <li className="flex gap-3">
                <Dot /> A framing plan the crew can build from, a cut list and the order
              </li>
            </ul>
          </div>
          <p className="hidden text-sm text-spruce-200 lg:block">
            Checks are guidance. Local building codes and a qualified engineer decide.
          </p>
        </div>
      </section>
      <section className="flex items-start justify-center px-4 py-8 sm:px-8 sm:py-12 lg:items-center">
        <div className="w-full max-w-md">{children}</div>
      </section>
    </div>
  );
}

function Dot() {
  return <span className="mt-2 size-2 shrink-0 rounded-full bg-larch-300" aria-hidden="true" />;
}

/** Faint deck boards (140 mm wide, 5 mm gaps, staggered butt joints) behind the brand panel. */
function BoardPattern() {
  const rows = Array.from({ length: 40 }, (_, i) => i);
  return (
    <svg
      className="pointer-events-none absolute inset-0 h-full w-full opacity-[0.07]"
      preserveAspectRatio="xMidYMid slice"
      viewBox="0 0 600 800"
      aria-hidden="true"
    >
      {rows.map((i) => {
        const y = i * 20;
        const joint = 60 + ((i * 227) % 480);
        return (
          <g key={i} fill="#e3b783">
            <rect x="-10" y={y} width={joint + 8} height="18" rx="1.5" />
            <rect x={joint + 2} y={y} width={620 - joint} height="18" rx="1.5" />
          </g>
        );
      })}
    </svg>
  );
}
