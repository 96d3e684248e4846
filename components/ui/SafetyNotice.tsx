// The standing cautions shown beside every check, plan and export (PRODUCT.md section 3).
export const SAFETY_CAUTIONS = [
  'The checks are guidance, not a design approval.',
  'Local building codes and a qualified engineer decide what may be built.',
  'Raised decks need guards: check the height where people could fall.',
  'Check for buried services (cables, pipes, drains) before digging.',
] as const;

export function SafetyNotice({
  variant = 'full',
  className = '',
}: {
  variant?: 'full' | 'compact';
  className?: string;
}) {
  if (variant === 'compact') {
    return (
      <p
        data-testid="safety-notice"
        className={`rounded-lg border border-larch-200 bg-larch-50 px-3 py-2 text-xs text-larch-900 ${className}`}
      >
        <strong className="font-semibold">Please note:</strong> {SAFETY_CAUTIONS.join(' ')}
      </p>
    );
  }
  return (
    <aside
      data-testid="safety-notice"
      aria-label="Safety cautions"
      className={`rounded-xl border border-larch-200 bg-larch-50 p-4 text-sm text-larch-900 ${className}`}
    >
      <p className="flex items-center gap-2 font-semibold">
        <svg viewBox="0 0 20 20" className="size-5 text-larch-600" aria-hidden="true">
          <path
            fill="currentColor"
            d="M8.3 3.1a2 2 0 0 1 3.4 0l6.1 10.6A2 2 0 0 1 16.1 17H3.9a2 2 0 0 1-1.7-3.3L8.3 3.1ZM10 7a1 1 0 0 0-1 1v3a1 1 0 1 0 2 0V8a1 1 0 0 0-1-1Zm0 7.6a1.1 1.1 0 1 0 0-2.2 1.1 1.1 0 0 0 0 2.2Z"
          />
        </svg>
        Before you build
      </p>
      <ul className="mt-2 list-disc space-y-1 pl-5 marker:text-larch-500">
        {SAFETY_CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}
