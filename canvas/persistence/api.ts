// The design routes the editor calls (DEVELOPERS.md): read, save with the version last seen, save as a copy.
import type { DesignDocument } from '@/engine/schema';
import {
  designSchema,
  staleDesignSchema,
  type DesignDto,
  type StaleDesign,
} from '@/lib/validation/design';

export type SaveOutcome =
  | { kind: 'saved'; design: DesignDto }
  | { kind: 'conflict'; current: StaleDesign['current']; message: string }
  | { kind: 'offline'; message: string }
  | { kind: 'error'; status: number; message: string };

async function errorMessage(res: Response): Promise<string> {
  try {
    const body = (await res.json()) as { error?: string };
    return body.error ?? `The server answered ${res.status}`;
  } catch {
    return `The server answered ${res.status}`;
  }
}

export interface DesignApi {
  save(
    id: string,
    body: { version: number; document: DesignDocument; name?: string },
  ): Promise<SaveOutcome>;
  load(id: string): Promise<DesignDto>;
  copy(jobId: string, name: string, document: DesignDocument): Promise<DesignDto>;
}

export const httpDesignApi: DesignApi = {
  async save(id, body) {
    let res: Response;
    try {
      res = await fetch(`/api/designs/${id}`, {
        method: 'PUT',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
    } catch (e) {
      return { kind: 'offline', message: e instanceof Error ? e.message : 'No connection' };
    }
    if (res.ok) return { kind: 'saved', design: designSchema.parse(await res.json()) };
    if (res.status === 409) {
      const parsed = staleDesignSchema.safeParse(await res.json().catch(() => null));
      if (parsed.success) {
        return { kind: 'conflict', current: parsed.data.current, message: parsed.data.error };
      }
      const unknown = { version: -1, updatedAt: new Date(0).toISOString(), updatedBy: null };
      return { kind: 'conflict', current: unknown, message: 'Someone else saved this design' };
    }
    // Gateways and restarts answer 502-504: treat like being offline and try again.
    if (res.status >= 502 && res.status <= 504)
      return { kind: 'offline', message: await errorMessage(res) };
    return { kind: 'error', status: res.status, message: await errorMessage(res) };
  },
  async load(id) {
    const res = await fetch(`/api/designs/${id}`, { cache: 'no-store' });
    if (!res.ok) throw new Error(await errorMessage(res));
    return designSchema.parse(await res.json());
  },
  async copy(jobId, name, document) {
    const res = await fetch(`/api/jobs/${jobId}/designs`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ name, document }),
    });
    if (!res.ok) throw new Error(await errorMessage(res));
    return designSchema.parse(await res.json());
  },
};
