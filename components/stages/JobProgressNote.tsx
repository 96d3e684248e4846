'use client';
// One line under a job in the list: the furthest build stage reached, the quote's state and
// whether the deposit is in. All rows of a list share one request (same query key).
import { useQuery } from '@tanstack/react-query';
import { fetchJson } from '@/components/ui/fetchJson';
import type { JobProgress } from '@/lib/server/jobProgress';

const quoteWords = {
  draft: 'quote in draft',
  sent: 'quote sent',
  accepted: 'quote accepted',
  declined: 'quote declined',
  expired: 'quote expired',
} as const;

export function JobProgressNote({ jobId, ids }: { jobId: string; ids: string[] }) {
  const key = [...ids].sort().join(',');
  const progress = useQuery({
    queryKey: ['job-progress', key],
    queryFn: ({ signal }) =>
      fetchJson<Record<string, JobProgress>>(`/api/jobs/progress?ids=${key}`, { signal }),
    staleTime: 30_000,
  });
  const p = progress.data?.[jobId];
  if (!p || (!p.stage && !p.quote)) return null;
  const parts = [
    p.stage ? `${p.stage.label} done` : null,
    p.quote ? (p.quote.paid ? 'deposit paid' : quoteWords[p.quote.status]) : null,
  ].filter(Boolean);
  return (
    <span className="mt-1 block text-xs font-medium text-ash-700" data-testid="job-progress">
      {parts.join(' · ')}
    </span>
  );
}
