// The quote's status as a small label, in words (never colour alone).
import type { QuoteStatus } from '@/lib/validation/quote';

const styles: Record<QuoteStatus, string> = {
  draft: 'bg-ash-100 text-ash-800',
  sent: 'bg-tarn-100 text-tarn-800',
  accepted: 'bg-spruce-50 text-spruce-900',
  declined: 'bg-clay-50 text-clay-800',
  expired: 'bg-larch-50 text-larch-900',
};

const labels: Record<QuoteStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
};

export function QuoteStatusBadge({ status }: { status: QuoteStatus }) {
  return (
    <span
      className={`inline-flex rounded-full px-2 py-0.5 text-xs font-semibold ${styles[status]}`}
    >
      {labels[status]}
    </span>
  );
}
