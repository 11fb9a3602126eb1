/**
 * Where deposits are paid, from the environment:
 * - `STRIPE_SECRET_KEY` and `STRIPE_WEBHOOK_SECRET`: the hosted payments service, through its Node SDK;
 * - otherwise the local payments fake (lib/payments/fake.ts): `KERFWISE_PAYMENTS_URL` names one the demo or the test
 *   harness started, with `KERFWISE_PAYMENTS_WEBHOOK_SECRET` the secret it signs its webhooks with; with neither set,
 *   the server starts its own (`npm run dev`). No account anywhere, and no card is ever charged.
 */
import { randomBytes } from 'node:crypto';

type Env = Record<string, string | undefined>;

/** The fake's API key: it accepts only this one, so a request meant for it can never reach the hosted service. */
export const FAKE_SECRET_KEY = 'sk_test_kerfwise_local_fake';

export type PaymentsConfig =
  | { mode: 'hosted'; secretKey: string; webhookSecret: string }
  | { mode: 'fake'; url: string | null; secretKey: string; webhookSecret: string };

export function paymentsConfig(env: Env = process.env): PaymentsConfig {
  if (env.STRIPE_SECRET_KEY) {
    if (!env.STRIPE_WEBHOOK_SECRET)
      throw new Error('STRIPE_SECRET_KEY is set but STRIPE_WEBHOOK_SECRET is not: the webhook could not check what the payments service sends.');
    return { mode: 'hosted', secretKey: env.STRIPE_SECRET_KEY, webhookSecret: env.STRIPE_WEBHOOK_SECRET };
  }
  const url = env.KERFWISE_PAYMENTS_URL?.replace(/\/+$/, '') || null;
  if (url && !/^http:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(url))
    throw new Error('KERFWISE_PAYMENTS_URL names the local payments fake, like http://127.0.0.1:4242.');
  if (url && !env.KERFWISE_PAYMENTS_WEBHOOK_SECRET) throw new Error('KERFWISE_PAYMENTS_URL is set but KERFWISE_PAYMENTS_WEBHOOK_SECRET is not.');
  return { mode: 'fake', url, secretKey: FAKE_SECRET_KEY, webhookSecret: env.KERFWISE_PAYMENTS_WEBHOOK_SECRET || newWebhookSecret() };
}

/** A webhook signing secret in the form the hosted service gives them. */
export const newWebhookSecret = () => `whsec_${randomBytes(24).toString('base64url')}`;
