'use client';
// One quote: its lines (take-off, labour, extras), margin, tax, deposit, validity and terms, saved
// as a new revision each time; the PDF; and sending it to the client with their proposal link.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { BackLink } from '@/components/layout/BackLink';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { Spinner } from '@/components/ui/Spinner';
import { TextArea } from '@/components/ui/TextArea';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime } from '@/components/ui/formatDate';
import { formatMoney, parseMoney, quoteTotals } from '@/lib/quote/totals';
import type { QuoteView } from '@/lib/server/quotes';
import type { QuoteLine } from '@/lib/validation/quote';
import { QuoteRevisions } from './QuoteRevisions';
import { QuoteStatusBadge } from './QuoteStatusBadge';

type Draft = {
  title: string;
  lines: (QuoteLine & { costText: string; qtyText: string })[];
  marginPercent: string;
  taxLabel: string;
  taxRatePercent: string;
  depositPercent: string;
  validUntil: string;
  terms: string;
};

const toDraft = (q: QuoteView): Draft => ({
  title: q.title,
  lines: q.lines.map((l) => ({
    ...l,
    costText: (l.unitCost / 100).toFixed(2),
    qtyText: String(l.qty),
  })),
  marginPercent: String(q.marginPercent),
  taxLabel: q.taxLabel,
  taxRatePercent: String(q.taxRatePercent),
  depositPercent: String(q.depositPercent),
  validUntil: q.validUntil,
  terms: q.terms,
});

const num = (s: string) => (s.trim() === '' ? NaN : Number(s));

export function QuoteEditor({ jobId, quoteId }: { jobId: string; quoteId: string }) {
  const qc = useQueryClient();
  const quote = useQuery({
    queryKey: ['quote', quoteId],
    queryFn: ({ signal }) => fetchJson<QuoteView>(`/api/quotes/${quoteId}`, { signal }),
  });
  const [draft, setDraft] = useState<Draft | null>(null);
  const [busy, setBusy] = useState<'save' | 'send' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [sendTo, setSendTo] = useState('');
  const [link, setLink] = useState<string | null>(null);

  // A fresh copy from the server (load, save, send) replaces the form's draft.
  const [draftOf, setDraftOf] = useState<QuoteView | null>(null);
  if (quote.data && quote.data !== draftOf) {
    setDraftOf(quote.data);
    setDraft(toDraft(quote.data));
  }

  const lines: QuoteLine[] = useMemo(
    () =>
      (draft?.lines ?? []).map((l) => ({
        id: l.id,
        kind: l.kind,
        description: l.description,
        unit: l.unit,
        qty: Number.isFinite(num(l.qtyText)) ? num(l.qtyText) : 0,
        unitCost: parseMoney(l.costText) ?? 0,
        ...(l.labourBasis ? { labourBasis: l.labourBasis } : {}),
        ...(l.crew ? { crew: l.crew } : {}),
        ...(l.takeoffKey ? { takeoffKey: l.takeoffKey } : {}),
      })),
    [draft],
  );

  if (quote.isLoading || (!draft && quote.data))
    return (
      <div className="flex min-h-60 items-center justify-center gap-3 text-ash-600">
        <Spinner /> Loading the quote…
      </div>
    );
  if (quote.isError || !quote.data || !draft)
    return <Alert tone="error">{errorMessage(quote.error)}</Alert>;

  const q = quote.data;
  const totals = quoteTotals(lines, {
    marginPercent: num(draft.marginPercent) || 0,
    taxLabel: draft.taxLabel,
    taxRatePercent: num(draft.taxRatePercent) || 0,
    depositPercent: num(draft.depositPercent) || 0,
  });
  const money = (m: number) => formatMoney(m, q.currency);
  const locked = q.status === 'accepted';
  const setLine = (i: number, patch: Partial<Draft['lines'][number]>) =>
    setDraft({ ...draft, lines: draft.lines.map((l, j) => (j === i ? { ...l, ...patch } : l)) });

  async function save(): Promise<boolean> {
    setBusy('save');
    setError(null);
    setNotice(null);
    try {
      const saved = await fetchJson<QuoteView>(`/api/quotes/${quoteId}`, {
        method: 'PUT',
        json: {
          revision: q.revision,
          title: draft!.title,
          lines,
          marginPercent: num(draft!.marginPercent),
          taxLabel: draft!.taxLabel,
          taxRatePercent: num(draft!.taxRatePercent),
          depositPercent: num(draft!.depositPercent),
          validUntil: draft!.validUntil,
          terms: draft!.terms,
        },
      });
      qc.setQueryData(['quote', quoteId], saved);
      void qc.invalidateQueries({ queryKey: ['job-quotes', jobId] });
      setNotice(`Saved as revision ${saved.revision}.`);
      return true;
    } catch (err) {
      setError(
        err instanceof ApiError && err.status === 409
          ? `${err.message}. Reload to see the latest revision.`
          : errorMessage(err),
      );
      return false;
    } finally {
      setBusy(null);
    }
  }

  async function send() {
    setBusy('send');
    setError(null);
    setNotice(null);
    try {
      const r = await fetchJson<{ quote: QuoteView; link: string; emailStatus: string | null }>(
        `/api/quotes/${quoteId}/send`,
        { method: 'POST', json: sendTo.trim() ? { to: sendTo.trim() } : {} },
      );
      qc.setQueryData(['quote', quoteId], r.quote);
      void qc.invalidateQueries({ queryKey: ['job-quotes', jobId] });
      setLink(r.link);
      setNotice(
        r.emailStatus === 'sent'
          ? `Sent to ${r.quote.sentTo}.`
          : r.emailStatus
            ? `The e-mail could not be sent yet (${r.emailStatus}); it will be retried. Copy the link below meanwhile.`
            : 'The client has no e-mail address: copy the link below to them.',
      );
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(null);
    }
  }

  const addLine = (kind: QuoteLine['kind']) =>
    setDraft({
      ...draft,
      lines: [
        ...draft.lines,
        {
          id: `l${Date.now().toString(36)}`,
          kind,
          description: kind === 'labour' ? 'Labour' : '',
          qty: 1,
          qtyText: '1',
          unit: kind === 'labour' ? 'day' : 'each',
          unitCost: 0,
          costText: '0.00',
        },
      ],
    });

  return (
    <div className="flex flex-col gap-5">
      <BackLink href={`/jobs/${jobId}`}>Job</BackLink>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold tracking-tight text-ash-950">
          Quote {q.reference} <span className="text-base font-normal">revision {q.revision}</span>
        </h1>
        <span className="flex items-center gap-3">
          <QuoteStatusBadge status={q.status} />
          <a
            href={`/api/quotes/${quoteId}/pdf`}
            target="_blank"
            rel="noreferrer"
            className="font-semibold text-spruce-800 underline"
          >
            Quote PDF
          </a>
        </span>
      </div>
      {q.acceptedAt ? (
        <Alert tone="success" title="Accepted">
          By {q.acceptedName} on {formatDateTime(q.acceptedAt)}.
          {q.payment?.status === 'paid' ? ' Deposit paid.' : ' Deposit not yet paid.'}
        </Alert>
      ) : null}
      {error ? <Alert tone="error">{error}</Alert> : null}
      {notice ? <Alert tone="success">{notice}</Alert> : null}

      <Card title="Lines">
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] text-left text-sm">
            <thead className="text-ash-700">
              <tr>
                <th className="py-1 pr-2">Item</th>
                <th className="py-1 pr-2">Qty</th>
                <th className="py-1 pr-2">Unit</th>
                <th className="py-1 pr-2">Cost each</th>
                <th className="py-1 pr-2 text-right">Price</th>
                <th className="sr-only">Remove</th>
              </tr>
            </thead>
            <tbody>
              {draft.lines.map((l, i) => (
                <tr key={l.id} className="align-top">
                  <td className="py-1 pr-2">
                    <Input
                      aria-label={`Line ${i + 1} description`}
                      value={l.description}
                      disabled={locked}
                      onChange={(e) => setLine(i, { description: e.target.value })}
                    />
                  </td>
                  <td className="w-24 py-1 pr-2">
                    <Input
                      aria-label={`Line ${i + 1} quantity`}
                      inputMode="decimal"
                      value={l.qtyText}
                      disabled={locked}
                      onChange={(e) => setLine(i, { qtyText: e.target.value })}
                    />
                  </td>
                  <td className="w-24 py-1 pr-2">
                    <Input
                      aria-label={`Line ${i + 1} unit`}
                      value={l.unit}
                      disabled={locked}
                      onChange={(e) => setLine(i, { unit: e.target.value })}
                    />
                  </td>
                  <td className="w-32 py-1 pr-2">
                    <Input
                      aria-label={`Line ${i + 1} cost each`}
                      inputMode="decimal"
                      value={l.costText}
                      disabled={locked}
                      aria-invalid={parseMoney(l.costText) === undefined || undefined}
                      onChange={(e) => setLine(i, { costText: e.target.value })}
                    />
                  </td>
                  <td className="py-3 pr-2 text-right tabular-nums">
                    {money(totals.lines[i]?.price ?? 0)}
                  </td>
                  <td className="py-1">
                    {!locked ? (
                      <Button
                        variant="ghost"
                        size="sm"
                        aria-label={`Remove line ${i + 1}`}
                        onClick={() =>
                          setDraft({ ...draft, lines: draft.lines.filter((_, j) => j !== i) })
                        }
                      >
                        ×
                      </Button>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {!locked ? (
          <div className="mt-3 flex flex-wrap gap-2">
            <Button variant="secondary" size="sm" onClick={() => addLine('material')}>
              Add material
            </Button>
            <Button variant="secondary" size="sm" onClick={() => addLine('labour')}>
              Add labour
            </Button>
            <Button variant="secondary" size="sm" onClick={() => addLine('other')}>
              Add other
            </Button>
          </div>
        ) : null}
      </Card>

      <Card title="Price and terms">
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Title">
            {(p) => (
              <Input
                {...p}
                value={draft.title}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, title: e.target.value })}
              />
            )}
          </Field>
          <Field label="Valid until">
            {(p) => (
              <Input
                {...p}
                type="date"
                value={draft.validUntil}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, validUntil: e.target.value })}
              />
            )}
          </Field>
          <Field label="Margin (%)" hint="Added to every line's cost; the client sees prices only.">
            {(p) => (
              <Input
                {...p}
                inputMode="decimal"
                value={draft.marginPercent}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, marginPercent: e.target.value })}
              />
            )}
          </Field>
          <Field label="Deposit (%)">
            {(p) => (
              <Input
                {...p}
                inputMode="decimal"
                value={draft.depositPercent}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, depositPercent: e.target.value })}
              />
            )}
          </Field>
          <Field label="Tax name" hint="VAT, sales tax, or leave the rate at 0.">
            {(p) => (
              <Input
                {...p}
                value={draft.taxLabel}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, taxLabel: e.target.value })}
              />
            )}
          </Field>
          <Field label="Tax rate (%)">
            {(p) => (
              <Input
                {...p}
                inputMode="decimal"
                value={draft.taxRatePercent}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, taxRatePercent: e.target.value })}
              />
            )}
          </Field>
          <Field label="Terms" className="sm:col-span-2">
            {(p) => (
              <TextArea
                {...p}
                rows={4}
                value={draft.terms}
                disabled={locked}
                onChange={(e) => setDraft({ ...draft, terms: e.target.value })}
              />
            )}
          </Field>
        </div>
        <dl className="mt-5 grid max-w-sm grid-cols-2 gap-y-1 text-sm">
          <dt className="text-ash-700">Cost</dt>
          <dd className="text-right tabular-nums">{money(totals.cost)}</dd>
          <dt className="text-ash-700">Margin</dt>
          <dd className="text-right tabular-nums">{money(totals.marginAmount)}</dd>
          <dt className="text-ash-700">Subtotal</dt>
          <dd className="text-right tabular-nums">{money(totals.subtotal)}</dd>
          <dt className="text-ash-700">
            {totals.taxLabel} {totals.taxRatePercent} %
          </dt>
          <dd className="text-right tabular-nums">{money(totals.tax)}</dd>
          <dt className="font-bold">Total</dt>
          <dd className="text-right font-bold tabular-nums" data-testid="quote-total">
            {money(totals.total)}
          </dd>
          <dt className="text-ash-700">Deposit</dt>
          <dd className="text-right tabular-nums">{money(totals.deposit)}</dd>
        </dl>
        {!locked ? (
          <div className="mt-4">
            <Button busy={busy === 'save'} onClick={() => void save()}>
              Save revision
            </Button>
          </div>
        ) : null}
      </Card>

      <QuoteRevisions quoteId={quoteId} current={q.revision} />

      {!locked ? (
        <Card title="Send to the client">
          <div className="flex flex-col gap-3">
            <Field label="Client's e-mail" optional hint="Blank: the job's client.">
              {(p) => (
                <Input
                  {...p}
                  type="email"
                  value={sendTo}
                  onChange={(e) => setSendTo(e.target.value)}
                />
              )}
            </Field>
            <div>
              <Button variant="accent" busy={busy === 'send'} onClick={() => void send()}>
                Send quote
              </Button>
            </div>
            {q.sentAt ? (
              <p className="text-sm text-ash-700">
                Last sent {formatDateTime(q.sentAt)}
                {q.sentTo ? ` to ${q.sentTo}` : ''}.
              </p>
            ) : null}
            {link ? (
              <p className="text-sm break-all">
                Client link:{' '}
                <a href={link} data-testid="proposal-link" className="text-spruce-800 underline">
                  {link}
                </a>
              </p>
            ) : null}
          </div>
        </Card>
      ) : null}
    </div>
  );
}
