'use client';
// Sets the invited person's name and password, then sends them to sign in.
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';

export function AcceptInviteForm({ token, name: initialName }: { token: string; name: string }) {
  const router = useRouter();
  const [name, setName] = useState(initialName);
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});

  async function submit() {
    setBusy(true);
    setError(null);
    setFields({});
    try {
      await fetchJson(`/api/invitations/${encodeURIComponent(token)}`, {
        method: 'POST',
        json: { name, password, confirm },
      });
      router.push('/sign-in?joined=1');
    } catch (err) {
      setError(errorMessage(err));
      if (err instanceof ApiError) setFields(err.fields);
      setBusy(false);
    }
  }

  return (
    <form
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Field label="Your name" error={fields.name?.[0]}>
        {(p) => (
          <Input
            {...p}
            value={name}
            onChange={(e) => setName(e.target.value)}
            autoComplete="name"
          />
        )}
      </Field>
      <Field label="Password" hint="At least 10 characters." error={fields.password?.[0]}>
        {(p) => (
          <Input
            {...p}
            type="password"
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            autoComplete="new-password"
          />
        )}
      </Field>
      <Field label="Password again" error={fields.confirm?.[0]}>
        {(p) => (
          <Input
            {...p}
            type="password"
            value={confirm}
            onChange={(e) => setConfirm(e.target.value)}
            autoComplete="new-password"
          />
        )}
      </Field>
      <Button type="submit" busy={busy}>
        Set password and join
      </Button>
    </form>
  );
}
