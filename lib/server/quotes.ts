// Quotes for a job: built from a design's take-off plus labour, priced with the firm's margin and
// tax, revised with every save (the old revision kept), sent to the client with a signed link.
import { Op, type Transaction } from 'sequelize';
import type { DesignDocument } from '@/engine/schema';
import { labourLine, materialLines } from '@/lib/quote/fromTakeoff';
import { quoteTotals, type QuoteTotals } from '@/lib/quote/totals';
import type { SessionUser } from '@/lib/validation/access';
import {
  createQuoteSchema,
  firmQuoteSettingsSchema,
  sendQuoteSchema,
  updateQuoteSchema,
  type FirmQuoteSettings,
  type QuoteLine,
  type QuoteStatus,
} from '@/lib/validation/quote';
import type { Quote } from '@/models/business';
import { assertCanDo } from './businessAccess';
import { bdb } from './businessDb';
import { BadRequest, Conflict, NotFound, parseInput } from './errors';
import { queueMail } from './mail';
import { designTakeoff } from './quoteTakeoff';
import { serviceConfig } from './serviceConfig';
import { signToken } from './signedToken';

/** The defaults a firm starts with (UK VAT 20 % standard rate, from memory; the owner changes them). */
export const DEFAULT_SETTINGS: FirmQuoteSettings = {
  marginPercent: 25,
  taxLabel: 'VAT',
  taxRatePercent: 20,
  depositPercent: 30,
  validityDays: 30,
  crewDayRate: 0,
  labourRatePerM2: 0,
  terms:
    'Prices are valid until the date shown. The deposit secures a build date; the balance is due on completion. ' +
    'Ground conditions found on digging (buried services, soft ground, roots) may change the price; we will agree any change with you first.',
};

export const CAUTIONS = [
  'The structural checks are guidance: local building codes and a qualified engineer decide.',
  'Raised decks need guards where the drop is high enough to need them.',
  'Buried services (cables, pipes) are checked for before any digging.',
];

export function quoteReference(n: number): string {
  return `Q-${String(n).padStart(4, '0')}`;
}

export async function getQuoteSettings(firmId: string): Promise<FirmQuoteSettings> {
  const { models } = bdb();
  const row = await models.QuoteSettings.findByPk(firmId);
  if (!row) return DEFAULT_SETTINGS;
  return {
    marginPercent: row.marginPercent,
    taxLabel: row.taxLabel,
    taxRatePercent: row.taxRatePercent,
    depositPercent: row.depositPercent,
    validityDays: row.validityDays,
    crewDayRate: row.crewDayRate,
    labourRatePerM2: row.labourRatePerM2,
    terms: row.terms,
  };
}

export async function updateQuoteSettings(
  actor: SessionUser,
  input: unknown,
): Promise<FirmQuoteSettings> {
  assertCanDo(actor, 'settings:write');
  const s = parseInput(firmQuoteSettingsSchema, input);
  const { models } = bdb();
  await models.QuoteSettings.upsert({ firmId: actor.firmId, ...s });
  return s;
}

export interface QuoteView {
  id: string;
  jobId: string;
  designId: string | null;
  designVersion: number | null;
  number: number;
  reference: string;
  title: string;
  status: QuoteStatus;
  revision: number;
  lines: QuoteLine[];
  currency: string;
  marginPercent: number;
  taxLabel: string;
  taxRatePercent: number;
  depositPercent: number;
  validUntil: string;
  terms: string;
  note: string;
  sentAt: string | null;
  sentTo: string | null;
  acceptedAt: string | null;
  acceptedName: string | null;
  declinedAt: string | null;
  declineReason: string | null;
  totals: QuoteTotals;
  payment: { status: string; amount: number; paidAt: string | null } | null;
  updatedAt: string;
}

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
const today = () => new Date().toISOString().slice(0, 10);

/** A sent quote past its date becomes expired the first time anyone looks at it. */
export async function expireIfDue(q: Quote, transaction?: Transaction): Promise<Quote> {
  if (q.status === 'sent' && q.validUntil < today()) {
    await q.update({ status: 'expired' }, { transaction });
  }
  return q;
}

export async function toView(q: Quote): Promise<QuoteView> {
  const { models } = bdb();
  const payments = await models.Payment.findAll({
    where: { quoteId: q.id },
    order: [['createdAt', 'DESC']],
  });
  const paid = payments.find((p) => p.status === 'paid') ?? payments[0];
  return {
    id: q.id,
    jobId: q.jobId,
    designId: q.designId,
    designVersion: q.designVersion,
    number: q.number,
    reference: quoteReference(q.number),
    title: q.title,
    status: q.status,
    revision: q.revision,
    lines: q.lines,
    currency: q.currency,
    marginPercent: q.marginPercent,
    taxLabel: q.taxLabel,
    taxRatePercent: q.taxRatePercent,
    depositPercent: q.depositPercent,
    validUntil: q.validUntil,
    terms: q.terms,
    note: q.note,
    sentAt: iso(q.sentAt),
    sentTo: q.sentTo ?? null,
    acceptedAt: iso(q.acceptedAt),
    acceptedName: q.acceptedName ?? null,
    declinedAt: iso(q.declinedAt),
    declineReason: q.declineReason ?? null,
    totals: quoteTotals(q.lines, q),
    payment: paid ? { status: paid.status, amount: paid.amount, paidAt: iso(paid.paidAt) } : null,
    updatedAt: q.updatedAt.toISOString(),
  };
}

async function findJob(actor: SessionUser, jobId: string) {
  const { models } = bdb();
  const job = await models.Job.findOne({
    where: { id: jobId, firmId: actor.firmId },
    include: [{ model: models.Client, as: 'client' }],
  });
  if (!job) throw new NotFound('No such job');
  return job;
}

async function findQuote(actor: SessionUser, id: string, transaction?: Transaction) {
  const { models } = bdb();
  if (!/^[0-9a-f-]{36}$/i.test(id)) throw new NotFound('No such quote');
  const q = await models.Quote.findOne({
    where: { id, firmId: actor.firmId },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!q) throw new NotFound('No such quote');
  return q;
}

export async function listJobQuotes(actor: SessionUser, jobId: string): Promise<QuoteView[]> {
  assertCanDo(actor, 'quote:read');
  await findJob(actor, jobId);
  const { models } = bdb();
  const rows = await models.Quote.findAll({
    where: { firmId: actor.firmId, jobId },
    order: [['number', 'DESC']],
  });
  return Promise.all(rows.map(async (q) => toView(await expireIfDue(q))));
}

export async function getQuote(actor: SessionUser, id: string): Promise<QuoteView> {
  assertCanDo(actor, 'quote:read');
  return toView(await expireIfDue(await findQuote(actor, id)));
}

function snapshot(q: Quote) {
  return {
    title: q.title,
    lines: q.lines,
    currency: q.currency,
    marginPercent: q.marginPercent,
    taxLabel: q.taxLabel,
    taxRatePercent: q.taxRatePercent,
    depositPercent: q.depositPercent,
    validUntil: q.validUntil,
    terms: q.terms,
    note: q.note,
    status: q.status,
    designId: q.designId,
    designVersion: q.designVersion,
  };
}

/**
 * A new draft quote for a job: material lines from the design's take-off (the job's latest design
 * unless one is named) plus a labour line (crew days x day rate when days are given, else the deck
 * area x the rate per m^2), with the firm's margin, tax, deposit, validity and terms.
 */
export async function createQuote(
  actor: SessionUser,
  jobId: string,
  input: unknown,
): Promise<QuoteView> {
  assertCanDo(actor, 'quote:write');
  const body = parseInput(createQuoteSchema, input);
  const job = await findJob(actor, jobId);
  const { models, sequelize } = bdb();
  const design = await models.Design.findOne({
    where: body.designId
      ? { id: body.designId, firmId: actor.firmId, jobId }
      : { firmId: actor.firmId, jobId },
    order: [['updatedAt', 'DESC']],
  });
  if (body.designId && !design) throw new NotFound('No such design on this job');
  const settings = await getQuoteSettings(actor.firmId);
  const firm = await models.Firm.findByPk(actor.firmId);
  const currency = firm?.currency ?? 'GBP';

  const lines: QuoteLine[] = [];
  let areaM2 = 0;
  if (design) {
    const products = await models.Product.findAll({
      where: { firmId: actor.firmId, active: true },
    });
    const t = designTakeoff(design.document, products, currency);
    if (t) {
      lines.push(...materialLines(t.priced));
      areaM2 = t.areaM2;
    }
  }
  if (body.labourDays !== undefined)
    lines.push(
      labourLine({
        basis: 'days',
        days: body.labourDays,
        crewDayRate: settings.crewDayRate,
        crew: body.crewSize,
      }),
    );
  else if (areaM2 > 0)
    lines.push(labourLine({ basis: 'm2', areaM2, ratePerM2: settings.labourRatePerM2 }));

  const validUntil = new Date(Date.now() + settings.validityDays * 86_400_000)
    .toISOString()
    .slice(0, 10);

  const q = await sequelize.transaction(async (transaction) => {
    // Numbers are per firm and gap-free enough: serialise the firm's quote creation.
    await sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:k))', {
      replacements: { k: `quote-number:${actor.firmId}` },
      transaction,
    });
    const max = (await models.Quote.max('number', {
      where: { firmId: actor.firmId },
      transaction,
    })) as number | null;
    const created = await models.Quote.create(
      {
        firmId: actor.firmId,
        jobId,
        designId: design?.id ?? null,
        designVersion: design?.version ?? null,
        number: (max ?? 0) + 1,
        title: body.title ?? `${job.title}${design ? ` — ${design.name}` : ''}`.slice(0, 200),
        lines,
        currency,
        marginPercent: settings.marginPercent,
        taxLabel: settings.taxLabel,
        taxRatePercent: settings.taxRatePercent,
        depositPercent: settings.depositPercent,
        validUntil,
        terms: settings.terms,
        createdById: actor.id,
        updatedById: actor.id,
      },
      { transaction },
    );
    await models.QuoteRevision.create(
      {
        firmId: actor.firmId,
        quoteId: created.id,
        revision: 1,
        snapshot: snapshot(created),
        savedById: actor.id,
      },
      { transaction },
    );
    return created;
  });
  return toView(q);
}

/**
 * Saves a new revision. The revision read must be the current one (409 otherwise). An accepted
 * quote is fixed; editing a sent one takes it back to draft until it is sent again.
 */
export async function updateQuote(
  actor: SessionUser,
  id: string,
  input: unknown,
): Promise<QuoteView> {
  assertCanDo(actor, 'quote:write');
  const body = parseInput(updateQuoteSchema, input);
  const ids = new Set(body.lines.map((l) => l.id));
  if (ids.size !== body.lines.length) throw new BadRequest('Each line needs its own id');
  const { models, sequelize } = bdb();
  const q = await sequelize.transaction(async (transaction) => {
    const q = await findQuote(actor, id, transaction);
    if (q.status === 'accepted')
      throw new Conflict('This quote has been accepted and can no longer change');
    if (q.revision !== body.revision)
      throw new Conflict('Someone saved this quote after you opened it', {
        current: { revision: q.revision, updatedAt: q.updatedAt.toISOString() },
      });
    await q.update(
      {
        title: body.title,
        lines: body.lines,
        marginPercent: body.marginPercent,
        taxLabel: body.taxLabel,
        taxRatePercent: body.taxRatePercent,
        depositPercent: body.depositPercent,
        validUntil: body.validUntil,
        terms: body.terms,
        note: body.note,
        status: 'draft',
        revision: q.revision + 1,
        updatedById: actor.id,
      },
      { transaction },
    );
    await models.QuoteRevision.create(
      {
        firmId: actor.firmId,
        quoteId: q.id,
        revision: q.revision,
        snapshot: snapshot(q),
        savedById: actor.id,
      },
      { transaction },
    );
    return q;
  });
  return toView(q);
}

export async function listQuoteRevisions(actor: SessionUser, id: string) {
  assertCanDo(actor, 'quote:read');
  await findQuote(actor, id);
  const { models } = bdb();
  const rows = await models.QuoteRevision.findAll({
    where: { quoteId: id, firmId: actor.firmId },
    order: [['revision', 'DESC']],
  });
  return rows.map((r) => ({
    revision: r.revision,
    savedAt: r.savedAt.toISOString(),
    savedById: r.savedById,
    snapshot: r.snapshot,
  }));
}

/** The client's link for a quote: valid to the end of its validity date. */
export function proposalLink(q: Pick<Quote, 'id' | 'validUntil'>): {
  url: string;
  token: string;
  expiresAt: Date;
} {
  const expiresAt = new Date(`${q.validUntil}T23:59:59Z`);
  const token = signToken('proposal', q.id, expiresAt);
  return { url: `${serviceConfig().appUrl}/p/${token}`, token, expiresAt };
}

/**
 * Sends the quote: e-mails the client the link to their proposal and the quote PDF, marks the quote
 * sent and moves the job on to "quoted". Returns the link too, so the designer can copy it.
 */
export async function sendQuote(
  actor: SessionUser,
  id: string,
  input: unknown,
): Promise<{ quote: QuoteView; link: string; emailStatus: string | null }> {
  assertCanDo(actor, 'quote:write');
  const body = parseInput(sendQuoteSchema, input);
  const { models } = bdb();
  const q = await expireIfDue(await findQuote(actor, id));
  if (q.status === 'accepted') throw new Conflict('This quote has already been accepted');
  if (q.validUntil < today()) throw new BadRequest('Set a validity date in the future first');
  if (q.lines.length === 0) throw new BadRequest('Add at least one line before sending');
  const job = await findJob(actor, q.jobId);
  const to = body.to ?? job.client?.email ?? null;
  const link = proposalLink(q);
  await q.update({
    status: 'sent',
    sentAt: new Date(),
    sentTo: to,
    sentRevision: q.revision,
    linkExpiresAt: link.expiresAt,
    declinedAt: null,
    declineReason: null,
  });
  if (['enquiry', 'surveyed', 'designing'].includes(job.status))
    await job.update({ status: 'quoted' });

  let emailStatus: string | null = null;
  if (to) {
    const firm = await models.Firm.findByPk(actor.firmId);
    const view = await toView(q);
    const { quotePdf } = await import('@/lib/pdf/quotePdf');
    const pdf = await quotePdf(await quotePdfInput(view, actor.firmId));
    const firmName = firm?.name ?? 'Your deck builder';
    const mail = await queueMail({
      firmId: actor.firmId,
      kind: 'quote',
      to,
      replyTo: firm?.email ?? undefined,
      subject: `${firmName}: your deck quote ${view.reference}`,
      text: [
        `Dear ${job.client?.name ?? 'customer'},`,
        '',
        body.message ??
          `Thank you for asking us to quote for your deck at ${job.siteAddress || 'your home'}.`,
        '',
        `Your proposal, with the plan and the price, is here (valid until ${q.validUntil}):`,
        link.url,
        '',
        'You can accept it there and pay the deposit online. The quote is attached as a PDF.',
        '',
        firmName,
      ].join('\n'),
      attachments: [
        {
          filename: `${view.reference}.pdf`,
          contentType: 'application/pdf',
          content: Buffer.from(pdf),
        },
      ],
      jobId: q.jobId,
      quoteId: q.id,
      createdById: actor.id,
    });
    emailStatus = mail.status;
  }
  return { quote: await toView(q), link: link.url, emailStatus };
}

/** Everything the quote PDF shows. */
export async function quotePdfInput(view: QuoteView, firmId: string) {
  const { models } = bdb();
  const firm = await models.Firm.findByPk(firmId);
  const job = await models.Job.findOne({
    where: { id: view.jobId, firmId },
    include: [{ model: models.Client, as: 'client' }],
  });
  const outline = await quoteOutline(firmId, view.designId, view.designVersion);
  return {
    firm: {
      name: firm?.name ?? '',
      address: [firm?.address, firm?.town, firm?.postcode].filter(Boolean).join(', '),
      phone: firm?.phone ?? '',
      email: firm?.email ?? '',
    },
    client: { name: job?.client?.name ?? '', address: job?.siteAddress ?? '' },
    quote: view,
    outline,
    cautions: CAUTIONS,
  };
}

/** The deck outline of the design at the quoted version (for thumbnails and previews). */
export async function quoteOutline(
  firmId: string,
  designId: string | null,
  designVersion: number | null,
): Promise<[number, number][] | null> {
  if (!designId) return null;
  const { models } = bdb();
  const rev = designVersion
    ? await models.DesignRevision.findOne({ where: { firmId, designId, version: designVersion } })
    : null;
  const doc =
    (rev?.document as DesignDocument | undefined) ??
    ((await models.Design.findOne({ where: { firmId, id: designId } }))?.document as
      DesignDocument | undefined);
  return doc?.outline ? (doc.outline as [number, number][]) : null;
}

/** Quotes per job for a list of jobs: the latest quote's status and whether a deposit is paid. */
export async function quoteStatusForJobs(firmId: string, jobIds: string[]) {
  const { models } = bdb();
  if (jobIds.length === 0) return new Map<string, { status: QuoteStatus; paid: boolean }>();
  const quotes = await models.Quote.findAll({
    where: { firmId, jobId: { [Op.in]: jobIds } },
    order: [['number', 'DESC']],
  });
  const paid = await models.Payment.findAll({
    where: { firmId, jobId: { [Op.in]: jobIds }, status: 'paid' },
  });
  const out = new Map<string, { status: QuoteStatus; paid: boolean }>();
  for (const q of quotes)
    if (!out.has(q.jobId))
      out.set(q.jobId, { status: q.status, paid: paid.some((p) => p.jobId === q.jobId) });
  return out;
}
