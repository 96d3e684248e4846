'use client';
// Email and password sign-in, with one-tap demo sign-ins on demo installs.
import { signIn } from 'next-auth/react';
import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { Spinner } from '@/components/ui/Spinner';
import { roleLabels } from '@/components/layout/roles';
import { signInSchema } from '@/lib/validation/auth';
import { DEMO_FIRM, DEMO_PASSWORD, demoAccounts } from './demoAccounts';

type FieldErrors = Partial<Record<'email' | 'password', string>>;

/** next-auth's error codes, in our words. */
function describeError(code: string | undefined | null): string | null {
  if (!code) return null;
  if (code === 'CredentialsSignin')
    return 'That email and password do not match an account. Check them and try again.';
  if (code === 'SessionRequired') return 'Please sign in to carry on.';
  if (code === 'AccessDenied') return 'This account may not sign in.';
  return 'Signing in did not work. Please try again.';
}

export function SignInForm({
  callbackUrl,
  initialError,
  showDemo,
}: {
  callbackUrl: string;
  initialError?: string;
  showDemo: boolean;
}) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [error, setError] = useState<string | null>(describeError(initialError));
  const [busy, setBusy] = useState<string | null>(null);

  async function attempt(credentials: { email: string; password: string }, who: string) {
    setBusy(who);
    setError(null);
    try {
      const res = await signIn('credentials', { ...credentials, redirect: false });
      if (!res || res.error || !res.ok) {
        setError(describeError(res?.error ?? 'CredentialsSignin'));
        setBusy(null);
        return;
      }
      // A full load: the server renders the shell with the new session cookie, and nothing stale remains.
      window.location.assign(callbackUrl);
    } catch {
      setError('Could not reach the server. Check the connection and try again.');
      setBusy(null);
    }
  }

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = signInSchema.safeParse({ email, password });
    if (!parsed.success) {
      const errs: FieldErrors = {};
      for (const issue of parsed.error.issues) {
        const key = issue.path[0] as keyof FieldErrors;
        errs[key] ??= issue.message;
      }
      setFieldErrors(errs);
      return;
    }
    setFieldErrors({});
    void attempt(parsed.data, 'form');
  }

  return (
    <div className="flex flex-col gap-8">
      <div>
        <h1 className="text-2xl font-bold tracking-tight text-ash-950 sm:text-3xl">Sign in</h1>
        <p className="mt-1 text-ash-600">Use the email address your firm set up for you.</p>
      </div>

      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Sign in">
        {error ? (
          <Alert tone="error" title="Not signed in">
            {error}
          </Alert>
        ) : null}
        <Field label="Email" error={fieldErrors.email}>
          {(a11y) => (
            <Input
              {...a11y}
              type="email"
              name="email"
              autoComplete="username"
              inputMode="email"
              autoCapitalize="none"
              spellCheck={false}
              value={email}
              onChange={(e) => setEmail(e.target.value)}
            />
          )}
        </Field>
        <Field label="Password" error={fieldErrors.password}>
          {(a11y) => (
            <Input
              {...a11y}
              type="password"
              name="password"
              autoComplete="current-password"
              value={password}
              onChange={(e) => setPassword(e.target.value)}
            />
          )}
        </Field>
        <Button type="submit" busy={busy === 'form'} disabled={busy !== null} className="mt-2">
          Sign in
        </Button>
      </form>

      {showDemo ? (
        <section
          aria-labelledby="demo-heading"
          className="rounded-xl border border-ash-200 bg-white p-4 shadow-card"
        >
          <h2 id="demo-heading" className="font-semibold text-ash-900">
            Try the demo firm
          </h2>
          <p className="mt-0.5 text-sm text-ash-600">
            {DEMO_FIRM} is invented. Every demo account uses the password{' '}
            <code className="rounded bg-ash-100 px-1.5 py-0.5 font-mono text-[0.85em] text-ash-800">
              {DEMO_PASSWORD}
            </code>
            .
          </p>
          <ul className="mt-3 flex flex-col gap-2">
            {demoAccounts.map((acct) => (
              <li key={acct.email}>
                <button
                  type="button"
                  disabled={busy !== null}
                  onClick={() =>
                    void attempt({ email: acct.email, password: DEMO_PASSWORD }, acct.email)
                  }
                  className="flex min-h-14 w-full items-center gap-3 rounded-lg border border-ash-200 px-3 py-2 text-left hover:border-spruce-300 hover:bg-spruce-50 disabled:opacity-60"
                >
                  <span className="grid size-9 shrink-0 place-items-center rounded-full bg-spruce-100 text-sm font-bold text-spruce-800">
                    {acct.name
                      .split(' ')
                      .map((p) => p[0])
                      .join('')}
                  </span>
                  <span className="min-w-0 flex-1">
                    <span className="block font-semibold text-ash-900">
                      {acct.name}{' '}
                      <span className="font-medium text-larch-700">· {roleLabels[acct.role]}</span>
                    </span>
                    <span className="block truncate text-sm text-ash-600">{acct.blurb}</span>
                  </span>
                  <span className="hidden shrink-0 text-sm font-semibold text-spruce-700 sm:inline">
                    {busy === acct.email
                      ? 'Signing in…'
                      : `Sign in as ${roleLabels[acct.role].toLowerCase()}`}
                  </span>
                  {busy === acct.email ? (
                    <Spinner className="size-5 shrink-0 text-spruce-600 sm:hidden" />
                  ) : null}
                  <svg
                    viewBox="0 0 20 20"
                    className={`size-5 shrink-0 text-spruce-600 sm:hidden ${busy === acct.email ? 'hidden' : ''}`}
                    aria-hidden="true"
                  >
                    <path
                      d="M7.5 4.5 13 10l-5.5 5.5"
                      fill="none"
                      stroke="currentColor"
                      strokeWidth="2"
                      strokeLinecap="round"
                      strokeLinejoin="round"
                    />
                  </svg>
                </button>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
