// Jobs of the signed-in user's firm: list with search/filter/sort/paging, read, create, change, delete.
import { Op, literal, type Order, type Transaction, type WhereOptions } from 'sequelize';
import type { SessionUser } from '@/lib/validation/access';
import { idSchema } from '@/lib/validation/common';
import {
  jobCreateSchema,
  jobListQuerySchema,
  jobUpdateSchema,
  type JobDto,
  type JobList,
  type JobSummary,
} from '@/lib/validation/job';
import { Client, Design, Job, JOB_STATUSES, User } from '@/models';
import { assertCan } from './access';
import { clientDto, insertClient } from './clients';
import { db } from './db';
import { designSummaryDto } from './designs';
import { BadRequest, NotFound, parseInput } from './errors';

const DESIGN_COUNT = literal(
  '(SELECT count(*)::int FROM designs AS d WHERE d.job_id = "Job"."id")',
);

/** Escapes LIKE wildcards so a search for "50%" means the text "50%". */
function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

function summaryDto(job: Job, designCount: number): JobSummary {
  return {
    id: job.id,
    title: job.title,
    status: job.status,
    siteAddress: job.siteAddress,
    client: job.client ? { id: job.client.id, name: job.client.name } : null,
    designCount,
    updatedAt: job.updatedAt.toISOString(),
  };
}

/** The firm's jobs matching the query (q over title, site address and client name). */
export async function listJobs(actor: SessionUser, query: unknown): Promise<JobList> {
  assertCan(actor, 'job:read');
  const { q, status, sort, dir, page, pageSize } = parseInput(jobListQuerySchema, query);
  db();

  const where: WhereOptions = { firmId: actor.firmId };
  const and: WhereOptions[] = [];
  if (status.length > 0) and.push({ status: { [Op.in]: status } });
  if (q) {
    const pattern = likePattern(q);
    and.push({
      [Op.or]: [
        { title: { [Op.iLike]: pattern } },
        { siteAddress: { [Op.iLike]: pattern } },
        { '$client.name$': { [Op.iLike]: pattern } },
      ],
    });
  }
  if (and.length > 0) Object.assign(where, { [Op.and]: and });

  const d = dir === 'asc' ? 'ASC' : 'DESC';
  const statusOrder = `array_position(ARRAY[${JOB_STATUSES.map((s) => `'${s}'`).join(',')}]::text[], "Job"."status")`;
  const byKey: Record<typeof sort, Order> = {
    updatedAt: [['updatedAt', d]],
    title: [[literal(`lower("Job"."title")`), d]],
    status: [
      [literal(statusOrder), d],
      ['updatedAt', 'DESC'],
    ],
    client: [[literal(`lower("client"."name")`), `${d} NULLS LAST`]],
  };
  // The id tie-break keeps paging stable when sort keys are equal.
  const order: Order = [...(byKey[sort] as unknown[]), ['id', 'ASC']] as Order;

  const { rows, count } = await Job.findAndCountAll({
    where,
    include: [{ model: Client, as: 'client', attributes: ['id', 'name'], required: false }],
    attributes: { include: [[DESIGN_COUNT, 'designCount']] },
    order,
    limit: pageSize,
    offset: (page - 1) * pageSize,
    subQuery: false,
    distinct: true,
    col: 'id',
  });
  return {
    items: rows.map((j) => summaryDto(j, Number(j.get('designCount') ?? 0))),
    total: count,
    page,
    pageSize,
  };
}

async function findJob(actor: SessionUser, id: string, transaction?: Transaction) {
  if (!idSchema.safeParse(id).success) throw new NotFound('Job not found');
  const job = await Job.findOne({
    where: { id, firmId: actor.firmId },
    include: [{ model: Client, as: 'client', required: false }],
    transaction,
  });
  if (!job) throw new NotFound('Job not found');
  return job;
}

async function jobDto(job: Job, transaction?: Transaction): Promise<JobDto> {
  const designs = await Design.findAll({
    where: { jobId: job.id, firmId: job.firmId },
    attributes: ['id', 'name', 'version', 'updatedAt', 'updatedById'],
    include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'], required: false }],
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  return {
    ...summaryDto(job, designs.length),
    notes: job.notes,
    createdAt: job.createdAt.toISOString(),
    client: job.client ? clientDto(job.client) : null,
    designs: designs.map(designSummaryDto),
  };
}

/** Checks that a client id belongs to the actor's firm (a 400 on the field if not). */
async function assertClientInFirm(actor: SessionUser, clientId: string, transaction: Transaction) {
  const found = await Client.count({ where: { id: clientId, firmId: actor.firmId }, transaction });
  if (found === 0) {
    throw new BadRequest('That client was not found', { clientId: ['That client was not found'] });
  }
}

/** One job with its client and its designs. */
export async function getJob(actor: SessionUser, id: string): Promise<JobDto> {
  assertCan(actor, 'job:read');
  db();
  return jobDto(await findJob(actor, id));
}

/** Creates a job, and its client too when `client` is given instead of `clientId`. */
export async function createJob(actor: SessionUser, input: unknown): Promise<JobDto> {
  assertCan(actor, 'job:write');
  const data = parseInput(jobCreateSchema, input);
  const { sequelize } = db();
  return sequelize.transaction(async (transaction) => {
    let clientId = data.clientId ?? null;
    if (clientId) await assertClientInFirm(actor, clientId, transaction);
    if (data.client) clientId = (await insertClient(actor, data.client, transaction)).id;
    const job = await Job.create(
      {
        firmId: actor.firmId,
        clientId,
        title: data.title,
        siteAddress: data.siteAddress,
        status: data.status,
        notes: data.notes,
        createdById: actor.id,
      },
      { transaction },
    );
    return jobDto(await findJob(actor, job.id, transaction), transaction);
  });
}

/** Changes any of title, site address, status, notes and client. */
export async function updateJob(actor: SessionUser, id: string, input: unknown): Promise<JobDto> {
  assertCan(actor, 'job:write');
  const data = parseInput(jobUpdateSchema, input);
  const { sequelize } = db();
  return sequelize.transaction(async (transaction) => {
    const job = await findJob(actor, id, transaction);
    if (data.clientId) await assertClientInFirm(actor, data.clientId, transaction);
    const changes = Object.fromEntries(
      Object.entries(data).filter(([, v]) => v !== undefined),
    ) as Partial<Pick<Job, 'title' | 'siteAddress' | 'status' | 'notes' | 'clientId'>>;
    job.set(changes);
    // Saving with no real change would not touch updatedAt; an edit still counts as activity.
    job.changed('updatedAt', true);
    await job.save({ transaction });
    return jobDto(await findJob(actor, id, transaction), transaction);
  });
}

/** Deletes a job with its designs and revisions (owner only). */
export async function deleteJob(actor: SessionUser, id: string): Promise<void> {
  assertCan(actor, 'job:delete');
  if (!idSchema.safeParse(id).success) throw new NotFound('Job not found');
  db();
  const removed = await Job.destroy({ where: { id, firmId: actor.firmId } });
  if (removed === 0) throw new NotFound('Job not found');
}
