import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requireUser } from '@/components/layout/currentUser';
import { InviteTeam } from '@/components/team/InviteTeam';
import { canDo } from '@/lib/validation/businessAccess';

export const metadata: Metadata = { title: 'Invite to the team' };

export default async function TeamPage() {
  const user = await requireUser();
  if (!canDo(user, 'team:invite')) notFound();
  return <InviteTeam />;
}
