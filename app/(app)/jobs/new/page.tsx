import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { NewJobForm } from '@/components/jobs/NewJobForm';
import { BackLink } from '@/components/layout/BackLink';
import { PageHeader } from '@/components/layout/PageHeader';
import { requireUser } from '@/components/layout/currentUser';
import { canEditJobs } from '@/components/layout/roles';

export const metadata: Metadata = { title: 'New job' };

export default async function NewJobPage() {
  const user = await requireUser();
  if (!canEditJobs(user.role)) redirect('/forbidden');
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader
        eyebrow={<BackLink href="/jobs">Jobs</BackLink>}
        title="New job"
        description="One job for each site. Designs for the deck are added on the job’s page."
      />
      <NewJobForm />
    </div>
  );
}
