'use client';
// Edit a job's title, site address and notes in place.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { TextArea } from '@/components/ui/TextArea';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import {
  apiFieldsToFieldErrors,
  issuesToFieldErrors,
  type FieldErrors,
} from '@/components/ui/fieldErrors';
import { useToast } from '@/components/ui/Toaster';
import { jobUpdateSchema, type JobUpdateInput } from '@/lib/validation/job';
import type { Job } from './types';

export function JobDetailsForm({ job, onDone }: { job: Job; onDone: () => void }) {
  const queryClient = useQueryClient();
  const { toast } = useToast();
  const [title, setTitle] = useState(job.title);
  const [siteAddress, setSiteAddress] = useState(job.siteAddress);
  const [notes, setNotes] = useState(job.notes ?? '');
  const [errors, setErrors] = useState<FieldErrors>({});

  const save = useMutation({
    mutationFn: (body: JobUpdateInput) =>
      fetchJson<Job>(`/api/jobs/${job.id}`, { method: 'PATCH', json: body }),
    onSuccess: (updated) => {
      queryClient.setQueryData<Job>(['job', job.id], (old) =>
        old ? { ...old, ...updated, designs: updated.designs ?? old.designs } : updated,
      );
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      toast('Job details saved');
      onDone();
    },
    onError: (err) => {
      if (err instanceof ApiError) setErrors(apiFieldsToFieldErrors(err.fields));
    },
  });

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const body: JobUpdateInput = { title, siteAddress, notes };
    const parsed = jobUpdateSchema.safeParse(body);
    if (!parsed.success) {
      setErrors(issuesToFieldErrors(parsed.error.issues));
      return;
    }
    setErrors({});
    save.mutate(body);
  }

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      className="flex flex-col gap-4"
      aria-label="Edit job details"
    >
      {save.isError ? (
        <Alert tone="error" title="Not saved">
          {errorMessage(save.error)}
        </Alert>
      ) : null}
      <Field label="Job title" error={errors.title}>
        {(a11y) => <Input {...a11y} value={title} onChange={(e) => setTitle(e.target.value)} />}
      </Field>
      <Field label="Site address" error={errors.siteAddress}>
        {(a11y) => (
          <TextArea
            {...a11y}
            rows={2}
            value={siteAddress}
            onChange={(e) => setSiteAddress(e.target.value)}
          />
        )}
      </Field>
      <Field label="Notes" optional error={errors.notes}>
        {(a11y) => (
          <TextArea {...a11y} rows={5} value={notes} onChange={(e) => setNotes(e.target.value)} />
        )}
      </Field>
      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        <Button variant="secondary" onClick={onDone} disabled={save.isPending}>
          Cancel
        </Button>
        <Button type="submit" busy={save.isPending}>
          Save details
        </Button>
      </div>
    </form>
  );
}
