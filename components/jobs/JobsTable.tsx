'use client';
// The jobs as a sortable table (tablet and up). Each row opens its job.
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { SortableHeader } from '@/components/ui/SortableHeader';
import { formatDateTime, formatRelative } from '@/components/ui/formatDate';
import { JobProgressNote } from '@/components/stages/JobProgressNote';
import { StatusBadge } from './StatusBadge';
import type { JobSortKey, JobSummary, SortDir } from './types';

export function JobsTable({
  jobs,
  sort,
  dir,
  onSort,
}: {
  jobs: JobSummary[];
  sort: JobSortKey;
  dir: SortDir;
  onSort: (column: JobSortKey) => void;
}) {
  const router = useRouter();
  return (
    <div className="overflow-hidden rounded-xl border border-ash-200 bg-white shadow-card">
      <table className="w-full table-fixed border-collapse text-left">
        <caption className="sr-only">Jobs, sortable by column</caption>
        <colgroup>
          <col />
          <col className="w-[22%]" />
          <col className="w-[8.5rem]" />
          <col className="hidden w-[6.5rem] lg:table-column" />
          <col className="w-[9rem]" />
        </colgroup>
        <thead className="border-b border-ash-200 bg-ash-50">
          <tr>
            <SortableHeader
              column="title"
              label="Job"
              sort={sort}
              dir={dir}
              onSort={onSort}
              className="pl-3"
            />
            <SortableHeader column="client" label="Client" sort={sort} dir={dir} onSort={onSort} />
            <SortableHeader column="status" label="Status" sort={sort} dir={dir} onSort={onSort} />
            <th
              scope="col"
              className="hidden px-3 text-right text-xs font-semibold uppercase tracking-wide text-ash-600 lg:table-cell"
            >
              Designs
            </th>
            <SortableHeader
              column="updatedAt"
              label="Updated"
              sort={sort}
              dir={dir}
              onSort={onSort}
              className="pr-3"
            />
          </tr>
        </thead>
        <tbody className="divide-y divide-ash-100">
          {jobs.map((job) => (
            <tr
              key={job.id}
              onClick={(e) => {
                if ((e.target as HTMLElement).closest('a')) return;
                router.push(`/jobs/${job.id}`);
              }}
              className="cursor-pointer align-top transition-colors hover:bg-larch-50/70"
            >
              <td className="px-3 py-3">
                <Link
                  href={`/jobs/${job.id}`}
                  className="font-semibold text-spruce-800 underline-offset-2 hover:underline"
                >
                  {job.title}
                </Link>
                <p className="mt-0.5 truncate text-sm text-ash-600" title={job.siteAddress}>
                  {job.siteAddress}
                </p>
              </td>
              <td className="truncate px-3 py-3 text-ash-800">
                {job.client?.name ?? <span className="text-ash-500">No client yet</span>}
              </td>
              <td className="px-3 py-3">
                <StatusBadge status={job.status} />
                <JobProgressNote jobId={job.id} ids={jobs.map((j) => j.id)} />
              </td>
              <td className="hidden px-3 py-3 text-right tabular-nums text-ash-800 lg:table-cell">
                {job.designCount}
              </td>
              <td className="px-3 py-3 text-sm text-ash-700" title={formatDateTime(job.updatedAt)}>
                {formatRelative(job.updatedAt)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
