// Public: an invited designer or crew member sets their password from the link in their e-mail.
import type { Metadata } from 'next';
import { StatusPage } from '@/components/layout/StatusPage';
import { AcceptInviteForm } from '@/components/team/AcceptInviteForm';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { loadInvitation } from '@/lib/server/invitations';

export const metadata: Metadata = {
  title: 'Join your team',
  robots: { index: false, follow: false },
  referrer: 'no-referrer',
};
export const dynamic = 'force-dynamic';

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = await loadInvitation(token);
  if (inv.state !== 'ok')
    return (
      <StatusPage
        code={
          inv.state === 'used' ? 'Already used' : inv.state === 'expired' ? 'Expired' : 'Not valid'
        }
        title={
          inv.state === 'used'
            ? 'This invitation has been used'
            : inv.state === 'expired'
              ? 'This invitation has expired'
              : 'We can’t open this invitation'
        }
        actions={<ButtonLink href="/sign-in">Go to sign in</ButtonLink>}
      >
        <p>
          {inv.state === 'used'
            ? 'Your account is set up: sign in with your e-mail address and password.'
            : 'Ask the owner of your firm to invite you again.'}
        </p>
      </StatusPage>
    );
  return (
    <main className="mx-auto flex w-full max-w-md flex-col gap-4 px-4 py-12">
      <h1 className="text-2xl font-bold tracking-tight text-ash-950">Join {inv.firmName}</h1>
      <p className="text-ash-700">
        You are invited as {inv.role === 'crew' ? 'crew' : 'a designer'}. Choose a password for{' '}
        <strong>{inv.email}</strong>.
      </p>
      <AcceptInviteForm token={token} name={inv.name} />
    </main>
  );
}
