'use client';
// The owner's view of the firm's e-mail: every message with its state (sent, waiting to retry,
// failed, with the reason) and, in development, the messages as the local mail sink received them.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime } from '@/components/ui/formatDate';
import type { OutboxItem, SinkMessage } from '@/lib/server/mail';

type MailData = {
  outbox: OutboxItem[];
  inbox: { enabled: boolean; items: SinkMessage[]; error?: string };
};

const stateLabel: Record<OutboxItem['status'], string> = {
  queued: 'Queued',
  sending: 'Sending',
  sent: 'Sent',
  retrying: 'Waiting to retry',
  failed: 'Failed',
};

function Message({ id }: { id: string }) {
  const msg = useQuery({
    queryKey: ['dev-mail', id],
    queryFn: ({ signal }) => fetchJson<SinkMessage>(`/api/dev/mail/${id}`, { signal }),
  });
  if (msg.isError) return <Alert tone="error">{errorMessage(msg.error)}</Alert>;
  if (!msg.data) return <p className="text-sm text-ash-600">Loading…</p>;
  return (
    <article
      className="flex flex-col gap-2 rounded-lg border border-ash-200 bg-ash-50 p-3"
      data-testid="mail-message"
    >
      <p className="text-sm text-ash-700">
        From {msg.data.from} to {msg.data.to}
      </p>
      <h3 className="font-semibold text-ash-950">{msg.data.subject}</h3>
      <pre className="font-sans text-sm whitespace-pre-wrap text-ash-900">{msg.data.text}</pre>
      {msg.data.attachments.length ? (
        <ul className="flex flex-wrap gap-2 text-sm">
          {msg.data.attachments.map((a) => (
            <li key={a.filename} className="rounded bg-white px-2 py-1 ring-1 ring-ash-200">
              {a.filename} ({a.contentType}, {Math.ceil(a.size / 1024)} KB)
            </li>
          ))}
        </ul>
      ) : null}
    </article>
  );
}

export function MailInbox() {
  const qc = useQueryClient();
  const [open, setOpen] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const data = useQuery({
    queryKey: ['dev-mail'],
    queryFn: ({ signal }) => fetchJson<MailData>('/api/dev/mail', { signal }),
  });

  async function retry(id?: string) {
    setBusy(id ?? 'all');
    setError(null);
    try {
      await fetchJson('/api/dev/mail/retry', { method: 'POST', json: id ? { id } : {} });
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(null);
      void qc.invalidateQueries({ queryKey: ['dev-mail'] });
    }
  }

  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold tracking-tight text-ash-950">Sent mail</h1>
      {error ? <Alert tone="error">{error}</Alert> : null}
      {data.isError ? <Alert tone="error">{errorMessage(data.error)}</Alert> : null}
      <Card
        title="Outbox"
        actions={
          <Button size="sm" variant="secondary" busy={busy === 'all'} onClick={() => void retry()}>
            Retry waiting messages
          </Button>
        }
      >
        {data.data?.outbox.length === 0 ? (
          <p className="text-sm text-ash-700">Nothing sent yet.</p>
        ) : null}
        <ul className="divide-y divide-ash-100">
          {data.data?.outbox.map((m) => (
            <li
              key={m.id}
              className="flex flex-wrap items-start justify-between gap-2 py-2 text-sm"
              data-testid="outbox-row"
            >
              <span className="flex flex-col">
                <span className="font-semibold text-ash-900">{m.subject}</span>
                <span className="text-ash-700">
                  To {m.to} · {formatDateTime(m.createdAt)}
                  {m.attachments.length ? ` · ${m.attachments.join(', ')}` : ''}
                </span>
                {m.lastError && m.status !== 'sent' ? (
                  <span className="text-clay-700">
                    Attempt {m.attempts}: {m.lastError}
                  </span>
                ) : null}
              </span>
              <span className="flex items-center gap-2">
                <span
                  className={
                    m.status === 'failed'
                      ? 'font-semibold text-clay-700'
                      : m.status === 'sent'
                        ? 'text-spruce-800'
                        : 'text-larch-800'
                  }
                >
                  {stateLabel[m.status]}
                </span>
                {m.status === 'failed' || m.status === 'retrying' ? (
                  <Button
                    size="sm"
                    variant="secondary"
                    busy={busy === m.id}
                    onClick={() => void retry(m.id)}
                  >
                    Send again
                  </Button>
                ) : null}
              </span>
            </li>
          ))}
        </ul>
      </Card>
      {data.data?.inbox.enabled ? (
        <Card title="Development mailbox (local mail sink)">
          <p className="mb-3 text-sm text-ash-700">
            In development, mail goes to a local sink instead of the real recipients. These are the
            messages it received from this firm.
          </p>
          {data.data.inbox.error ? (
            <Alert tone="warning">
              The local mail sink is not answering: {data.data.inbox.error}
            </Alert>
          ) : null}
          <ul className="flex flex-col gap-2">
            {data.data.inbox.items.map((m) => (
              <li key={m.id}>
                <button
                  type="button"
                  className="w-full rounded-lg px-2 py-2 text-left text-sm hover:bg-ash-50"
                  aria-expanded={open === m.id}
                  onClick={() => setOpen(open === m.id ? null : m.id)}
                >
                  <span className="font-semibold text-ash-900">{m.subject}</span>
                  <span className="block text-ash-700">
                    To {m.envelopeTo.join(', ')} · {formatDateTime(m.receivedAt)}
                  </span>
                </button>
                {open === m.id ? <Message id={m.id} /> : null}
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
    </div>
  );
}
