// Designs of the signed-in user's firm: create, read, save (optimistic concurrency), revisions.
import type { Transaction } from 'sequelize';
import { migrateDesign } from '@/engine/migrate';
import { designDocumentSchema, exampleDesign, type DesignDocument } from '@/engine/schema';
import type { SessionUser } from '@/lib/validation/access';
import { idSchema } from '@/lib/validation/common';
import {
  designCreateSchema,
  designSaveSchema,
  type DesignDto,
  type DesignRevisionDto,
  type DesignSummary,
} from '@/lib/validation/design';
import { Design, DesignRevision, Job, User } from '@/models';
import { assertCan } from './access';
import { db } from './db';
import { Conflict, NotFound, parseInput } from './errors';

const userRef = (u: User | null | undefined) => (u ? { id: u.id, name: u.name } : null);

/** JSON shape of a design without its document (lists). */
export function designSummaryDto(d: Design): DesignSummary {
  return {
    id: d.id,
    name: d.name,
    version: d.version,
    updatedAt: d.updatedAt.toISOString(),
    updatedBy: userRef(d.updatedBy),
  };
}

/**
 * The stored document brought up to the current version (engine/migrate.ts) with defaults for
 * fields added since it was saved. A document that no longer parses is returned as stored rather
 * than hidden; the editor reports what is wrong with it.
 */
function loadDocument(stored: unknown): DesignDocument {
  const migrated = migrateDesign(stored);
  if (!migrated.ok) return stored as DesignDocument;
  const parsed = designDocumentSchema.safeParse(migrated.doc);
  return parsed.success ? parsed.data : (stored as DesignDocument);
}

function designDto(d: Design): DesignDto {
  return { ...designSummaryDto(d), jobId: d.jobId, document: loadDocument(d.document) };
}

function assertId(id: string): void {
  if (!idSchema.safeParse(id).success) throw new NotFound('Design not found');
}

async function findDesign(actor: SessionUser, id: string, transaction?: Transaction) {
  assertId(id);
  const design = await Design.findOne({
    where: { id, firmId: actor.firmId },
    include: [{ model: User, as: 'updatedBy', attributes: ['id', 'name'], required: false }],
    transaction,
  });
  if (!design) throw new NotFound('Design not found');
  return design;
}

/** Marks the job as recently active (job lists sort by it). */
async function touchJob(jobId: string, firmId: string, transaction: Transaction) {
  await Job.sequelize!.query(
    'UPDATE jobs SET updated_at = now() WHERE id = :jobId AND firm_id = :firmId',
    {
      replacements: { jobId, firmId },
      transaction,
    },
  );
}

/** Adds a design to a job; without a document it starts as the 6 m x 4 m example. */
export async function createDesign(
  actor: SessionUser,
  jobId: string,
  input: unknown,
): Promise<DesignDto> {
  assertCan(actor, 'design:write');
  const data = parseInput(designCreateSchema, input);
  if (!idSchema.safeParse(jobId).success) throw new NotFound('Job not found');
  const { sequelize } = db();
  return sequelize.transaction(async (transaction) => {
    const job = await Job.findOne({
      where: { id: jobId, firmId: actor.firmId },
      attributes: ['id'],
      transaction,
    });
    if (!job) throw new NotFound('Job not found');
    const document = data.document ?? exampleDesign();
    const design = await Design.create(
      {
        firmId: actor.firmId,
        jobId: job.id,
        name: data.name,
        document,
        version: 1,
        updatedById: actor.id,
      },
      { transaction },
    );
    await DesignRevision.create(
      {
        designId: design.id,
        firmId: actor.firmId,
        version: 1,
        document,
        savedById: actor.id,
        savedAt: design.updatedAt,
      },
      { transaction },
    );
    await touchJob(job.id, actor.firmId, transaction);
    return designDto(await findDesign(actor, design.id, transaction));
  });
}

/** One design with its document. */
export async function getDesign(actor: SessionUser, id: string): Promise<DesignDto> {
  assertCan(actor, 'design:read');
  db();
  return designDto(await findDesign(actor, id));
}

/**
 * Saves a new version in one transaction: the row is locked, the caller's version must still be
 * the current one (else 409 with who saved last), the version goes up by one and a revision is
 * written beside it.
 */
export async function saveDesign(
  actor: SessionUser,
  id: string,
  input: unknown,
): Promise<DesignDto> {
  assertCan(actor, 'design:write');
  const data = parseInput(designSaveSchema, input);
  assertId(id);
  const { sequelize } = db();
  return sequelize.transaction(async (transaction) => {
    // WARNING: FOR UPDATE cannot take an outer join, so the lock query has no include.
    const design = await Design.findOne({
      where: { id, firmId: actor.firmId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!design) throw new NotFound('Design not found');
    if (design.version !== data.version) {
      const by = design.updatedById
        ? await User.findOne({
            where: { id: design.updatedById },
            attributes: ['id', 'name'],
            transaction,
          })
        : null;
      const who = by?.id === actor.id ? 'you (in another window)' : (by?.name ?? 'someone else');
      throw new Conflict(
        `This design was saved by ${who} since you opened it (now version ${design.version}); reload it before saving`,
        {
          current: {
            version: design.version,
            updatedAt: design.updatedAt.toISOString(),
            updatedBy: userRef(by),
          },
        },
      );
    }
    const version = design.version + 1;
    design.set({ document: data.document, version, updatedById: actor.id });
    if (data.name !== undefined) design.name = data.name;
    await design.save({ transaction });
    await DesignRevision.create(
      {
        designId: design.id,
        firmId: actor.firmId,
        version,
        document: data.document,
        savedById: actor.id,
        savedAt: design.updatedAt,
      },
      { transaction },
    );
    await touchJob(design.jobId, actor.firmId, transaction);
    return designDto(await findDesign(actor, id, transaction));
  });
}

/** The saved versions of a design, newest first (without their documents). */
export async function listRevisions(actor: SessionUser, id: string): Promise<DesignRevisionDto[]> {
  assertCan(actor, 'design:read');
  assertId(id);
  db();
  const design = await Design.findOne({ where: { id, firmId: actor.firmId }, attributes: ['id'] });
  if (!design) throw new NotFound('Design not found');
  const revisions = await DesignRevision.findAll({
    where: { designId: id, firmId: actor.firmId },
    attributes: ['id', 'version', 'savedAt', 'savedById'],
    include: [{ model: User, as: 'savedBy', attributes: ['id', 'name'], required: false }],
    order: [['version', 'DESC']],
  });
  return revisions.map((r) => ({
    version: r.version,
    savedAt: r.savedAt.toISOString(),
    savedBy: userRef(r.savedBy),
  }));
}
