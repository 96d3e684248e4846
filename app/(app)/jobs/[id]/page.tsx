import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { JobDetail } from '@/components/jobs/JobDetail';
import { JobBusinessSections } from '@/components/quotes/JobBusinessSections';
import { requireUser } from '@/components/layout/currentUser';
import { canDeleteJobs, canEditJobs } from '@/components/layout/roles';
import { idSchema } from '@/lib/validation/common';

export const metadata: Metadata = { title: 'Job' };

export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!idSchema.safeParse(id).success) notFound();
  const user = await requireUser();
  return (
    <>
      <JobDetail
        id={id}
        canEdit={canEditJobs(user.role)}
        canDelete={canDeleteJobs(user.role)}
        units={user.units}
      />
      <JobBusinessSections jobId={id} role={user.role} />
    </>
  );
}
