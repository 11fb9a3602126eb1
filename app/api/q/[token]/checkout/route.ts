import { z } from 'zod';
import { QUOTE_TOKEN, startDepositCheckout } from '@/db/queries/quote-answers';
import { ANYONE, route } from '@/server/api/route';
import { countingFailedLinks, throttlePublicRequest } from '@/server/api/throttle';
import { appPayments } from '@/server/payments/client';

// POST /api/q/:token/checkout – public (the customer's link): open a checkout for the deposit of an accepted quote
export const POST = route({ permission: ANYONE, params: z.object({ token: z.string().regex(QUOTE_TOKEN) }) }, async ({ req, db, params }) => {
  await throttlePublicRequest(req, 'quote-page');
  const { stripe } = await appPayments();
  return countingFailedLinks(req, () => startDepositCheckout(db, stripe, params.token));
});
