// The jobs as stacked cards for phones, where a table would not fit.
import Link from 'next/link';
import { formatRelative } from '@/components/ui/formatDate';
import { JobProgressNote } from '@/components/stages/JobProgressNote';
import { StatusBadge } from './StatusBadge';
import type { JobSummary } from './types';

export function JobCards({ jobs }: { jobs: JobSummary[] }) {
  return (
    <ul className="flex flex-col gap-2">
      {jobs.map((job) => (
        <li key={job.id}>
          <Link
            href={`/jobs/${job.id}`}
            className="block rounded-xl border border-ash-200 bg-white p-4 shadow-card active:bg-larch-50"
          >
            <div className="flex items-start justify-between gap-3">
              <span className="font-semibold text-spruce-800">{job.title}</span>
              <StatusBadge status={job.status} />
            </div>
            <JobProgressNote jobId={job.id} ids={jobs.map((j) => j.id)} />
            <p className="mt-1 text-sm text-ash-700">{job.siteAddress}</p>
            <p className="mt-2 flex flex-wrap gap-x-3 text-xs text-ash-600">
              <span>{job.client?.name ?? 'No client yet'}</span>
              <span>
                {job.designCount} {job.designCount === 1 ? 'design' : 'designs'}
              </span>
              <span>Updated {formatRelative(job.updatedAt)}</span>
            </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
