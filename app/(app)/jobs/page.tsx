import type { Metadata } from 'next';
import { Suspense } from 'react';
import { JobsBrowser } from '@/components/jobs/JobsBrowser';
import { PageHeader } from '@/components/layout/PageHeader';
import { requireUser } from '@/components/layout/currentUser';
import { canEditJobs } from '@/components/layout/roles';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { Spinner } from '@/components/ui/Spinner';

export const metadata: Metadata = { title: 'Jobs' };

export default async function JobsPage() {
  const user = await requireUser();
  const canCreate = canEditJobs(user.role);
  return (
    <>
      <PageHeader
        title="Jobs"
        description="Every site your firm is quoting, designing or building."
        actions={
          canCreate ? (
            <ButtonLink href="/jobs/new" className="w-full sm:w-auto">
              <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
                <path
                  d="M10 4v12M4 10h12"
                  stroke="currentColor"
                  strokeWidth="2.2"
                  strokeLinecap="round"
                />
              </svg>
              New job
            </ButtonLink>
          ) : null
        }
      />
      <Suspense
        fallback={
          <div className="flex min-h-40 items-center justify-center gap-3 text-ash-600">
            <Spinner /> Loading jobs…
          </div>
        }
      >
        <JobsBrowser canCreate={canCreate} />
      </Suspense>
    </>
  );
}
