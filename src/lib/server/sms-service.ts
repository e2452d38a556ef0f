// Text messages through the hosted SMS service's official SDK. Configuration alone decides where it
// talks: SMS_API_BASE names the local fake (scripts/sms-fake.mjs); unset, the SDK's own host.
// Delivery reports come back as status callbacks to /api/sms/status, signed with the account's
// token and checked here with the SDK's own validator. The SDK is loaded on first use, never at
// start-up: the server's first answer does not wait for it (DEVELOPERS.md "Start-up").
import type Twilio from 'twilio';
import type RequestClient from 'twilio/lib/base/RequestClient';
import { BETTER_AUTH_URL, SMS_ACCOUNT_SID, SMS_API_BASE, SMS_AUTH_TOKEN, SMS_FROM } from 'astro:env/server';

/** How long one call to the service may take: well inside a notice's send lease (services/notices.ts). */
export const SMS_TIMEOUT_MS = 10_000;

/** Where status callbacks are posted, below the app's public address (BETTER_AUTH_URL). */
export const SMS_STATUS_PATH = '/api/sms/status';

/** True when an account id, token and sending number are configured. */
export function smsConfigured(): boolean {
  return Boolean(SMS_ACCOUNT_SID && SMS_AUTH_TOKEN && SMS_FROM);
}

type Sdk = typeof Twilio;
let sdk: Promise<Sdk> | null = null;
const loadSdk = (): Promise<Sdk> => (sdk ??= import('twilio').then((m) => (m as unknown as { default: Sdk }).default ?? (m as unknown as Sdk)));

// The SDK has no base-address option; its documented way in is a custom HTTP client. This one
// sends every request to SMS_API_BASE instead of the service's host, path and query unchanged.
function baseAddressClient(twilio: Sdk, base: URL): Twilio.RequestClient {
  class BaseAddressClient extends twilio.RequestClient {
    override request<T>(opts: RequestClient.RequestOptions<T>) {
      const to = new URL(opts.uri);
      return super.request<T>({ ...opts, uri: new URL(to.pathname + to.search, base).href });
    }
  }
  return new BaseAddressClient({ timeout: SMS_TIMEOUT_MS });
}

let client: Twilio.Twilio | null = null;

async function smsClient(): Promise<Twilio.Twilio> {
  if (!smsConfigured()) throw new Error('Text messages are not set up for this shop (SMS_ACCOUNT_SID, SMS_AUTH_TOKEN, SMS_FROM).');
  if (client) return client;
  const twilio = await loadSdk();
  const httpClient = SMS_API_BASE ? baseAddressClient(twilio, new URL(SMS_API_BASE)) : new twilio.RequestClient({ timeout: SMS_TIMEOUT_MS });
  client = twilio(SMS_ACCOUNT_SID, SMS_AUTH_TOKEN, { httpClient });
  return client;
}

/** The number as the service wants it: digits, with the leading + kept when typed. */
export function dialable(phone: string): string {
  const digits = phone.replace(/\D+/g, '');
  return phone.trim().startsWith('+') ? `+${digits}` : digits;
}

/** The status callback address of one notice: the app's public address, so the signature the
 * service makes over it is checked against the same text whatever proxy sits in front. */
export function statusCallbackUrl(noticeId: string): string {
  const url = new URL(SMS_STATUS_PATH, BETTER_AUTH_URL);
  url.searchParams.set('notice', noticeId);
  return url.href;
}

/** The address a callback was signed over: the public address with the request's path and query. */
export function signedUrlOf(requestUrl: string): string {
  const url = new URL(requestUrl);
  return new URL(url.pathname + url.search, BETTER_AUTH_URL).href;
}

/** Sends one text; resolves with the service's message id, throws when the service refuses it. */
export async function sendText(message: { to: string; body: string; statusCallback: string }): Promise<{ sid: string; status: string }> {
  const sent = await (await smsClient()).messages.create({
    to: dialable(message.to),
    from: SMS_FROM!,
    body: message.body,
    statusCallback: message.statusCallback,
  });
  return { sid: sent.sid, status: sent.status };
}

/** True when a callback's signature is the service's over this address and these fields (the
 * SDK's validator); false when unsigned, wrong, or texts are not set up. */
export async function verifyStatusCallback(signature: string | null, url: string, params: Record<string, string>): Promise<boolean> {
  if (!signature || !SMS_AUTH_TOKEN) return false;
  return (await loadSdk()).validateRequest(SMS_AUTH_TOKEN, signature, url, params);
}
