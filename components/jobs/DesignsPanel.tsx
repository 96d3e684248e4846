'use client';
// A job's deck designs: open one in the editor, or start a new one from the 6 m x 4 m starter.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { EmptyState } from '@/components/ui/EmptyState';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { apiFieldsToFieldErrors, issuesToFieldErrors } from '@/components/ui/fieldErrors';
import { formatDateTime, formatRelative } from '@/components/ui/formatDate';
import { formatLength, type UnitSystem } from '@/lib/units';
import { designCreateSchema } from '@/lib/validation/design';
import type { Design, Job } from './types';

export function DesignsPanel({
  job,
  canEdit,
  units,
}: {
  job: Job;
  canEdit: boolean;
  units: UnitSystem;
}) {
  const [creating, setCreating] = useState(false);
  const designs = [...job.designs].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  return (
    <Card
      title={
        <>
          Designs <span className="ml-1 font-normal text-ash-600">({job.designs.length})</span>
        </>
      }
      actions={
        canEdit && !creating ? (
          <Button size="sm" onClick={() => setCreating(true)}>
            <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
              <path
                d="M10 4v12M4 10h12"
                stroke="currentColor"
                strokeWidth="2.2"
                strokeLinecap="round"
              />
            </svg>
            New design
          </Button>
        ) : null
      }
      bodyClassName=""
    >
      {creating ? (
        <NewDesignForm
          job={job}
          suggestedName={`Design ${job.designs.length + 1}`}
          units={units}
          onCancel={() => setCreating(false)}
        />
      ) : null}
      {designs.length === 0 ? (
        creating ? null : (
          <div className="p-4 sm:p-5">
            <EmptyState title="No designs yet">
              {canEdit
                ? 'Start a design to sketch the footprint; the frame lays itself out as you draw.'
                : 'The office has not drawn a deck for this job yet.'}
            </EmptyState>
          </div>
        )
      ) : (
        <ul className="divide-y divide-ash-100" aria-label="Designs">
          {designs.map((d) => (
            <li key={d.id}>
              <Link
                href={`/designs/${d.id}`}
                className="flex min-h-16 items-center gap-3 px-4 py-3 hover:bg-larch-50/70 sm:px-5"
              >
                <PlanIcon />
                <span className="min-w-0 flex-1">
                  <span className="block truncate font-semibold text-spruce-800">{d.name}</span>
                  <span className="block text-sm text-ash-600">
                    Version {d.version} · saved{' '}
                    <time dateTime={d.updatedAt} title={formatDateTime(d.updatedAt)}>
                      {formatRelative(d.updatedAt)}
                    </time>
                    {d.updatedBy ? ` by ${d.updatedBy.name}` : ''}
                  </span>
                </span>
                <span className="hidden text-sm font-semibold text-spruce-700 sm:inline">
                  {canEdit ? 'Open editor' : 'View plan'}
                </span>
                <svg
                  viewBox="0 0 20 20"
                  className="size-5 shrink-0 text-ash-400"
                  aria-hidden="true"
                >
                  <path
                    d="M7.5 4.5 13 10l-5.5 5.5"
                    fill="none"
                    stroke="currentColor"
                    strokeWidth="2"
                    strokeLinecap="round"
                    strokeLinejoin="round"
                  />
                </svg>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

function NewDesignForm({
  job,
  suggestedName,
  units,
  onCancel,
}: {
  job: Job;
  suggestedName: string;
  units: UnitSystem;
  onCancel: () => void;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [name, setName] = useState(suggestedName);
  const [error, setError] = useState<string | null>(null);
  const create = useMutation({
    mutationFn: (body: { name: string }) =>
      fetchJson<Design>(`/api/jobs/${job.id}/designs`, { method: 'POST', json: body }),
    onSuccess: async (design) => {
      await queryClient.invalidateQueries({ queryKey: ['job', job.id] });
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      router.push(`/designs/${design.id}`);
    },
    onError: (err) => {
      if (err instanceof ApiError) setError(apiFieldsToFieldErrors(err.fields).name ?? null);
    },
  });

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = designCreateSchema.safeParse({ name });
    if (!parsed.success) {
      setError(issuesToFieldErrors(parsed.error.issues).name ?? 'Check the name');
      return;
    }
    setError(null);
    create.mutate({ name: parsed.data.name });
  }

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label="New design"
      className="flex flex-col gap-3 border-b border-ash-100 bg-larch-50/60 p-4 sm:p-5"
    >
      {create.isError && !error ? (
        <Alert tone="error" title="The design was not created">
          {errorMessage(create.error)}
        </Alert>
      ) : null}
      <Field
        label="Design name"
        error={error}
        hint={`It starts as a ${formatLength(6000, units, { metricAs: 'm' })} × ${formatLength(4000, units, { metricAs: 'm' })} rectangle; reshape it in the editor.`}
      >
        {(a11y) => (
          <Input {...a11y} value={name} onChange={(e) => setName(e.target.value)} autoFocus />
        )}
      </Field>
      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        <Button variant="secondary" onClick={onCancel} disabled={create.isPending}>
          Cancel
        </Button>
        <Button type="submit" busy={create.isPending || create.isSuccess}>
          Create and open
        </Button>
      </div>
    </form>
  );
}

function PlanIcon() {
  return (
    <span
      className="grid size-10 shrink-0 place-items-center rounded-lg bg-spruce-50 text-spruce-600"
      aria-hidden="true"
    >
      <svg viewBox="0 0 24 24" className="size-6">
        <path
          d="M4 5h16v10h-7v4H4z"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.6"
          strokeLinejoin="round"
        />
        <path d="M8 5v14M12 5v10M16 5v10" stroke="currentColor" strokeWidth="1.2" opacity="0.6" />
      </svg>
    </span>
  );
}
