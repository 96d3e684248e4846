'use client';
// The crew's build stages for a job: set out, footings, frame, boards, finished; each marked with a
// date, who marked it and optional photos.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { uploadFile } from '@/components/files/JobFiles';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { Card } from '@/components/ui/Card';
import { Input } from '@/components/ui/Input';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDate } from '@/components/ui/formatDate';
import type { StageView } from '@/lib/server/stages';

function StageRow({
  jobId,
  s,
  onDone,
}: {
  jobId: string;
  s: StageView;
  onDone: (v: StageView[]) => void;
}) {
  const [open, setOpen] = useState(false);
  const [date, setDate] = useState(() => new Date().toISOString().slice(0, 10));
  const [photos, setPhotos] = useState<FileList | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function mark() {
    setBusy(true);
    setError(null);
    try {
      const fileIds: string[] = [];
      for (const f of Array.from(photos ?? [])) fileIds.push((await uploadFile(jobId, f)).id);
      onDone(
        await fetchJson<StageView[]>(`/api/jobs/${jobId}/stages`, {
          method: 'POST',
          json: { stage: s.stage, doneOn: date, fileIds },
        }),
      );
      setOpen(false);
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(false);
    }
  }

  return (
    <li className="flex flex-col gap-2 py-3" data-testid={`stage-${s.stage}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-semibold text-ash-900">
          {s.done ? '✓ ' : ''}
          {s.label}
        </span>
        {s.done ? (
          <span className="text-sm text-ash-700">
            Done {formatDate(s.done.doneOn)}
            {s.done.markedBy ? `, marked by ${s.done.markedBy}` : ''}
          </span>
        ) : (
          <Button size="sm" variant="secondary" onClick={() => setOpen(!open)}>
            Mark {s.label.toLowerCase()} done
          </Button>
        )}
      </div>
      {s.done && s.done.photos.length > 0 ? (
        <div className="flex gap-2">
          {s.done.photos.map((p) => (
            <a key={p.id} href={p.url} target="_blank" rel="noreferrer">
              {/* eslint-disable-next-line @next/next/no-img-element -- private bytes behind our own route */}
              <img
                src={p.thumbUrl ?? p.url}
                alt={`${s.label} photo`}
                className="size-16 rounded object-cover"
              />
            </a>
          ))}
        </div>
      ) : null}
      {open ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void mark();
          }}
        >
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Date done
            <Input
              type="date"
              value={date}
              onChange={(e) => setDate(e.target.value)}
              required
              className="w-44"
            />
          </label>
          <label className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
            Photos (optional)
            <input
              type="file"
              accept="image/jpeg,image/png,image/webp"
              capture="environment"
              multiple
              onChange={(e) => setPhotos(e.target.files)}
              className="text-sm"
            />
          </label>
          <Button type="submit" size="sm" busy={busy}>
            Save stage
          </Button>
          {error ? (
            <Alert tone="error" className="w-full">
              {error}
            </Alert>
          ) : null}
        </form>
      ) : null}
    </li>
  );
}

export function BuildStages({ jobId }: { jobId: string }) {
  const qc = useQueryClient();
  const stages = useQuery({
    queryKey: ['job-stages', jobId],
    queryFn: ({ signal }) => fetchJson<StageView[]>(`/api/jobs/${jobId}/stages`, { signal }),
  });
  return (
    <Card title="Build stages" id="stages">
      {stages.isError ? <Alert tone="error">{errorMessage(stages.error)}</Alert> : null}
      <ol className="divide-y divide-ash-100">
        {stages.data?.map((s) => (
          <StageRow
            key={s.stage}
            jobId={jobId}
            s={s}
            onDone={(v) => {
              qc.setQueryData(['job-stages', jobId], v);
              void qc.invalidateQueries({ queryKey: ['job-files', jobId] });
              void qc.invalidateQueries({ queryKey: ['job', jobId] });
            }}
          />
        ))}
      </ol>
    </Card>
  );
}
