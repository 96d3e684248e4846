'use client';
// Every saved revision of a quote, newest first, with its total at the time.
import { useQuery } from '@tanstack/react-query';
import { fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime } from '@/components/ui/formatDate';
import { formatMoney, quoteTotals } from '@/lib/quote/totals';
import type { QuoteLine } from '@/lib/validation/quote';

type Revision = {
  revision: number;
  savedAt: string;
  snapshot: {
    lines: QuoteLine[];
    currency: string;
    marginPercent: number;
    taxLabel: string;
    taxRatePercent: number;
    depositPercent: number;
    status: string;
  };
};

export function QuoteRevisions({ quoteId, current }: { quoteId: string; current: number }) {
  const revs = useQuery({
    queryKey: ['quote-revisions', quoteId, current],
    queryFn: ({ signal }) => fetchJson<Revision[]>(`/api/quotes/${quoteId}/revisions`, { signal }),
  });
  if (!revs.data || revs.data.length < 2) return null;
  return (
    <details className="rounded-xl border border-ash-200 bg-white p-4 text-sm">
      <summary className="cursor-pointer font-semibold text-ash-900">
        Earlier revisions ({revs.data.length - 1})
      </summary>
      <ul className="mt-2 divide-y divide-ash-100">
        {revs.data.map((r) => (
          <li key={r.revision} className="flex justify-between gap-2 py-1.5">
            <span>
              Revision {r.revision} · {formatDateTime(r.savedAt)}
            </span>
            <span className="tabular-nums">
              {formatMoney(
                quoteTotals(r.snapshot.lines, {
                  marginPercent: Number(r.snapshot.marginPercent),
                  taxLabel: r.snapshot.taxLabel,
                  taxRatePercent: Number(r.snapshot.taxRatePercent),
                  depositPercent: Number(r.snapshot.depositPercent),
                }).total,
                r.snapshot.currency,
              )}
            </span>
          </li>
        ))}
      </ul>
    </details>
  );
}
