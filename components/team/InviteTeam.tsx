'use client';
// The owner invites a designer or a crew member by e-mail, and sees the invitations sent.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { Select } from '@/components/ui/Select';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDate } from '@/components/ui/formatDate';
import type { InvitationView } from '@/lib/server/invitations';

export function InviteTeam() {
  const qc = useQueryClient();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<'designer' | 'crew'>('crew');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [notice, setNotice] = useState<string | null>(null);
  const list = useQuery({
    queryKey: ['invitations'],
    queryFn: ({ signal }) => fetchJson<InvitationView[]>('/api/invitations', { signal }),
  });

  async function submit() {
    setBusy(true);
    setError(null);
    setFields({});
    setNotice(null);
    try {
      const r = await fetchJson<InvitationView & { emailStatus: string }>('/api/invitations', {
        method: 'POST',
        json: { email, name, role },
      });
      setNotice(
        r.emailStatus === 'sent'
          ? `Invitation sent to ${r.email}.`
          : `Invitation saved; the e-mail to ${r.email} will be retried (see Sent mail).`,
      );
      setEmail('');
      setName('');
      void qc.invalidateQueries({ queryKey: ['invitations'] });
    } catch (err) {
      setError(errorMessage(err));
      if (err instanceof ApiError) setFields(err.fields);
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold tracking-tight text-ash-950">Invite to the team</h1>
      <Card title="New invitation">
        <form
          className="grid gap-4 sm:grid-cols-3"
          onSubmit={(e) => {
            e.preventDefault();
            void submit();
          }}
        >
          {error ? (
            <Alert tone="error" className="sm:col-span-3">
              {error}
            </Alert>
          ) : null}
          {notice ? (
            <Alert tone="success" className="sm:col-span-3">
              {notice}
            </Alert>
          ) : null}
          <Field label="Name" error={fields.name?.[0]}>
            {(p) => (
              <Input {...p} value={name} onChange={(e) => setName(e.target.value)} required />
            )}
          </Field>
          <Field label="E-mail" error={fields.email?.[0]}>
            {(p) => (
              <Input
                {...p}
                type="email"
                value={email}
                onChange={(e) => setEmail(e.target.value)}
                required
              />
            )}
          </Field>
          <Field label="Role">
            {(p) => (
              <Select
                {...p}
                value={role}
                onChange={(e) => setRole(e.target.value as 'designer' | 'crew')}
              >
                <option value="crew">Crew</option>
                <option value="designer">Designer</option>
              </Select>
            )}
          </Field>
          <div className="sm:col-span-3">
            <Button type="submit" busy={busy}>
              Send invitation
            </Button>
          </div>
        </form>
      </Card>
      <Card title="Invitations">
        <ul className="divide-y divide-ash-100 text-sm">
          {list.data?.map((i) => (
            <li key={i.id} className="flex flex-wrap justify-between gap-2 py-2">
              <span>
                {i.name} &lt;{i.email}&gt; · {i.role}
              </span>
              <span className="text-ash-700">
                {i.acceptedAt
                  ? `Joined ${formatDate(i.acceptedAt)}`
                  : `Open until ${formatDate(i.expiresAt)}`}
              </span>
            </li>
          ))}
        </ul>
        {list.data?.length === 0 ? (
          <p className="text-sm text-ash-700">No invitations yet.</p>
        ) : null}
      </Card>
    </div>
  );
}
