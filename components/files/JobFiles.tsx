'use client';
// The job's site photos and documents: a gallery, and an upload button that opens the camera on a
// phone or tablet. Crew, designers and owners may all add files.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Card } from '@/components/ui/Card';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { formatDateTime } from '@/components/ui/formatDate';
import { buttonClasses } from '@/components/ui/buttonClasses';
import type { JobFileView } from '@/lib/server/files';

/** Uploads one file to the job; resolves with the stored file or throws the server's message. */
export async function uploadFile(
  jobId: string,
  file: File,
  caption?: string,
): Promise<JobFileView> {
  const form = new FormData();
  form.set('file', file);
  if (caption) form.set('caption', caption);
  // Not fetchJson: it sends JSON bodies only; the browser sets the multipart boundary itself.
  const res = await fetch(`/api/jobs/${jobId}/files`, { method: 'POST', body: form });
  const body = (await res.json().catch(() => ({}))) as JobFileView & { error?: string };
  if (!res.ok) throw new ApiError(res.status, body.error ?? `Upload failed (${res.status})`);
  return body;
}

export function JobFiles({ jobId }: { jobId: string }) {
  const qc = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const files = useQuery({
    queryKey: ['job-files', jobId],
    queryFn: ({ signal }) => fetchJson<JobFileView[]>(`/api/jobs/${jobId}/files`, { signal }),
  });

  async function onPick(list: FileList | null) {
    if (!list?.length) return;
    setBusy(true);
    setError(null);
    try {
      for (const f of Array.from(list)) await uploadFile(jobId, f);
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
      void qc.invalidateQueries({ queryKey: ['job-files', jobId] });
    }
  }

  return (
    <Card
      title="Site photos and documents"
      id="photos"
      actions={
        <label className={buttonClasses('secondary', 'sm', busy ? 'opacity-60' : '')}>
          {busy ? 'Uploading…' : 'Add photo or PDF'}
          <input
            ref={input}
            type="file"
            className="sr-only"
            accept="image/jpeg,image/png,image/webp,application/pdf"
            capture="environment"
            multiple
            disabled={busy}
            data-testid="file-input"
            onChange={(e) => void onPick(e.target.files)}
          />
        </label>
      }
    >
      {error ? (
        <Alert tone="error" className="mb-3">
          {error}
        </Alert>
      ) : null}
      {files.isError ? <Alert tone="error">{errorMessage(files.error)}</Alert> : null}
      {files.data && files.data.length === 0 ? (
        <p className="text-sm text-ash-700">No photos or documents yet. JPEG, PNG, WebP or PDF.</p>
      ) : null}
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" aria-label="Job files">
        {files.data?.map((f) => (
          <li key={f.id} className="flex flex-col gap-1 text-xs text-ash-700">
            <a
              href={f.url}
              target="_blank"
              rel="noreferrer"
              className="block overflow-hidden rounded-lg border border-ash-200 bg-ash-50"
            >
              {f.thumbUrl ? (
                // eslint-disable-next-line @next/next/no-img-element -- private, per-firm bytes behind our own route
                <img
                  src={f.thumbUrl}
                  alt={f.caption || f.name}
                  className="aspect-[4/3] w-full object-cover"
                  loading="lazy"
                />
              ) : (
                <span className="flex aspect-[4/3] items-center justify-center font-semibold text-ash-700">
                  PDF
                </span>
              )}
            </a>
            <span className="truncate font-medium text-ash-900" title={f.name}>
              {f.name}
            </span>
            <span>
              {f.uploadedBy ?? 'Someone'} · {formatDateTime(f.createdAt)}
            </span>
          </li>
        ))}
      </ul>
    </Card>
  );
}
