// The hosted payment service through its official SDK. Configuration alone decides where it
// talks: PAYMENTS_API_BASE names the local fake; unset, the SDK's own default host is used.
// The SDK (some 200 modules) is loaded at the first payment call, not at start-up.
import type Stripe from 'stripe';
import { PAYMENTS_API_BASE, PAYMENTS_API_KEY, PAYMENTS_WEBHOOK_SECRET } from 'astro:env/server';

let client: Stripe | null = null;

/** How long one call to the service may take before the SDK gives up (a connection error: 503). */
export const PAYMENT_TIMEOUT_MS = 5_000;

let timeoutMs = PAYMENT_TIMEOUT_MS;

/** Sets how long one call may take, for the clients made from now on (a test of a service that
 * never answers need not wait the real 5 s); the client already made is dropped. */
export function setPaymentTimeout(ms: number): void {
  timeoutMs = ms;
  client = null;
}

/** Whether an API key is configured (the client itself loads on first use). */
export function paymentsConfigured(): boolean {
  return Boolean(PAYMENTS_API_KEY);
}

/** The SDK's class, loaded once on first use. */
async function sdk(): Promise<typeof Stripe> {
  return (await import('stripe')).default;
}

/** The SDK client, or null when no API key is configured. */
export async function paymentClient(): Promise<Stripe | null> {
  if (!PAYMENTS_API_KEY) return null;
  if (client) return client;
  const Sdk = await sdk();
  const base = PAYMENTS_API_BASE ? new URL(PAYMENTS_API_BASE) : null;
  client ??= new Sdk(PAYMENTS_API_KEY, {
    ...(base
      ? {
          host: base.hostname,
          port: Number(base.port || (base.protocol === 'https:' ? 443 : 80)),
          protocol: base.protocol.replace(':', '') as 'http' | 'https',
        }
      : {}),
    // One retry for reading and expiring sessions (safe to repeat); making one passes its own
    // idempotency key and no retry (`maxNetworkRetries: 0` per call), so a click waits one timeout at most.
    maxNetworkRetries: 1,
    timeout: timeoutMs,
    telemetry: false,
  });
  return client;
}

/** The secret webhooks are signed with, or null when not configured. */
export function webhookSecret(): string | null {
  return PAYMENTS_WEBHOOK_SECRET || null;
}

/** Checks a webhook's signature (and age) and returns its event; throws when it does not verify. */
export async function verifyWebhook(payload: string, signature: string, secret: string): Promise<Stripe.Event> {
  return (await sdk()).webhooks.constructEvent(payload, signature, secret);
}
