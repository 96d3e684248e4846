'use client';
// One job: who, where, what state, the notes, and its designs.
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { BackLink } from '@/components/layout/BackLink';
import { PageHeader } from '@/components/layout/PageHeader';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { Card } from '@/components/ui/Card';
import { EmptyState } from '@/components/ui/EmptyState';
import { SafetyNotice } from '@/components/ui/SafetyNotice';
import { Spinner } from '@/components/ui/Spinner';
import { ApiError, fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime, formatRelative } from '@/components/ui/formatDate';
import type { UnitSystem } from '@/lib/units';
import { DeleteJobButton } from './DeleteJobButton';
import { DesignsPanel } from './DesignsPanel';
import { JobDetailsForm } from './JobDetailsForm';
import { JobStatusPicker } from './JobStatusPicker';
import { StatusBadge } from './StatusBadge';
import type { Job } from './types';

export function JobDetail({
  id,
  canEdit,
  canDelete,
  units,
}: {
  id: string;
  canEdit: boolean;
  canDelete: boolean;
  units: UnitSystem;
}) {
  const [editing, setEditing] = useState(false);
  const job = useQuery({
    queryKey: ['job', id],
    queryFn: ({ signal }) => fetchJson<Job>(`/api/jobs/${id}`, { signal }),
  });

  if (job.isLoading) {
    return (
      <div className="flex min-h-60 items-center justify-center gap-3 text-ash-600">
        <Spinner /> Loading the job…
      </div>
    );
  }

  if (job.isError || !job.data) {
    const missing = job.error instanceof ApiError && job.error.status === 404;
    return (
      <div className="flex flex-col gap-4">
        <BackLink href="/jobs">Jobs</BackLink>
        {missing ? (
          <EmptyState
            title="This job isn’t here"
            action={<ButtonLink href="/jobs">Back to jobs</ButtonLink>}
          >
            It may have been deleted, or the link is wrong.
          </EmptyState>
        ) : (
          <LoadError
            title="The job could not be loaded"
            error={job.error}
            onRetry={() => void job.refetch()}
          />
        )}
      </div>
    );
  }

  const data = job.data;
  return (
    <>
      <PageHeader
        eyebrow={<BackLink href="/jobs">Jobs</BackLink>}
        title={data.title}
        description={
          <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <StatusBadge status={data.status} />
            <span className="text-sm">
              Updated{' '}
              <time dateTime={data.updatedAt} title={formatDateTime(data.updatedAt)}>
                {formatRelative(data.updatedAt)}
              </time>
            </span>
          </span>
        }
        actions={
          <>
            {canEdit && !editing ? (
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit details
              </Button>
            ) : null}
            {canDelete ? <DeleteJobButton job={data} /> : null}
          </>
        }
      />

      {/* One column on phones and portrait tablets (designs straight after the status); two side by side from lg. */}
      <div className="flex flex-col gap-4 lg:grid lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)] lg:items-start lg:gap-6">
        <div className="contents lg:flex lg:flex-col lg:gap-6">
          {editing ? (
            <Card title="Edit details" className="order-1">
              <JobDetailsForm job={data} onDone={() => setEditing(false)} />
            </Card>
          ) : (
            <Card title="Site and client" className="order-1">
              <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-1 xl:grid-cols-2">
                <div>
                  <dt className="text-xs font-semibold uppercase tracking-wide text-ash-600">
                    Site address
                  </dt>
                  <dd className="mt-1 whitespace-pre-line text-ash-900">{data.siteAddress}</dd>
                </div>
                <div>
                  <dt className="text-xs font-semibold uppercase tracking-wide text-ash-600">
                    Client
                  </dt>
                  <dd className="mt-1 text-ash-900">
                    {data.client ? (
                      <>
                        <span className="font-semibold">{data.client.name}</span>
                        {data.client.email ? (
                          <a
                            href={`mailto:${data.client.email}`}
                            className="block text-spruce-700 underline-offset-2 hover:underline"
                          >
                            {data.client.email}
                          </a>
                        ) : null}
                        {data.client.phone ? (
                          <a
                            href={`tel:${data.client.phone.replace(/\s+/g, '')}`}
                            className="block text-spruce-700 underline-offset-2 hover:underline"
                          >
                            {data.client.phone}
                          </a>
                        ) : null}
                        {data.client.address ? (
                          <span className="block whitespace-pre-line text-sm text-ash-700">
                            {data.client.address}
                          </span>
                        ) : null}
                      </>
                    ) : (
                      <span className="text-ash-600">No client yet</span>
                    )}
                  </dd>
                </div>
              </dl>
            </Card>
          )}

          <Card title="Status" className="order-2">
            <JobStatusPicker job={data} canEdit={canEdit} />
          </Card>

          {!editing ? (
            <Card title="Notes" className="order-4">
              {data.notes?.trim() ? (
                <p className="whitespace-pre-line text-ash-800">{data.notes}</p>
              ) : (
                <p className="text-ash-600">
                  No notes.{' '}
                  {canEdit
                    ? 'Add access, levels or anything the crew should know with “Edit details”.'
                    : ''}
                </p>
              )}
            </Card>
          ) : null}
        </div>

        <div className="contents lg:flex lg:flex-col lg:gap-6">
          <div className="order-3">
            <DesignsPanel job={data} canEdit={canEdit} units={units} />
          </div>
          <div className="order-5 flex flex-col gap-3">
            <SafetyNotice />
            <p className="text-xs text-ash-600">Job created {formatDateTime(data.createdAt)}.</p>
          </div>
        </div>
      </div>
    </>
  );
}
