import { applyPaymentEvent } from '@/db/queries/quote-answers';
import { HttpError } from '@/server/api/errors';
import { ANYONE, route } from '@/server/api/route';
import { wakeMailSender } from '@/server/mail/service';
import { appPayments } from '@/server/payments/client';

// POST /api/payments/webhook – public, for the payments service only: events it signed with the webhook secret
// (checked by its SDK, within its 5-minute tolerance); each event is applied once, a replay changes nothing.
export const POST = route({ permission: ANYONE, signedByService: true }, async ({ req, rawBody, db }) => {
  const signature = req.headers.get('stripe-signature');
  if (!signature) throw new HttpError(400, 'This address takes only events signed by the payments service (no Stripe-Signature header).');
  const { stripe, webhookSecret } = await appPayments();
  let event;
  try {
    event = stripe.webhooks.constructEvent(rawBody, signature, webhookSecret);
  } catch (error) {
    throw new HttpError(400, `The event's signature does not check out: ${error instanceof Error ? error.message : 'unreadable'}.`);
  }
  const result = await applyPaymentEvent(db, event);
  if (result.outcome === 'paid') wakeMailSender();
  return { received: true, ...result };
});
