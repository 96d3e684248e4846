// The jobs list's search, filter, sort and page, read from and written to the page address.
import { isJobStatus, type JobStatus } from './jobStatus';
import type { JobSortKey, SortDir } from './types';

export type JobsQuery = {
  q: string;
  status: JobStatus | null;
  sort: JobSortKey;
  dir: SortDir;
  page: number;
};

export const JOBS_PAGE_SIZE = 20;

const SORT_KEYS: readonly JobSortKey[] = ['updatedAt', 'title', 'status', 'client'];

/** The order a column starts in when first clicked: newest first for dates, A–Z for words. */
export const defaultDir: Record<JobSortKey, SortDir> = {
  updatedAt: 'desc',
  title: 'asc',
  status: 'asc',
  client: 'asc',
};

export const defaultJobsQuery: JobsQuery = {
  q: '',
  status: null,
  sort: 'updatedAt',
  dir: 'desc',
  page: 1,
};

type ParamsLike = { get(name: string): string | null };

/** Reads the list state from the address, ignoring anything malformed. */
export function readJobsQuery(params: ParamsLike): JobsQuery {
  const sortRaw = params.get('sort');
  const sort = SORT_KEYS.includes(sortRaw as JobSortKey)
    ? (sortRaw as JobSortKey)
    : defaultJobsQuery.sort;
  const dirRaw = params.get('dir');
  const dir: SortDir = dirRaw === 'asc' || dirRaw === 'desc' ? dirRaw : defaultDir[sort];
  const pageNum = Number(params.get('page'));
  const status = params.get('status');
  return {
    q: (params.get('q') ?? '').slice(0, 200),
    status: isJobStatus(status) ? status : null,
    sort,
    dir,
    page: Number.isInteger(pageNum) && pageNum >= 1 ? pageNum : 1,
  };
}

/** The page address's query string: only what differs from the defaults. */
export function jobsQueryToSearch(query: JobsQuery): string {
  const p = new URLSearchParams();
  if (query.q.trim()) p.set('q', query.q.trim());
  if (query.status) p.set('status', query.status);
  if (query.sort !== defaultJobsQuery.sort || query.dir !== defaultDir[query.sort]) {
    p.set('sort', query.sort);
    p.set('dir', query.dir);
  }
  if (query.page > 1) p.set('page', String(query.page));
  return p.toString();
}

/** The GET /api/jobs query string for this state. */
export function jobsQueryToApi(query: JobsQuery, pageSize = JOBS_PAGE_SIZE): string {
  const p = new URLSearchParams();
  if (query.q.trim()) p.set('q', query.q.trim());
  if (query.status) p.set('status', query.status);
  p.set('sort', query.sort);
  p.set('dir', query.dir);
  p.set('page', String(query.page));
  p.set('pageSize', String(pageSize));
  return p.toString();
}

/** Clicking a column header: the same column flips its order, a new one starts in its natural order. */
export function toggleSort(query: JobsQuery, column: JobSortKey): JobsQuery {
  const dir: SortDir =
    query.sort === column ? (query.dir === 'asc' ? 'desc' : 'asc') : defaultDir[column];
  return { ...query, sort: column, dir, page: 1 };
}
