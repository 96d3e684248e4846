'use client';
// The owner's "delete this job", behind a confirmation that says what goes with it.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/Button';
import { ConfirmDialog } from '@/components/ui/ConfirmDialog';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { useToast } from '@/components/ui/Toaster';
import type { Job } from './types';

export function DeleteJobButton({ job }: { job: Job }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { toast } = useToast();
  const [open, setOpen] = useState(false);
  const remove = useMutation({
    mutationFn: () => fetchJson<void>(`/api/jobs/${job.id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: ['job', job.id] });
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      toast(`Deleted “${job.title}”`);
      router.push('/jobs');
    },
  });
  const designs = job.designs.length;
  return (
    <>
      <Button variant="secondary" className="text-clay-700" onClick={() => setOpen(true)}>
        <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
          <path
            d="M4 6h12M8 6V4h4v2M6 6l1 10h6l1-10"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.7"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </svg>
        Delete job
      </Button>
      <ConfirmDialog
        open={open}
        title={`Delete “${job.title}”?`}
        confirmLabel="Delete job"
        busy={remove.isPending || remove.isSuccess}
        onCancel={() => {
          remove.reset();
          setOpen(false);
        }}
        onConfirm={() => remove.mutate()}
      >
        <p>
          The job
          {designs ? ` and its ${designs} ${designs === 1 ? 'design' : 'designs'}` : ''} will be
          removed for everyone in the firm. This cannot be undone.
        </p>
        {remove.isError ? (
          <p role="alert" className="mt-3 font-medium text-clay-700">
            Not deleted: {errorMessage(remove.error)}
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
