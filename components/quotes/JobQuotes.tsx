'use client';
// The job's quotes: status, total, deposit, and a new quote from the latest design's take-off.
import { useQuery } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import Link from 'next/link';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { Input } from '@/components/ui/Input';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDate } from '@/components/ui/formatDate';
import { formatMoney } from '@/lib/quote/totals';
import type { QuoteView } from '@/lib/server/quotes';
import { QuoteStatusBadge } from './QuoteStatusBadge';

export function JobQuotes({ jobId }: { jobId: string }) {
  const router = useRouter();
  const [days, setDays] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const quotes = useQuery({
    queryKey: ['job-quotes', jobId],
    queryFn: ({ signal }) => fetchJson<QuoteView[]>(`/api/jobs/${jobId}/quotes`, { signal }),
  });

  async function create() {
    setBusy(true);
    setError(null);
    try {
      const d = Number(days);
      const q = await fetchJson<QuoteView>(`/api/jobs/${jobId}/quotes`, {
        method: 'POST',
        json: days.trim() && Number.isFinite(d) ? { labourDays: d } : {},
      });
      router.push(`/jobs/${jobId}/quotes/${q.id}`);
    } catch (err) {
      setError(errorMessage(err));
      setBusy(false);
    }
  }

  return (
    <Card title="Quotes" id="quotes">
      <div className="flex flex-col gap-4">
        {error ? <Alert tone="error">{error}</Alert> : null}
        {quotes.isError ? <Alert tone="error">{errorMessage(quotes.error)}</Alert> : null}
        {quotes.data && quotes.data.length > 0 ? (
          <ul className="divide-y divide-ash-100">
            {quotes.data.map((q) => (
              <li key={q.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link
                  href={`/jobs/${jobId}/quotes/${q.id}`}
                  className="font-semibold text-spruce-800 underline-offset-2 hover:underline"
                >
                  {q.reference} · {q.title}
                </Link>
                <span className="flex items-center gap-3 text-sm text-ash-700">
                  <QuoteStatusBadge status={q.status} />
                  <span className="tabular-nums">{formatMoney(q.totals.total, q.currency)}</span>
                  {q.payment?.status === 'paid' ? (
                    <span className="font-semibold text-spruce-800" data-testid="deposit-paid">
                      Deposit paid {q.payment.paidAt ? formatDate(q.payment.paidAt) : ''}
                    </span>
                  ) : null}
                </span>
              </li>
            ))}
          </ul>
        ) : quotes.data ? (
          <p className="text-sm text-ash-700">No quotes yet.</p>
        ) : null}
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void create();
          }}
        >
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Crew days (blank: price labour by area)
            <Input
              type="number"
              min={0}
              step={0.5}
              inputMode="decimal"
              value={days}
              onChange={(e) => setDays(e.target.value)}
              className="w-40"
            />
          </label>
          <Button type="submit" busy={busy}>
            New quote from the design
          </Button>
        </form>
      </div>
    </Card>
  );
}
