import { describe, expect, test } from 'vitest';
import { FAKE_SECRET_KEY, paymentsConfig } from './config';

describe('where deposits are paid', () => {
  test('real keys switch to the hosted service; a secret key without a webhook secret is refused', () => {
    expect(paymentsConfig({ STRIPE_SECRET_KEY: 'sk_live_x', STRIPE_WEBHOOK_SECRET: 'whsec_y' })).toEqual({
      mode: 'hosted',
      secretKey: 'sk_live_x',
      webhookSecret: 'whsec_y',
    });
    expect(() => paymentsConfig({ STRIPE_SECRET_KEY: 'sk_live_x' })).toThrow(/STRIPE_WEBHOOK_SECRET is not/);
  });
  test('otherwise the local fake: the one the harness named, or one of the server’s own with a fresh secret', () => {
    expect(paymentsConfig({ KERFWISE_PAYMENTS_URL: 'http://127.0.0.1:4242/', KERFWISE_PAYMENTS_WEBHOOK_SECRET: 'whsec_t' })).toEqual({
      mode: 'fake',
      url: 'http://127.0.0.1:4242',
      secretKey: FAKE_SECRET_KEY,
      webhookSecret: 'whsec_t',
    });
    const own = paymentsConfig({});
    expect(own).toMatchObject({ mode: 'fake', url: null, secretKey: FAKE_SECRET_KEY });
    expect(own.webhookSecret).toMatch(/^whsec_[A-Za-z0-9_-]{32}$/);
    expect(() => paymentsConfig({ KERFWISE_PAYMENTS_URL: 'https://api.example.com', KERFWISE_PAYMENTS_WEBHOOK_SECRET: 'x' })).toThrow(
      /local payments fake/,
    );
  });
});
