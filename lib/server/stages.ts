// Build stages on a job (set out, footings, frame, boards, finished): each with the date it was
// done, who marked it and any photos; marking one moves the job on to building (or complete).
import { Op } from 'sequelize';
import type { SessionUser } from '@/lib/validation/access';
import {
  BUILD_STAGE_KEYS,
  BUILD_STAGE_LABELS,
  markStageSchema,
  type BuildStageKey,
} from '@/lib/validation/jobFiles';
import { assertCanDo } from './businessAccess';
import { bdb } from './businessDb';
import { NotFound, parseInput } from './errors';

export interface StageView {
  stage: BuildStageKey;
  label: string;
  done: {
    id: string;
    doneOn: string;
    note: string;
    markedBy: string | null;
    photos: { id: string; thumbUrl: string | null; url: string }[];
  } | null;
}

async function findJob(actor: SessionUser, jobId: string) {
  const { models } = bdb();
  if (!/^[0-9a-f-]{36}$/i.test(jobId)) throw new NotFound('No such job');
  const job = await models.Job.findOne({ where: { id: jobId, firmId: actor.firmId } });
  if (!job) throw new NotFound('No such job');
  return job;
}

export async function listStages(actor: SessionUser, jobId: string): Promise<StageView[]> {
  assertCanDo(actor, 'stage:read');
  await findJob(actor, jobId);
  const { models } = bdb();
  const rows = await models.BuildStage.findAll({ where: { firmId: actor.firmId, jobId } });
  const files = await models.JobFile.findAll({
    where: { firmId: actor.firmId, jobId, stageId: { [Op.ne]: null } },
    order: [['createdAt', 'ASC']],
  });
  const userIds = [...new Set(rows.map((r) => r.markedById).filter((x): x is string => !!x))];
  const users = userIds.length
    ? await models.User.findAll({ where: { id: userIds }, attributes: ['id', 'name'] })
    : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return BUILD_STAGE_KEYS.map((stage) => {
    const r = rows.find((x) => x.stage === stage);
    return {
      stage,
      label: BUILD_STAGE_LABELS[stage],
      done: r
        ? {
            id: r.id,
            doneOn: r.doneOn,
            note: r.note,
            markedBy: r.markedById ? (names.get(r.markedById) ?? null) : null,
            photos: files
              .filter((f) => f.stageId === r.id)
              .map((f) => ({
                id: f.id,
                url: `/api/jobs/${jobId}/files/${f.id}`,
                thumbUrl: f.thumbKey ? `/api/jobs/${jobId}/files/${f.id}?thumb=1` : null,
              })),
          }
        : null,
    };
  });
}

/** Marks a stage done (again: updates its date and note), attaching any of the job's photos. */
export async function markStage(
  actor: SessionUser,
  jobId: string,
  input: unknown,
): Promise<StageView[]> {
  assertCanDo(actor, 'stage:mark');
  const body = parseInput(markStageSchema, input);
  const job = await findJob(actor, jobId);
  const { models, sequelize } = bdb();
  await sequelize.transaction(async (transaction) => {
    const doneOn = body.doneOn ?? new Date().toISOString().slice(0, 10);
    const existing = await models.BuildStage.findOne({
      where: { firmId: actor.firmId, jobId, stage: body.stage },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const row = existing
      ? await existing.update(
          { doneOn, note: body.note ?? existing.note, markedById: actor.id },
          { transaction },
        )
      : await models.BuildStage.create(
          {
            firmId: actor.firmId,
            jobId,
            stage: body.stage,
            doneOn,
            note: body.note ?? '',
            markedById: actor.id,
          },
          { transaction },
        );
    if (body.fileIds?.length)
      await models.JobFile.update(
        { stageId: row.id },
        { where: { id: body.fileIds, firmId: actor.firmId, jobId }, transaction },
      );
    const next =
      body.stage === 'finished'
        ? 'complete'
        : ['enquiry', 'surveyed', 'designing', 'quoted', 'accepted'].includes(job.status)
          ? 'building'
          : null;
    if (next && job.status !== next && job.status !== 'lost')
      await job.update({ status: next }, { transaction });
  });
  return listStages(actor, jobId);
}

export async function unmarkStage(
  actor: SessionUser,
  jobId: string,
  stage: string,
): Promise<StageView[]> {
  assertCanDo(actor, 'stage:mark');
  await findJob(actor, jobId);
  const { models } = bdb();
  await models.BuildStage.destroy({ where: { firmId: actor.firmId, jobId, stage } });
  return listStages(actor, jobId);
}

/** The furthest stage each job has reached, for the job list. */
export async function furthestStages(
  firmId: string,
  jobIds: string[],
): Promise<Map<string, { stage: BuildStageKey; label: string; doneOn: string }>> {
  const out = new Map<string, { stage: BuildStageKey; label: string; doneOn: string }>();
  if (jobIds.length === 0) return out;
  const { models } = bdb();
  const rows = await models.BuildStage.findAll({ where: { firmId, jobId: jobIds } });
  for (const r of rows) {
    const cur = out.get(r.jobId);
    if (!cur || BUILD_STAGE_KEYS.indexOf(r.stage) > BUILD_STAGE_KEYS.indexOf(cur.stage))
      out.set(r.jobId, { stage: r.stage, label: BUILD_STAGE_LABELS[r.stage], doneOn: r.doneOn });
  }
  return out;
}
