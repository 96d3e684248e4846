'use client';
// One-tap filter chips: all jobs, or the jobs in one state. Scrolls sideways on a phone.
import { JOB_STATUSES, jobStatusLabels, jobStatusStyles, type JobStatus } from './jobStatus';

export function StatusFilter({
  value,
  onChange,
}: {
  value: JobStatus | null;
  onChange: (status: JobStatus | null) => void;
}) {
  const chip =
    'inline-flex min-h-11 shrink-0 items-center gap-2 whitespace-nowrap rounded-full border px-3.5 text-sm font-semibold transition-colors';
  const on = 'border-spruce-700 bg-spruce-700 text-white';
  const off = 'border-ash-300 bg-white text-ash-800 hover:border-ash-400 hover:bg-ash-50';
  return (
    <div
      role="group"
      aria-label="Filter by status"
      className="-mx-3 flex gap-2 overflow-x-auto px-3 pb-1 sm:mx-0 sm:flex-wrap sm:overflow-visible sm:px-0"
    >
      <button
        type="button"
        aria-pressed={value === null}
        onClick={() => onChange(null)}
        className={`${chip} ${value === null ? on : off}`}
      >
        All jobs
      </button>
      {JOB_STATUSES.map((status) => (
        <button
          key={status}
          type="button"
          aria-pressed={value === status}
          onClick={() => onChange(value === status ? null : status)}
          className={`${chip} ${value === status ? on : off}`}
        >
          <span
            className={`size-2 rounded-full ${jobStatusStyles[status].dot} ${
              value === status ? 'ring-2 ring-white/70' : ''
            }`}
            aria-hidden="true"
          />
          {jobStatusLabels[status]}
        </button>
      ))}
    </div>
  );
}
