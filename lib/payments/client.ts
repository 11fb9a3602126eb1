/**
 * The payments service's SDK client for this server process: the hosted service with real keys, or the local fake
 * (the SDK pointed at it with its host, port and protocol options). See lib/payments/config.ts.
 */
import Stripe from 'stripe';
import { FAKE_SECRET_KEY, paymentsConfig, type PaymentsConfig } from './config';
import { startPaymentsFake, type PaymentsFake } from './fake';
import { appBaseUrl } from '@/lib/mail/config';

const holder = globalThis as typeof globalThis & {
  __kerfwisePayments?: Promise<{ stripe: Stripe; webhookSecret: string; fake: PaymentsFake | null }>;
};

/** An SDK client for the fake at `url` (tests use it too). */
export function fakeClient(url: string): Stripe {
  const u = new URL(url);
  return new Stripe(FAKE_SECRET_KEY, { host: u.hostname, port: Number(u.port) || 80, protocol: 'http', maxNetworkRetries: 1, timeout: 10_000 });
}

async function connect(config: PaymentsConfig, webhookUrl: string) {
  if (config.mode === 'hosted')
    return { stripe: new Stripe(config.secretKey, { maxNetworkRetries: 2 }), webhookSecret: config.webhookSecret, fake: null };
  if (config.url) return { stripe: fakeClient(config.url), webhookSecret: config.webhookSecret, fake: null };
  const fake = await startPaymentsFake({ webhookUrl, webhookSecret: config.webhookSecret, unref: true });
  console.log(`Payments: no STRIPE_SECRET_KEY, so deposits are paid on a local test checkout (${fake.url}); no card is charged.`);
  return { stripe: fakeClient(fake.url), webhookSecret: config.webhookSecret, fake };
}

/** This process's client and the secret its webhooks are signed with. */
export function payments(webhookUrl: string): Promise<{ stripe: Stripe; webhookSecret: string }> {
  holder.__kerfwisePayments ??= connect(paymentsConfig(), webhookUrl);
  return holder.__kerfwisePayments;
}

/** The client for this app's webhook address (NEXTAUTH_URL + /api/payments/webhook). */
export const appPayments = () => payments(`${appBaseUrl()}/api/payments/webhook`);
