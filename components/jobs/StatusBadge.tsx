// A job's state as a labelled pill.
import { jobStatusLabels, jobStatusStyles, type JobStatus } from './jobStatus';

export function StatusBadge({ status, className = '' }: { status: JobStatus; className?: string }) {
  const style = jobStatusStyles[status];
  return (
    <span
      data-status={status}
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded-full px-2.5 py-1 text-xs font-semibold ring-1 ring-inset ${style.badge} ${className}`}
    >
      <span className={`size-1.5 rounded-full ${style.dot}`} aria-hidden="true" />
      {jobStatusLabels[status] ?? status}
    </span>
  );
}
