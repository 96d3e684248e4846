// POST /api/webhooks/stripe: signed payment events. Verified against STRIPE_WEBHOOK_SECRET and
// recorded by event id, so a repeated delivery is answered 200 and changes nothing.
import { handle } from '@/lib/server/errors';
import { handleStripeWebhook } from '@/lib/server/payments';

export const POST = handle(async (req) => {
  const raw = await req.text();
  const outcome = await handleStripeWebhook(raw, req.headers.get('stripe-signature'));
  return Response.json({ received: true, ...outcome });
});
