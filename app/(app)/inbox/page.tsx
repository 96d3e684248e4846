import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requireUser } from '@/components/layout/currentUser';
import { MailInbox } from '@/components/mail/MailInbox';
import { canDo } from '@/lib/validation/businessAccess';

export const metadata: Metadata = { title: 'Sent mail' };

export default async function InboxPage() {
  const user = await requireUser();
  if (!canDo(user, 'mail:read')) notFound();
  return <MailInbox />;
}
