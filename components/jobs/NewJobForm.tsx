'use client';
// Create a job: title, site address, client (existing or new), status and notes; then open it.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { Select } from '@/components/ui/Select';
import { TextArea } from '@/components/ui/TextArea';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import {
  apiFieldsToFieldErrors,
  issuesToFieldErrors,
  type FieldErrors,
} from '@/components/ui/fieldErrors';
import { jobCreateSchema, type JobCreateInput } from '@/lib/validation/job';
import { JOB_STATUSES, jobStatusHints, jobStatusLabels, type JobStatus } from './jobStatus';
import type { Client, Job } from './types';

const NEW_CLIENT = '__new__';

export function NewJobForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [title, setTitle] = useState('');
  const [siteAddress, setSiteAddress] = useState('');
  const [status, setStatus] = useState<JobStatus>('enquiry');
  const [notes, setNotes] = useState('');
  const [clientChoice, setClientChoice] = useState('');
  const [client, setClient] = useState({ name: '', email: '', phone: '' });
  const [errors, setErrors] = useState<FieldErrors>({});

  const clients = useQuery({
    queryKey: ['clients'],
    queryFn: ({ signal }) => fetchJson<Client[]>('/api/clients', { signal }),
  });

  const create = useMutation({
    mutationFn: (body: JobCreateInput) =>
      fetchJson<Job>('/api/jobs', { method: 'POST', json: body }),
    onSuccess: async (job) => {
      await queryClient.invalidateQueries({ queryKey: ['jobs'] });
      router.push(`/jobs/${job.id}`);
    },
    onError: (err) => {
      if (err instanceof ApiError && Object.keys(err.fields).length) {
        setErrors(apiFieldsToFieldErrors(err.fields));
      }
    },
  });

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const body: JobCreateInput = { title, siteAddress, status, notes };
    if (clientChoice === NEW_CLIENT) body.client = client;
    else if (clientChoice) body.clientId = clientChoice;
    const parsed = jobCreateSchema.safeParse(body);
    if (!parsed.success) {
      setErrors(issuesToFieldErrors(parsed.error.issues));
      return;
    }
    setErrors({});
    create.mutate(body);
  }

  const busy = create.isPending || create.isSuccess;

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-6" aria-label="New job">
      {create.isError ? (
        <Alert tone="error" title="The job was not created">
          {errorMessage(create.error)}
        </Alert>
      ) : null}

      <fieldset className="grid gap-4 rounded-xl border border-ash-200 bg-white p-4 shadow-card sm:p-6">
        <legend className="sr-only">The job</legend>
        <Field
          label="Job title"
          error={errors.title}
          hint="How the office will know it, e.g. “Rear garden deck, Beech Road”."
        >
          {(a11y) => (
            <Input
              {...a11y}
              name="title"
              value={title}
              onChange={(e) => setTitle(e.target.value)}
              autoFocus
            />
          )}
        </Field>
        <Field label="Site address" error={errors.siteAddress}>
          {(a11y) => (
            <TextArea
              {...a11y}
              name="siteAddress"
              rows={2}
              value={siteAddress}
              onChange={(e) => setSiteAddress(e.target.value)}
              autoComplete="street-address"
            />
          )}
        </Field>
        <Field label="Status" error={errors.status} hint={jobStatusHints[status]}>
          {(a11y) => (
            <Select
              {...a11y}
              name="status"
              value={status}
              onChange={(e) => setStatus(e.target.value as JobStatus)}
            >
              {JOB_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {jobStatusLabels[s]}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </fieldset>

      <fieldset className="grid gap-4 rounded-xl border border-ash-200 bg-white p-4 shadow-card sm:p-6">
        <legend className="sr-only">Client</legend>
        <Field
          label="Client"
          optional
          error={errors.clientId}
          hint="Someone you have worked for before, or add the homeowner now."
        >
          {(a11y) => (
            <Select
              {...a11y}
              name="clientId"
              value={clientChoice}
              onChange={(e) => setClientChoice(e.target.value)}
              disabled={clients.isLoading}
            >
              <option value="">No client yet</option>
              <option value={NEW_CLIENT}>+ A new client…</option>
              {(clients.data ?? []).length ? (
                <optgroup label="Existing clients">
                  {(clients.data ?? []).map((c) => (
                    <option key={c.id} value={c.id}>
                      {c.name}
                    </option>
                  ))}
                </optgroup>
              ) : null}
            </Select>
          )}
        </Field>
        {clientChoice === NEW_CLIENT ? (
          <div className="grid gap-4 rounded-lg border border-larch-200 bg-larch-50/60 p-4 sm:grid-cols-2">
            <Field
              label="Client name"
              error={errors['client.name'] ?? errors.client}
              className="sm:col-span-2"
            >
              {(a11y) => (
                <Input
                  {...a11y}
                  name="clientName"
                  value={client.name}
                  onChange={(e) => setClient({ ...client, name: e.target.value })}
                  autoComplete="off"
                />
              )}
            </Field>
            <Field label="Client email" optional error={errors['client.email']}>
              {(a11y) => (
                <Input
                  {...a11y}
                  type="email"
                  name="clientEmail"
                  inputMode="email"
                  value={client.email}
                  onChange={(e) => setClient({ ...client, email: e.target.value })}
                  autoComplete="off"
                />
              )}
            </Field>
            <Field label="Client phone" optional error={errors['client.phone']}>
              {(a11y) => (
                <Input
                  {...a11y}
                  type="tel"
                  name="clientPhone"
                  value={client.phone}
                  onChange={(e) => setClient({ ...client, phone: e.target.value })}
                  autoComplete="off"
                />
              )}
            </Field>
          </div>
        ) : null}
        {clients.isError ? (
          <p className="text-sm text-clay-700">
            The client list could not be loaded ({errorMessage(clients.error)}). You can still add a
            new client.
          </p>
        ) : null}
      </fieldset>

      <fieldset className="grid gap-4 rounded-xl border border-ash-200 bg-white p-4 shadow-card sm:p-6">
        <legend className="sr-only">Notes</legend>
        <Field
          label="Notes"
          optional
          error={errors.notes}
          hint="Access, levels, anything the designer or crew should know."
        >
          {(a11y) => (
            <TextArea
              {...a11y}
              name="notes"
              rows={4}
              value={notes}
              onChange={(e) => setNotes(e.target.value)}
            />
          )}
        </Field>
      </fieldset>

      {errors[''] ? <Alert tone="error">{errors['']}</Alert> : null}

      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        <ButtonLink href="/jobs" variant="secondary">
          Cancel
        </ButtonLink>
        <Button type="submit" busy={busy}>
          Create job
        </Button>
      </div>
    </form>
  );
}
