'use client';
// The client's answer on their proposal: accept with their typed name, or decline; then the deposit.
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { TextArea } from '@/components/ui/TextArea';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime } from '@/components/ui/formatDate';
import { formatMoney } from '@/lib/quote/totals';
import type { ProposalView } from '@/lib/server/proposals';

export function ProposalActions({
  token,
  view,
  justPaid,
  cancelled,
}: {
  token: string;
  view: ProposalView;
  justPaid: boolean;
  cancelled: boolean;
}) {
  const router = useRouter();
  const [name, setName] = useState('');
  const [agree, setAgree] = useState(false);
  const [reason, setReason] = useState('');
  const [declining, setDeclining] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const url = `/api/proposals/${encodeURIComponent(token)}`;

  async function send(body: unknown) {
    setBusy(true);
    setError(null);
    try {
      await fetchJson(url, { method: 'POST', json: body });
      router.refresh();
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(false);
    }
  }

  if (view.beingRevised)
    return (
      <Alert tone="info" title="Being revised">
        The firm is updating this quote. They will send you the new version.
      </Alert>
    );
  if (view.status === 'declined')
    return <Alert tone="info">You declined this quote. Thank you for letting us know.</Alert>;

  if (view.status === 'accepted')
    return (
      <section aria-labelledby="accepted" className="flex flex-col gap-3">
        <Alert tone="success" title="Quote accepted">
          <span id="accepted">
            Accepted by {view.acceptedName} on {formatDateTime(view.acceptedAt ?? '')}.
          </span>
        </Alert>
        {view.depositPaid || justPaid ? (
          <Alert tone="success" title="Deposit received">
            Thank you. Your deposit is paid and {view.firm.name} will be in touch to agree dates.
          </Alert>
        ) : view.totals.deposit > 0 ? (
          <>
            {cancelled ? (
              <Alert tone="warning">The payment was not completed. You can try again.</Alert>
            ) : null}
            <form method="post" action={`${url}/deposit`}>
              <Button type="submit">
                Pay the deposit of {formatMoney(view.totals.deposit, view.currency)}
              </Button>
            </form>
          </>
        ) : null}
      </section>
    );

  return (
    <section
      aria-labelledby="answer"
      className="flex flex-col gap-4 rounded-xl border border-ash-200 bg-white p-4 sm:p-6"
    >
      <h2 id="answer" className="text-lg font-semibold text-ash-950">
        Your answer
      </h2>
      {error ? <Alert tone="error">{error}</Alert> : null}
      {!declining ? (
        <form
          className="flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            void send({ answer: 'accept', name, agree });
          }}
        >
          <Field label="Your full name" hint="Typing your name records your acceptance.">
            {(p) => (
              <Input
                {...p}
                value={name}
                onChange={(e) => setName(e.target.value)}
                autoComplete="name"
                required
                minLength={2}
              />
            )}
          </Field>
          <label className="flex items-start gap-2 text-sm text-ash-800">
            <input
              type="checkbox"
              className="mt-1 size-4"
              checked={agree}
              onChange={(e) => setAgree(e.target.checked)}
            />
            I accept this quote and its terms.
          </label>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" busy={busy} disabled={!agree || name.trim().length < 2}>
              Accept the quote
            </Button>
            <Button variant="secondary" onClick={() => setDeclining(true)}>
              Decline
            </Button>
          </div>
        </form>
      ) : (
        <form
          className="flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            void send({ answer: 'decline', reason: reason || undefined });
          }}
        >
          <Field label="Anything you would like to tell us?" optional>
            {(p) => (
              <TextArea
                {...p}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                rows={3}
              />
            )}
          </Field>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="danger" busy={busy}>
              Decline the quote
            </Button>
            <Button variant="secondary" onClick={() => setDeclining(false)}>
              Back
            </Button>
          </div>
        </form>
      )}
    </section>
  );
}
