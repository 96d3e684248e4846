import { describe, expect, it } from 'vitest';
import {
  defaultJobsQuery,
  jobsQueryToApi,
  jobsQueryToSearch,
  readJobsQuery,
  toggleSort,
} from './jobsQuery';

const read = (s: string) => readJobsQuery(new URLSearchParams(s));

describe('jobs list address', () => {
  it('an empty address is the default list (newest first)', () => {
    expect(read('')).toEqual(defaultJobsQuery);
    expect(jobsQueryToSearch(defaultJobsQuery)).toBe('');
  });

  it('round-trips search, status, sort and page', () => {
    const q = {
      q: 'mill lane',
      status: 'quoted' as const,
      sort: 'title' as const,
      dir: 'desc' as const,
      page: 3,
    };
    expect(read(jobsQueryToSearch(q))).toEqual(q);
  });

  it('ignores malformed values', () => {
    expect(read('status=paid&sort=price&dir=up&page=-2')).toEqual(defaultJobsQuery);
    expect(read('page=1.5').page).toBe(1);
  });

  it('a sort column without a direction takes its natural order', () => {
    expect(read('sort=title').dir).toBe('asc');
    expect(read('sort=updatedAt').dir).toBe('desc');
  });

  it('always sends sort, direction, page and page size to the API', () => {
    const api = new URLSearchParams(jobsQueryToApi(defaultJobsQuery, 20));
    expect(Object.fromEntries(api)).toEqual({
      sort: 'updatedAt',
      dir: 'desc',
      page: '1',
      pageSize: '20',
    });
  });
});

describe('toggleSort', () => {
  it('flips the order of the current column and goes back to page 1', () => {
    const q = { ...defaultJobsQuery, page: 4 };
    expect(toggleSort(q, 'updatedAt')).toMatchObject({ sort: 'updatedAt', dir: 'asc', page: 1 });
  });

  it('starts a new column in its natural order', () => {
    expect(toggleSort(defaultJobsQuery, 'client')).toMatchObject({ sort: 'client', dir: 'asc' });
    const byTitle = toggleSort(defaultJobsQuery, 'title');
    expect(toggleSort(byTitle, 'updatedAt')).toMatchObject({ dir: 'desc' });
  });
});
