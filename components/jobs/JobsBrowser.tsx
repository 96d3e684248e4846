'use client';
// The jobs list: search (debounced), status chips, sortable columns and pages, all kept in the address.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useState } from 'react';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { EmptyState } from '@/components/ui/EmptyState';
import { Pagination } from '@/components/ui/Pagination';
import { SearchInput } from '@/components/ui/SearchInput';
import { Select } from '@/components/ui/Select';
import { Spinner } from '@/components/ui/Spinner';
import { fetchJson } from '@/components/ui/fetchJson';
import { JobCards } from './JobCards';
import { JobsTable } from './JobsTable';
import { StatusFilter } from './StatusFilter';
import { jobStatusLabels } from './jobStatus';
import {
  JOBS_PAGE_SIZE,
  jobsQueryToApi,
  jobsQueryToSearch,
  readJobsQuery,
  toggleSort,
  type JobsQuery,
} from './jobsQuery';
import type { JobSortKey, JobsPage, SortDir } from './types';

const SEARCH_DEBOUNCE_MS = 300;

const sortChoices: { value: `${JobSortKey}:${SortDir}`; label: string }[] = [
  { value: 'updatedAt:desc', label: 'Recently updated' },
  { value: 'updatedAt:asc', label: 'Least recently updated' },
  { value: 'title:asc', label: 'Job name, A–Z' },
  { value: 'title:desc', label: 'Job name, Z–A' },
  { value: 'client:asc', label: 'Client, A–Z' },
  { value: 'status:asc', label: 'Status' },
];

export function JobsBrowser({ canCreate }: { canCreate: boolean }) {
  const router = useRouter();
  const pathname = usePathname();
  const searchParams = useSearchParams();
  const query = useMemo(() => readJobsQuery(searchParams), [searchParams]);
  const [text, setText] = useState(query.q);

  const go = useCallback(
    (next: JobsQuery) => {
      const search = jobsQueryToSearch(next);
      router.replace(search ? `${pathname}?${search}` : pathname, { scroll: false });
    },
    [pathname, router],
  );

  // Typing waits for a pause before it asks the server.
  useEffect(() => {
    if (text.trim() === query.q.trim()) return;
    const timer = window.setTimeout(() => go({ ...query, q: text, page: 1 }), SEARCH_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [text, query, go]);

  const jobs = useQuery({
    queryKey: ['jobs', 'list', query],
    queryFn: ({ signal }) => fetchJson<JobsPage>(`/api/jobs?${jobsQueryToApi(query)}`, { signal }),
    placeholderData: keepPreviousData,
  });

  const data = jobs.data;
  const filtered = Boolean(query.q.trim() || query.status);
  const pending = jobs.isFetching && !jobs.isLoading;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-3">
        <div className="flex flex-col gap-3 sm:flex-row sm:items-center">
          <SearchInput
            label="Search jobs"
            placeholder="Search by job, client or site address"
            value={text}
            onValueChange={setText}
            className="sm:max-w-md sm:flex-1"
          />
          <div className="flex items-center gap-2 md:hidden">
            <label htmlFor="jobs-sort" className="shrink-0 text-sm font-semibold text-ash-700">
              Sort
            </label>
            <Select
              id="jobs-sort"
              value={`${query.sort}:${query.dir}`}
              onChange={(e) => {
                const [sort, dir] = e.target.value.split(':') as [JobSortKey, SortDir];
                go({ ...query, sort, dir, page: 1 });
              }}
            >
              {sortChoices.map((c) => (
                <option key={c.value} value={c.value}>
                  {c.label}
                </option>
              ))}
            </Select>
          </div>
          <span
            className="hidden items-center gap-2 text-sm text-ash-600 sm:flex"
            aria-live="polite"
          >
            {pending ? (
              <>
                <Spinner className="size-4" /> Updating…
              </>
            ) : null}
          </span>
        </div>
        <StatusFilter
          value={query.status}
          onChange={(status) => go({ ...query, status, page: 1 })}
        />
      </div>

      {jobs.isError ? (
        <LoadError
          title="The jobs could not be loaded"
          error={jobs.error}
          onRetry={() => void jobs.refetch()}
        />
      ) : null}

      {jobs.isLoading ? (
        <div className="flex min-h-40 items-center justify-center gap-3 rounded-xl border border-ash-200 bg-white text-ash-600">
          <Spinner /> Loading jobs…
        </div>
      ) : data && data.items.length === 0 ? (
        filtered ? (
          <EmptyState
            title="No jobs match"
            action={
              <Button
                variant="secondary"
                onClick={() => {
                  setText('');
                  go({ ...query, q: '', status: null, page: 1 });
                }}
              >
                Clear search and filter
              </Button>
            }
          >
            {query.status ? `Nothing is “${jobStatusLabels[query.status]}”` : 'Nothing matches'}
            {query.q.trim() ? ` for “${query.q.trim()}”` : ''}.
          </EmptyState>
        ) : (
          <EmptyState
            title="No jobs yet"
            action={
              canCreate ? <ButtonLink href="/jobs/new">Create the first job</ButtonLink> : null
            }
          >
            {canCreate
              ? 'A job holds one site: the client, the address, your notes and its deck designs.'
              : 'When the office adds a job it will show here.'}
          </EmptyState>
        )
      ) : data ? (
        <div className={`flex flex-col gap-3 transition-opacity ${pending ? 'opacity-70' : ''}`}>
          <div className="hidden md:block">
            <JobsTable
              jobs={data.items}
              sort={query.sort}
              dir={query.dir}
              onSort={(column) => go(toggleSort(query, column))}
            />
          </div>
          <div className="md:hidden">
            <JobCards jobs={data.items} />
          </div>
          <Pagination
            page={data.page ?? query.page}
            pageSize={data.pageSize ?? JOBS_PAGE_SIZE}
            total={data.total}
            noun={data.total === 1 ? 'job' : 'jobs'}
            onPage={(page) => go({ ...query, page })}
          />
        </div>
      ) : null}
    </div>
  );
}
