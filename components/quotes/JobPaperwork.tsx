'use client';
// Sends a design's paperwork by e-mail: the framing plan and cut list to the crew, the materials
// order (CSV) to a supplier. Each send is recorded in the firm's sent mail and retried if it fails.
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { Job } from '@/components/jobs/types';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { Input } from '@/components/ui/Input';
import { Select } from '@/components/ui/Select';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';

type Sent = { sent: { to: string; status: string }[] };

export function JobPaperwork({ jobId }: { jobId: string }) {
  const job = useQuery({
    queryKey: ['job', jobId],
    queryFn: ({ signal }) => fetchJson<Job>(`/api/jobs/${jobId}`, { signal }),
  });
  const [designId, setDesignId] = useState('');
  const [supplier, setSupplier] = useState('');
  const [busy, setBusy] = useState<'plan' | 'order' | null>(null);
  const [result, setResult] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const designs = job.data?.designs ?? [];
  const chosen = designId || designs[0]?.id || '';

  async function send(kind: 'plan' | 'order') {
    setBusy(kind);
    setResult(null);
    try {
      const r = await fetchJson<Sent>(`/api/jobs/${jobId}/mail`, {
        method: 'POST',
        json:
          kind === 'plan'
            ? { kind, designId: chosen }
            : { kind, designId: chosen, to: [supplier.trim()] },
      });
      const waiting = r.sent.filter((s) => s.status !== 'sent');
      setResult({
        tone: waiting.length ? 'error' : 'success',
        text: waiting.length
          ? `Not sent yet to ${waiting.map((s) => s.to).join(', ')}; it will be retried (see Sent mail).`
          : `Sent to ${r.sent.map((s) => s.to).join(', ')}.`,
      });
    } catch (err) {
      setResult({ tone: 'error', text: errorMessage(err) });
    } finally {
      setBusy(null);
    }
  }

  if (!job.data || designs.length === 0) return null;
  return (
    <Card title="Send plans and orders" id="paperwork">
      <div className="flex flex-col gap-3">
        {result ? <Alert tone={result.tone}>{result.text}</Alert> : null}
        {designs.length > 1 ? (
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Design
            <Select
              value={chosen}
              onChange={(e) => setDesignId(e.target.value)}
              className="max-w-sm"
            >
              {designs.map((d) => (
                <option key={d.id} value={d.id}>
                  {d.name} (v{d.version})
                </option>
              ))}
            </Select>
          </label>
        ) : null}
        <div>
          <Button variant="secondary" busy={busy === 'plan'} onClick={() => void send('plan')}>
            E-mail framing plan and cut list to the crew
          </Button>
        </div>
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void send('order');
          }}
        >
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Supplier&apos;s e-mail
            <Input
              type="email"
              required
              value={supplier}
              onChange={(e) => setSupplier(e.target.value)}
              className="w-72"
            />
          </label>
          <Button type="submit" variant="secondary" busy={busy === 'order'}>
            E-mail materials order (CSV)
          </Button>
        </form>
      </div>
    </Card>
  );
}
