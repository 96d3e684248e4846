'use client';
// What the colours and strokes on the plan mean (the same table the canvas draws from).
import { legendItems, palette } from '@/canvas/kinds/member/style';

function Swatch({ kind, color }: { kind: (typeof legendItems)[number]['swatch']; color: string }) {
  const common = { stroke: color, strokeWidth: 2.5, fill: 'none' } as const;
  return (
    <svg viewBox="0 0 32 16" className="h-4 w-8 shrink-0" aria-hidden="true">
      {kind === 'line' ? <line x1="2" y1="8" x2="30" y2="8" {...common} strokeWidth={3} /> : null}
      {kind === 'double' ? (
        <>
          <line x1="2" y1="6" x2="30" y2="6" {...common} strokeWidth={2} />
          <line x1="2" y1="10" x2="30" y2="10" {...common} strokeWidth={2} />
        </>
      ) : null}
      {kind === 'triple' ? (
        <>
          <line x1="2" y1="4" x2="30" y2="4" {...common} strokeWidth={2} />
          <line x1="2" y1="8" x2="30" y2="8" {...common} strokeWidth={2} />
          <line x1="2" y1="12" x2="30" y2="12" {...common} strokeWidth={2} />
        </>
      ) : null}
      {kind === 'dashed' ? (
        <line x1="2" y1="8" x2="30" y2="8" {...common} strokeDasharray="4 3" />
      ) : null}
      {kind === 'band' ? <rect x="2" y="4" width="28" height="8" fill={color} /> : null}
      {kind === 'square' ? (
        <rect x="11" y="3" width="10" height="10" fill={color} stroke={palette.padEdge} />
      ) : null}
      {kind === 'dot' ? <circle cx="16" cy="8" r="5" fill={color} /> : null}
      {kind === 'fill' ? (
        <rect x="2" y="3" width="28" height="10" rx="1" fill={color} stroke="rgba(0,0,0,0.15)" />
      ) : null}
    </svg>
  );
}

export function Legend() {
  return (
    <div data-testid="legend" className="flex flex-col gap-3 text-sm">
      <ul className="grid grid-cols-1 gap-1.5 sm:grid-cols-2">
        {legendItems.map((it) => (
          <li key={it.label} className="flex items-center gap-2">
            <Swatch kind={it.swatch} color={it.color} />
            {it.label}
          </li>
        ))}
      </ul>
      <ul className="flex flex-col gap-1.5">
        <li className="flex items-center gap-2">
          <span
            aria-hidden="true"
            className="flex size-5 items-center justify-center rounded-full bg-clay-600 text-xs font-bold text-white"
          >
            !
          </span>
          Over a limit (tap it for why)
        </li>
        <li className="flex items-center gap-2">
          <span
            aria-hidden="true"
            className="flex size-5 rotate-45 items-center justify-center bg-larch-500 text-xs font-bold text-white"
          >
            <span className="-rotate-45">!</span>
          </span>
          Worth checking
        </li>
        <li className="flex items-center gap-2">
          <span
            aria-hidden="true"
            className="flex size-5 items-center justify-center rounded-full border-2 border-tarn-500 text-xs font-bold text-tarn-500"
          >
            i
          </span>
          For information
        </li>
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className="flex w-8 justify-center">
            <span className="h-0.5 w-7 border-t-2 border-dashed border-ash-600" />
          </span>
          Dashed row outline: placed for you (drag one to take over)
        </li>
      </ul>
    </div>
  );
}
