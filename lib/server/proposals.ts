// The client's proposal behind a signed, expiring link: what they may see (this quote, its plan
// outline and the cautions, nothing else of the firm), their answer, and the deposit payment.
import { quoteTotals, type QuoteTotals } from '@/lib/quote/totals';
import { proposalAnswerSchema, type QuoteLine, type QuoteStatus } from '@/lib/validation/quote';
import { bdb } from './businessDb';
import { BadRequest, Conflict, HttpError } from './errors';
import { confirmCheckoutSession, createDepositCheckout } from './payments';
import { CAUTIONS, expireIfDue, quoteOutline, quoteReference } from './quotes';
import { serviceConfig } from './serviceConfig';
import { verifyToken } from './signedToken';

export interface ProposalView {
  reference: string;
  title: string;
  status: QuoteStatus;
  firm: { name: string; address: string; phone: string; email: string };
  clientName: string;
  siteAddress: string;
  validUntil: string;
  currency: string;
  /** Client-facing lines: description, qty, unit and marked-up prices only (no cost or margin). */
  lines: {
    id: string;
    description: string;
    qty: number;
    unit: string;
    unitPrice: number;
    price: number;
  }[];
  totals: Pick<
    QuoteTotals,
    'subtotal' | 'taxLabel' | 'taxRatePercent' | 'tax' | 'total' | 'depositPercent' | 'deposit'
  >;
  terms: string;
  outline: [number, number][] | null;
  cautions: string[];
  acceptedAt: string | null;
  acceptedName: string | null;
  declinedAt: string | null;
  depositPaid: boolean;
  /** True when the firm changed the quote after sending it: the client waits for the new one. */
  beingRevised: boolean;
}

export type ProposalLookup =
  { state: 'ok'; quoteId: string; view: ProposalView } | { state: 'invalid' | 'expired' };

/** Checks the link (signature, then expiry) and loads what the client may see. */
export async function loadProposal(token: string): Promise<ProposalLookup> {
  const check = verifyToken('proposal', token);
  if (!check.ok) return { state: check.reason === 'expired' ? 'expired' : 'invalid' };
  const { models } = bdb();
  const q = await models.Quote.findByPk(check.subject);
  if (!q) return { state: 'invalid' };
  await expireIfDue(q);
  // A link stops at the quote's own validity (re-sending with a later date makes a new link).
  if (q.status === 'expired') return { state: 'expired' };
  const firm = await models.Firm.findByPk(q.firmId);
  const job = await models.Job.findOne({
    where: { id: q.jobId, firmId: q.firmId },
    include: [{ model: models.Client, as: 'client' }],
  });
  const paid = await models.Payment.count({ where: { quoteId: q.id, status: 'paid' } });
  const t = quoteTotals(q.lines as QuoteLine[], q);
  const byId = new Map(t.lines.map((l) => [l.id, l]));
  return {
    state: 'ok',
    quoteId: q.id,
    view: {
      reference: quoteReference(q.number),
      title: q.title,
      status: q.status,
      firm: {
        name: firm?.name ?? '',
        address: [firm?.address, firm?.town, firm?.postcode].filter(Boolean).join(', '),
        phone: firm?.phone ?? '',
        email: firm?.email ?? '',
      },
      clientName: job?.client?.name ?? '',
      siteAddress: job?.siteAddress ?? '',
      validUntil: q.validUntil,
      currency: q.currency,
      lines: q.lines.map((l) => ({
        id: l.id,
        description: l.description,
        qty: l.qty,
        unit: l.unit,
        unitPrice: byId.get(l.id)?.unitPrice ?? 0,
        price: byId.get(l.id)?.price ?? 0,
      })),
      totals: {
        subtotal: t.subtotal,
        taxLabel: t.taxLabel,
        taxRatePercent: t.taxRatePercent,
        tax: t.tax,
        total: t.total,
        depositPercent: t.depositPercent,
        deposit: t.deposit,
      },
      terms: q.terms,
      outline: await quoteOutline(q.firmId, q.designId, q.designVersion),
      cautions: CAUTIONS,
      acceptedAt: q.acceptedAt ? q.acceptedAt.toISOString() : null,
      acceptedName: q.acceptedName ?? null,
      declinedAt: q.declinedAt ? q.declinedAt.toISOString() : null,
      depositPaid: paid > 0,
      beingRevised: q.status === 'draft',
    },
  };
}

class LinkProblem extends HttpError {
  constructor(state: 'invalid' | 'expired') {
    super(
      state === 'expired' ? 410 : 404,
      state === 'expired'
        ? 'This proposal link has expired. Ask the firm for a new one.'
        : 'This proposal link is not valid.',
    );
  }
}

/**
 * Records the client's answer: accept (with the name they typed and the time) or decline. Only a
 * sent, unexpired quote can be answered, and only once.
 */
export async function answerProposal(token: string, input: unknown): Promise<ProposalView> {
  const check = verifyToken('proposal', token);
  if (!check.ok) throw new LinkProblem(check.reason === 'expired' ? 'expired' : 'invalid');
  const parsed = proposalAnswerSchema.safeParse(input);
  if (!parsed.success) throw new BadRequest(parsed.error.issues[0]?.message ?? 'Check the form');
  const answer = parsed.data;
  const { models, sequelize } = bdb();
  await sequelize.transaction(async (transaction) => {
    const q = await models.Quote.findByPk(check.subject, {
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!q) throw new LinkProblem('invalid');
    await expireIfDue(q, transaction);
    if (q.status === 'expired') throw new LinkProblem('expired');
    if (q.status === 'accepted' || q.status === 'declined')
      throw new Conflict(`This quote has already been ${q.status}`);
    if (q.status !== 'sent')
      throw new Conflict('The firm is revising this quote; they will send you the new one');
    if (answer.answer === 'accept') {
      await q.update(
        { status: 'accepted', acceptedAt: new Date(), acceptedName: answer.name },
        { transaction },
      );
      await models.Job.update(
        { status: 'accepted' },
        {
          where: {
            id: q.jobId,
            firmId: q.firmId,
            status: ['enquiry', 'surveyed', 'designing', 'quoted'],
          },
          transaction,
        },
      );
    } else {
      await q.update(
        { status: 'declined', declinedAt: new Date(), declineReason: answer.reason ?? null },
        { transaction },
      );
    }
  });
  const after = await loadProposal(token);
  if (after.state !== 'ok') throw new LinkProblem(after.state);
  return after.view;
}

/** Opens the payment page for the deposit of an accepted quote; returns where to send the client. */
export async function startDeposit(token: string): Promise<{ url: string }> {
  const found = await loadProposal(token);
  if (found.state !== 'ok') throw new LinkProblem(found.state);
  const { view, quoteId } = found;
  if (view.status !== 'accepted') throw new Conflict('Accept the quote before paying the deposit');
  if (view.depositPaid) throw new Conflict('The deposit is already paid. Thank you.');
  const { models } = bdb();
  const q = (await models.Quote.findByPk(quoteId))!;
  const job = await models.Job.findOne({
    where: { id: q.jobId, firmId: q.firmId },
    include: [{ model: models.Client, as: 'client' }],
  });
  const back = `${serviceConfig().appUrl}/p/${token}`;
  const { url } = await createDepositCheckout({
    firmId: q.firmId,
    quoteId: q.id,
    jobId: q.jobId,
    amount: view.totals.deposit,
    currency: q.currency,
    description: `Deposit for ${view.reference}: ${view.title}`.slice(0, 200),
    customerEmail: job?.client?.email ?? null,
    successUrl: `${back}?paid={CHECKOUT_SESSION_ID}`,
    cancelUrl: `${back}?cancelled=1`,
  });
  return { url };
}

/** The client is back from the payment page: confirm with the payment service (idempotent). */
export async function confirmDepositReturn(token: string, sessionId: string): Promise<boolean> {
  const check = verifyToken('proposal', token);
  if (!check.ok || !/^cs_[A-Za-z0-9_]+$/.test(sessionId)) return false;
  const r = await confirmCheckoutSession(sessionId);
  return r.paid && r.quoteId === check.subject;
}
