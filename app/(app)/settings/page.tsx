import type { Metadata } from 'next';
import { PageHeader } from '@/components/layout/PageHeader';
import { requireUser } from '@/components/layout/currentUser';
import { SettingsView } from '@/components/settings/SettingsView';

export const metadata: Metadata = { title: 'Settings' };

export default async function SettingsPage() {
  const user = await requireUser();
  return (
    <>
      <PageHeader
        title="Settings"
        description="Your firm, its team, and how Joistwright shows lengths to you."
      />
      <SettingsView user={user} />
    </>
  );
}
