// Everything the framing plan and materials downloads need for one design, read in one place.
import { parseDesign, planFrame, type DesignDocument, type FramePlan } from '@/engine';
import { priceTakeOff, type PricedProduct, type PricedTakeOff } from '@/engine/takeoff/price';
import type { PlanMeta } from '@/lib/pdf/sheet';
import type { SessionUser } from '@/lib/validation/access';
import { getDesign } from './designs';
import { BadRequest } from './errors';
import { getFirm } from './firm';
import { getJob } from './jobs';
import { listProducts } from './products';

export interface DesignForCrew {
  designId: string;
  version: number;
  jobTitle: string;
  design: DesignDocument;
  plan: FramePlan;
  meta: PlanMeta;
  currency: string;
}

/** A short, safe file name part: "Back garden deck" -> "back-garden-deck". */
export function fileSlug(s: string): string {
  return (
    s
      .normalize('NFKD')
      .replace(/[^\w\s-]/g, '')
      .trim()
      .toLowerCase()
      .replace(/[\s_]+/g, '-')
      .replace(/-+/g, '-')
      .slice(0, 60) || 'design'
  );
}

/**
 * Loads a design of the actor's firm (another firm's id is NotFound), lays out its frame and
 * gathers the title-block facts: firm, job, client, site, who last saved it, when, and its version.
 */
export async function loadDesignForCrew(
  actor: SessionUser,
  designId: string,
): Promise<DesignForCrew> {
  const dto = await getDesign(actor, designId);
  const [job, firm] = await Promise.all([getJob(actor, dto.jobId), getFirm(actor)]);
  const parsed = parseDesign(dto.document);
  if (!parsed.ok) {
    const first = parsed.errors[0];
    throw new BadRequest(
      `This design cannot be laid out: ${first ? `${first.path ? `${first.path}: ` : ''}${first.message}` : 'invalid document'}`,
    );
  }
  const plan = planFrame(parsed.design);
  const meta: PlanMeta = {
    firm: firm.firm.name,
    job: job.title,
    client: job.client?.name ?? '',
    site: job.siteAddress,
    designer: dto.updatedBy?.name ?? '',
    date: new Date(dto.updatedAt).toLocaleDateString('en-GB', {
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      timeZone: 'UTC',
    }),
    revision: `v${dto.version}`,
    units: actor.units,
  };
  return {
    designId: dto.id,
    version: dto.version,
    jobTitle: job.title,
    design: parsed.design,
    plan,
    meta,
    currency: firm.firm.currency,
  };
}

/** The plan's take-off priced from the firm's active catalogue, with the given waste allowance. */
export async function pricedMaterials(
  actor: SessionUser,
  loaded: DesignForCrew,
  wastePct: number,
): Promise<PricedTakeOff> {
  const products = await listProducts(actor, { status: 'active' });
  const catalogue: PricedProduct[] = products.map((p) => ({
    id: p.id,
    kind: p.kind,
    name: p.name,
    unitPrice: p.unitPrice,
    unit: p.unit,
    stockLengthsMm: p.stockLengthsMm,
    dimensions: p.dimensions as Record<string, unknown>,
    currency: loaded.currency,
  }));
  return priceTakeOff(loaded.plan.quantities, catalogue, {
    wastePct,
    choices: loaded.design.products,
    currency: loaded.currency,
  });
}
