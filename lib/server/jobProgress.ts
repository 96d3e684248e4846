// Where each job stands, for the job list: the furthest build stage reached and, for owners and
// designers, the latest quote's status and whether its deposit is paid.
import type { SessionUser } from '@/lib/validation/access';
import { canDo } from '@/lib/validation/businessAccess';
import type { QuoteStatus } from '@/lib/validation/quote';
import { bdb } from './businessDb';
import { quoteStatusForJobs } from './quotes';
import { furthestStages } from './stages';

export interface JobProgress {
  stage: { label: string; doneOn: string } | null;
  quote: { status: QuoteStatus; paid: boolean } | null;
}

export async function jobProgress(
  actor: SessionUser,
  ids: string[],
): Promise<Record<string, JobProgress>> {
  const wanted = [...new Set(ids.filter((id) => /^[0-9a-f-]{36}$/i.test(id)))].slice(0, 200);
  const { models } = bdb();
  // Only the firm's own jobs: ids of other firms simply get no answer.
  const jobs = await models.Job.findAll({
    where: { firmId: actor.firmId, id: wanted },
    attributes: ['id'],
  });
  const mine = jobs.map((j) => j.id);
  const stages = await furthestStages(actor.firmId, mine);
  const quotes = canDo(actor, 'quote:read') ? await quoteStatusForJobs(actor.firmId, mine) : null;
  const out: Record<string, JobProgress> = {};
  for (const id of mine) {
    const s = stages.get(id);
    out[id] = {
      stage: s ? { label: s.label, doneOn: s.doneOn } : null,
      quote: quotes?.get(id) ?? null,
    };
  }
  return out;
}
