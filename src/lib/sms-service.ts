// Text messages through the hosted SMS service's official SDK. Configuration alone decides where it
// talks: SMS_API_BASE names the local fake (scripts/sms-fake.mjs); unset, the SDK's own host.
// Delivery reports come back as status callbacks to /api/sms/status, signed with the account's
// token and checked here with the SDK's own validator.
import twilio from 'twilio';
import { BETTER_AUTH_URL, SMS_ACCOUNT_SID, SMS_API_BASE, SMS_AUTH_TOKEN, SMS_FROM } from 'astro:env/server';

/** How long one call to the service may take: well inside a notice's send lease (services/notices.ts). */
export const SMS_TIMEOUT_MS = 10_000;

/** Where status callbacks are posted, below the app's public address (BETTER_AUTH_URL). */
export const SMS_STATUS_PATH = '/api/sms/status';

/** True when an account id, token and sending number are configured. */
export function smsConfigured(): boolean {
  return Boolean(SMS_ACCOUNT_SID && SMS_AUTH_TOKEN && SMS_FROM);
}

// The SDK has no base-address option; its documented way in is a custom HTTP client. This one
// sends every request to SMS_API_BASE instead of the service's host, path and query unchanged.
class BaseAddressClient extends twilio.RequestClient {
  constructor(private readonly base: URL) {
    super({ timeout: SMS_TIMEOUT_MS });
  }
  override request<T>(opts: Parameters<twilio.RequestClient['request']>[0]) {
    const to = new URL(opts.uri);
    const uri = new URL(to.pathname + to.search, this.base).href;
    return super.request<T>({ ...opts, uri } as typeof opts);
  }
}

let client: twilio.Twilio | null = null;

function smsClient(): twilio.Twilio {
  if (!smsConfigured()) throw new Error('Text messages are not set up for this shop (SMS_ACCOUNT_SID, SMS_AUTH_TOKEN, SMS_FROM).');
  if (client) return client;
  const httpClient = SMS_API_BASE ? new BaseAddressClient(new URL(SMS_API_BASE)) : new twilio.RequestClient({ timeout: SMS_TIMEOUT_MS });
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
  const sent = await smsClient().messages.create({ to: dialable(message.to), from: SMS_FROM!, body: message.body, statusCallback: message.statusCallback });
  return { sid: sent.sid, status: sent.status };
}

/** True when a callback's signature is the service's over this address and these fields (the
 * SDK's validator); false when unsigned, wrong, or texts are not set up. */
export function verifyStatusCallback(signature: string | null, url: string, params: Record<string, string>): boolean {
  if (!signature || !SMS_AUTH_TOKEN) return false;
  return twilio.validateRequest(SMS_AUTH_TOKEN, signature, url, params);
}
