// Deposit payments through the Stripe SDK (the local fake by default): a Checkout Session per
// attempt, and the `checkout.session.completed` webhook, verified and recorded exactly once.
import Stripe from 'stripe';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Payment } from '@/models/business';
import { bdb } from './businessDb';
import { BadRequest } from './errors';
import { serviceConfig } from './serviceConfig';

const clients = new Map<string, Stripe>();

/** The Stripe client, pointed at STRIPE_API_BASE (the local fake unless set to the real API). */
export function stripeClient(): Stripe {
  const { stripeApiBase, stripeSecretKey } = serviceConfig();
  const key = `${stripeApiBase}|${stripeSecretKey}`;
  let s = clients.get(key);
  if (!s) {
    const u = new URL(stripeApiBase);
    s = new Stripe(stripeSecretKey, {
      host: u.hostname,
      port: u.port || (u.protocol === 'https:' ? 443 : 80),
      protocol: u.protocol === 'https:' ? 'https' : 'http',
      maxNetworkRetries: 2,
      timeout: 15_000,
    });
    clients.set(key, s);
  }
  return s;
}

export interface DepositCheckoutInput {
  firmId: string;
  quoteId: string;
  jobId: string;
  amount: number;
  currency: string;
  description: string;
  customerEmail?: string | null;
  successUrl: string;
  cancelUrl: string;
}

/** Opens a Checkout Session for the deposit and records a pending payment for it. */
export async function createDepositCheckout(
  input: DepositCheckoutInput,
): Promise<{ url: string; payment: Payment }> {
  if (input.amount <= 0) throw new BadRequest('This quote asks for no deposit');
  const session = await stripeClient().checkout.sessions.create({
    mode: 'payment',
    success_url: input.successUrl,
    cancel_url: input.cancelUrl,
    client_reference_id: input.quoteId,
    customer_email: input.customerEmail || undefined,
    metadata: { quoteId: input.quoteId, jobId: input.jobId, firmId: input.firmId },
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: input.currency.toLowerCase(),
          unit_amount: input.amount,
          product_data: { name: input.description },
        },
      },
    ],
  });
  if (!session.url) throw new Error('The payment service returned no payment page');
  const { models } = bdb();
  const payment = await models.Payment.create({
    firmId: input.firmId,
    quoteId: input.quoteId,
    jobId: input.jobId,
    checkoutSessionId: session.id,
    amount: input.amount,
    currency: input.currency.toUpperCase(),
  });
  return { url: session.url, payment };
}

/**
 * Marks the payment for a completed session paid, once: a second call (a repeated webhook, or the
 * return page racing the webhook) changes nothing. Returns true when this call recorded it.
 */
async function markSessionPaid(
  sessionId: string,
  eventId: string | null,
  transaction?: Transaction,
): Promise<boolean> {
  const { sequelize } = bdb();
  const rows = await sequelize.query<{ id: string }>(
    `UPDATE payments SET status = 'paid', paid_at = now(), provider_event_id = :eventId, updated_at = now()
     WHERE provider = 'stripe' AND checkout_session_id = :sessionId AND status <> 'paid'
       AND NOT EXISTS (SELECT 1 FROM payments p2 WHERE p2.quote_id = payments.quote_id AND p2.status = 'paid')
     RETURNING id`,
    { replacements: { sessionId, eventId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length > 0;
}

export type WebhookOutcome =
  { status: 'recorded'; type: string; paid: boolean } | { status: 'duplicate'; type: string };

/**
 * Verifies a webhook's signature (400 when it fails), then records the event by its id in the same
 * transaction as its effect: a second delivery of the same event finds the id and does nothing.
 */
export async function handleStripeWebhook(
  rawBody: string,
  signature: string | null,
): Promise<WebhookOutcome> {
  if (!signature) throw new BadRequest('Missing Stripe-Signature header');
  let event: Stripe.Event;
  try {
    event = stripeClient().webhooks.constructEvent(
      rawBody,
      signature,
      serviceConfig().stripeWebhookSecret,
    );
  } catch (err) {
    throw new BadRequest(
      `Webhook signature check failed: ${err instanceof Error ? err.message : String(err)}`,
    );
  }
  const { sequelize } = bdb();
  return sequelize.transaction(async (transaction) => {
    const inserted = await sequelize.query<{ event_id: string }>(
      `INSERT INTO webhook_events (provider, event_id, type, payload, received_at, deliveries)
       VALUES ('stripe', :id, :type, CAST(:payload AS jsonb), now(), 1)
       ON CONFLICT (provider, event_id) DO NOTHING RETURNING event_id`,
      {
        replacements: { id: event.id, type: event.type, payload: rawBody },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (inserted.length === 0) {
      await sequelize.query(
        `UPDATE webhook_events SET deliveries = deliveries + 1 WHERE provider = 'stripe' AND event_id = :id`,
        { replacements: { id: event.id }, transaction },
      );
      return { status: 'duplicate', type: event.type } as const;
    }
    let paid = false;
    if (
      event.type === 'checkout.session.completed' ||
      event.type === 'checkout.session.async_payment_succeeded'
    ) {
      const session = event.data.object as Stripe.Checkout.Session;
      if (session.payment_status === 'paid') {
        paid = await markSessionPaid(session.id, event.id, transaction);
      }
    }
    return { status: 'recorded', type: event.type, paid } as const;
  });
}

/**
 * On the client's return from the payment page: asks the payment service about the session and
 * records it if paid (covers a webhook that is late). Safe to call any number of times.
 */
export async function confirmCheckoutSession(
  sessionId: string,
): Promise<{ paid: boolean; quoteId: string | null }> {
  const { models } = bdb();
  const payment = await models.Payment.findOne({
    where: { provider: 'stripe', checkoutSessionId: sessionId },
  });
  if (!payment) return { paid: false, quoteId: null };
  if (payment.status === 'paid') return { paid: true, quoteId: payment.quoteId };
  const session = await stripeClient().checkout.sessions.retrieve(sessionId);
  if (session.payment_status === 'paid') {
    await markSessionPaid(sessionId, null);
    return { paid: true, quoteId: payment.quoteId };
  }
  return { paid: false, quoteId: payment.quoteId };
}

/** The payments of a job, newest first (the owner sees whether the deposit is in). */
export async function jobPayments(firmId: string, jobId: string): Promise<Payment[]> {
  const { models } = bdb();
  return models.Payment.findAll({ where: { firmId, jobId }, order: [['createdAt', 'DESC']] });
}
