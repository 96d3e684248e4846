// The client's view of a quote: the firm, the plan outline, the priced lines, totals and terms, and
// the cautions. Shows prices only: never the firm's costs or margin.
import { formatDate } from '@/components/ui/formatDate';
import { formatMoney } from '@/lib/quote/totals';
import type { ProposalView as View } from '@/lib/server/proposals';
import { PlanPreview } from './PlanPreview';

export function ProposalView({ view }: { view: View }) {
  const money = (m: number) => formatMoney(m, view.currency);
  return (
    <>
      <header className="flex flex-col gap-1 border-b border-ash-200 pb-4">
        <p className="text-lg font-bold text-ash-950">{view.firm.name}</p>
        <p className="text-sm text-ash-700">
          {[view.firm.address, view.firm.phone, view.firm.email].filter(Boolean).join(' · ')}
        </p>
      </header>
      <section aria-labelledby="proposal-title" className="flex flex-col gap-2">
        <h1 id="proposal-title" className="text-2xl font-bold tracking-tight text-ash-950">
          Your deck proposal {view.reference}
        </h1>
        <p className="text-ash-800">{view.title}</p>
        <p className="text-sm text-ash-700">
          For {view.clientName || 'you'} at {view.siteAddress || 'your home'} · valid until{' '}
          {formatDate(view.validUntil)}
        </p>
      </section>
      <section aria-label="Plan" className="rounded-xl border border-ash-200 bg-white p-4">
        <PlanPreview outline={view.outline} />
      </section>
      <section
        aria-label="Price"
        className="overflow-x-auto rounded-xl border border-ash-200 bg-white"
      >
        <table className="w-full text-left text-sm">
          <thead className="border-b border-ash-200 bg-ash-50 text-ash-700">
            <tr>
              <th className="px-3 py-2 font-semibold">Item</th>
              <th className="px-3 py-2 text-right font-semibold">Qty</th>
              <th className="px-3 py-2 text-right font-semibold">Price</th>
            </tr>
          </thead>
          <tbody>
            {view.lines.map((l) => (
              <tr key={l.id} className="border-b border-ash-100">
                <td className="px-3 py-2">{l.description}</td>
                <td className="px-3 py-2 text-right tabular-nums">
                  {Math.round(l.qty * 100) / 100} {l.unit}
                </td>
                <td className="px-3 py-2 text-right tabular-nums">{money(l.price)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot className="text-ash-900">
            <tr>
              <td colSpan={2} className="px-3 pt-3 text-right">
                Subtotal
              </td>
              <td className="px-3 pt-3 text-right tabular-nums">{money(view.totals.subtotal)}</td>
            </tr>
            {view.totals.taxRatePercent > 0 ? (
              <tr>
                <td colSpan={2} className="px-3 text-right">
                  {view.totals.taxLabel} at {view.totals.taxRatePercent} %
                </td>
                <td className="px-3 text-right tabular-nums">{money(view.totals.tax)}</td>
              </tr>
            ) : null}
            <tr className="font-bold">
              <td colSpan={2} className="px-3 text-right">
                Total
              </td>
              <td className="px-3 text-right tabular-nums" data-testid="proposal-total">
                {money(view.totals.total)}
              </td>
            </tr>
            {view.totals.deposit > 0 ? (
              <tr>
                <td colSpan={2} className="px-3 pb-3 text-right">
                  Deposit to book ({view.totals.depositPercent} %)
                </td>
                <td className="px-3 pb-3 text-right tabular-nums">{money(view.totals.deposit)}</td>
              </tr>
            ) : null}
          </tfoot>
        </table>
      </section>
      {view.terms ? (
        <section aria-labelledby="terms" className="flex flex-col gap-1">
          <h2 id="terms" className="font-semibold text-ash-900">
            Terms
          </h2>
          <p className="text-sm whitespace-pre-line text-ash-800">{view.terms}</p>
        </section>
      ) : null}
      <section
        aria-labelledby="cautions"
        className="rounded-xl border border-larch-300 bg-larch-50 p-4 text-sm text-larch-900"
      >
        <h2 id="cautions" className="font-semibold">
          Please note
        </h2>
        <ul className="mt-1 list-disc pl-5">
          {view.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
    </>
  );
}
