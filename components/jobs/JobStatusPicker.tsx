'use client';
// Change a job's state (owners and designers); saved as soon as it is picked.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useId } from 'react';
import { Select } from '@/components/ui/Select';
import { Spinner } from '@/components/ui/Spinner';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { useToast } from '@/components/ui/Toaster';
import { JOB_STATUSES, jobStatusHints, jobStatusLabels, type JobStatus } from './jobStatus';
import { StatusBadge } from './StatusBadge';
import type { Job } from './types';

export function JobStatusPicker({ job, canEdit }: { job: Job; canEdit: boolean }) {
  const id = useId();
  const queryClient = useQueryClient();
  const { toast } = useToast();
  const change = useMutation({
    mutationFn: (status: JobStatus) =>
      fetchJson<Job>(`/api/jobs/${job.id}`, { method: 'PATCH', json: { status } }),
    onSuccess: (updated) => {
      queryClient.setQueryData<Job>(['job', job.id], (old) =>
        old ? { ...old, ...updated, designs: updated.designs ?? old.designs } : updated,
      );
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      toast(`Status changed to ${jobStatusLabels[updated.status]}`);
    },
  });

  const shown = change.isPending && change.variables ? change.variables : job.status;

  if (!canEdit) {
    return (
      <div className="flex flex-col gap-1.5">
        <StatusBadge status={job.status} className="self-start text-sm" />
        <p className="text-sm text-ash-600">{jobStatusHints[job.status]}</p>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="sr-only">
        Job status
      </label>
      <div className="flex items-center gap-3">
        <Select
          id={id}
          value={shown}
          disabled={change.isPending}
          onChange={(e) => change.mutate(e.target.value as JobStatus)}
          className="sm:max-w-xs"
          aria-describedby={`${id}-hint`}
        >
          {JOB_STATUSES.map((s) => (
            <option key={s} value={s}>
              {jobStatusLabels[s]}
            </option>
          ))}
        </Select>
        {change.isPending ? <Spinner className="size-5 text-spruce-600" /> : null}
      </div>
      <p id={`${id}-hint`} className="text-sm text-ash-600">
        {jobStatusHints[shown]}
      </p>
      {change.isError ? (
        <p role="alert" className="text-sm font-medium text-clay-700">
          The status was not changed: {errorMessage(change.error)}
        </p>
      ) : null}
    </div>
  );
}
