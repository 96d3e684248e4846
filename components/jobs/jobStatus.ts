// How each job state reads and looks. Colour is never the only signal: every badge carries its label.
import { JOB_STATUSES, type JobStatus } from '@/models/constants';
import { JOB_STATUS_LABELS } from '@/lib/validation/job';

export { JOB_STATUSES, type JobStatus };

export const jobStatusLabels: Record<JobStatus, string> = JOB_STATUS_LABELS;

/** One line on what each state means, for the status picker. */
export const jobStatusHints: Record<JobStatus, string> = {
  enquiry: 'A homeowner has asked; nobody has been to site yet',
  surveyed: 'Site measured: footprint, levels and fixed points',
  designing: 'The frame is being designed and checked',
  quoted: 'The client has a price',
  accepted: 'The client said yes',
  building: 'The crew is on site',
  complete: 'Built and handed over',
  lost: 'Not going ahead',
};

export const jobStatusStyles: Record<JobStatus, { badge: string; dot: string }> = {
  enquiry: { badge: 'bg-ash-100 text-ash-800 ring-ash-300', dot: 'bg-ash-500' },
  surveyed: { badge: 'bg-tarn-100 text-tarn-800 ring-tarn-500/30', dot: 'bg-tarn-500' },
  designing: {
    badge: 'bg-heather-100 text-heather-800 ring-heather-500/30',
    dot: 'bg-heather-500',
  },
  quoted: { badge: 'bg-larch-100 text-larch-800 ring-larch-400/50', dot: 'bg-larch-500' },
  accepted: { badge: 'bg-moss-100 text-moss-800 ring-moss-500/30', dot: 'bg-moss-500' },
  building: { badge: 'bg-ember-100 text-ember-800 ring-ember-500/30', dot: 'bg-ember-500' },
  complete: { badge: 'bg-spruce-700 text-white ring-spruce-800', dot: 'bg-spruce-200' },
  lost: { badge: 'bg-clay-50 text-clay-800 ring-clay-200', dot: 'bg-clay-500' },
};

/** Narrows an unknown string to a job status (for URL query values). */
export function isJobStatus(value: unknown): value is JobStatus {
  return typeof value === 'string' && (JOB_STATUSES as readonly string[]).includes(value);
}
