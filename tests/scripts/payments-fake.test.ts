// The local payment fake answers a repeated creation with the same Idempotency-Key as the hosted
// service does: the first session again, never a second one.
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

type Fake = { base: string; close: () => Promise<void> };
let fake: Fake;
let stripe: Stripe;

beforeAll(async () => {
  const { startPaymentsFake } = await import('../../scripts/payments-fake.mjs');
  fake = (await startPaymentsFake({
    port: 0,
    apiKey: 'sk_test_fake_only',
    webhookSecret: 'whsec_fake_only',
    webhookUrl: 'http://127.0.0.1:9/none',
    quiet: true,
  })) as Fake;
  const url = new URL(fake.base);
  stripe = new Stripe('sk_test_fake_only', { host: url.hostname, port: Number(url.port), protocol: 'http', maxNetworkRetries: 0 });
});
afterAll(() => fake?.close());

const session = (amount: number) => ({
  mode: 'payment' as const,
  line_items: [{ quantity: 1, price_data: { currency: 'eur', unit_amount: amount, product_data: { name: 'Balance for PH 1001' } } }],
  success_url: 'http://127.0.0.1/ok',
});

describe('the payment fake and idempotency keys', () => {
  it('answers a repeated creation with the first session', async () => {
    const a = await stripe.checkout.sessions.create(session(2950), { idempotencyKey: 'pay-link-one' });
    const b = await stripe.checkout.sessions.create(session(2950), { idempotencyKey: 'pay-link-one' });
    expect(b.id).toBe(a.id);
    const c = await stripe.checkout.sessions.create(session(2950), { idempotencyKey: 'pay-link-two' });
    expect(c.id).not.toBe(a.id);
  });

  it('refuses the same key with other parameters', async () => {
    await stripe.checkout.sessions.create(session(1000), { idempotencyKey: 'pay-link-three' });
    await expect(stripe.checkout.sessions.create(session(1200), { idempotencyKey: 'pay-link-three' })).rejects.toThrow(/same parameters/);
  });
});
