// A local stand-in for the hosted SMS service, for development and tests only: the one API call
// the app makes through the service's official SDK (create a message, Basic auth with the account
// id and token), a list of what it was asked to send (GET /messages as JSON, GET / as a page), and
// the status callback the hosted service sends, signed with the SDK's own scheme: `delivered`
// a moment after the send, or `failed` (error 30003) for a number whose digits end in 999.
// No text leaves the machine; messages live in this process's memory, as at the hosted service.
import { createServer } from 'node:http';
import { randomBytes } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { listenOrExplain } from './port-taken.mjs';

const hex = (n) => randomBytes(n).toString('hex');
const escapeHtml = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** True for a number the fake reports as undeliverable (its digits end in 999). */
export function failsDelivery(to) {
  return String(to).replace(/\D/g, '').endsWith('999');
}

/** Starts the fake on host:port (0 = any free port); resolves with its port, base URL, the messages and a closer. */
export function startSmsFake({ port = 12112, host = '127.0.0.1', accountSid, authToken, quiet = false, callbackDelayMs = 50 }) {
  const messages = [];
  let base = '';

  async function callback(message) {
    if (!message.statusCallback) return;
    const params = {
      AccountSid: accountSid,
      MessageSid: message.sid,
      SmsSid: message.sid,
      MessageStatus: message.status,
      SmsStatus: message.status,
      To: message.to,
      From: message.from,
      ApiVersion: '2010-04-01',
    };
    if (message.errorCode) params.ErrorCode = String(message.errorCode);
    // The SDK (only to sign callbacks as the real service does) loads at the first callback, not at start.
    const twilio = (await import('twilio')).default;
    const signature = twilio.getExpectedTwilioSignature(authToken, message.statusCallback, params);
    try {
      const res = await fetch(message.statusCallback, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-twilio-signature': signature },
        body: new URLSearchParams(params).toString(),
      });
      message.callbacks.push({ status: message.status, answer: res.status });
      if (!quiet) console.log(`[sms] status ${message.status} for ${message.sid} → ${res.status}`);
    } catch (e) {
      message.callbacks.push({ status: message.status, answer: 0 });
      if (!quiet) console.log(`[sms] status callback failed: ${e.message}`);
    }
  }

  const send = (res, status, body, type = 'application/json') => {
    res.writeHead(status, { 'content-type': type });
    res.end(type === 'application/json' ? JSON.stringify(body) : body);
  };

  const authorized = (req) => {
    const [scheme, value] = (req.headers.authorization ?? '').split(' ');
    if (scheme !== 'Basic' || !value) return false;
    return Buffer.from(value, 'base64').toString() === `${accountSid}:${authToken}`;
  };

  const server = createServer(async (req, res) => {
    const url = new URL(req.url ?? '/', 'http://fake');
    const chunks = [];
    for await (const c of req) chunks.push(c);
    const body = Buffer.concat(chunks).toString();
    const create = url.pathname.match(/^\/2010-04-01\/Accounts\/([^/]+)\/Messages\.json$/);
    if (req.method === 'POST' && create) {
      if (!authorized(req) || create[1] !== accountSid) return send(res, 401, { code: 20003, message: 'Authenticate', status: 401 });
      const form = Object.fromEntries(new URLSearchParams(body));
      if (!form.To || !form.Body || !form.From) return send(res, 400, { code: 21604, message: "A 'To', 'From' and 'Body' are required.", status: 400 });
      if (form.To.replace(/\D/g, '').length < 6)
        return send(res, 400, { code: 21211, message: `The 'To' number ${form.To} is not a valid phone number.`, status: 400 });
      const now = new Date().toUTCString();
      const message = {
        sid: `SM${hex(16)}`,
        account_sid: accountSid,
        to: form.To,
        from: form.From,
        body: form.Body,
        status: 'queued',
        num_segments: String(Math.ceil(form.Body.length / 153) || 1),
        direction: 'outbound-api',
        api_version: '2010-04-01',
        date_created: now,
        date_updated: now,
        error_code: null,
        error_message: null,
        uri: `/2010-04-01/Accounts/${accountSid}/Messages/x.json`,
      };
      const kept = { ...message, statusCallback: form.StatusCallback ?? null, errorCode: null, callbacks: [], at: new Date().toISOString() };
      messages.push(kept);
      if (!quiet) console.log(`[sms] to ${form.To}: ${form.Body.split('\n')[0]}`);
      setTimeout(() => {
        kept.status = failsDelivery(kept.to) ? 'failed' : 'delivered';
        if (kept.status === 'failed') kept.errorCode = 30003;
        void callback(kept);
      }, callbackDelayMs);
      return send(res, 201, message);
    }
    if (req.method === 'GET' && url.pathname === '/messages') {
      return send(
        res,
        200,
        messages.map(({ sid, to, from, body: text, status, errorCode, callbacks, at }) => ({ sid, to, from, body: text, status, errorCode, callbacks, at })),
      );
    }
    if (req.method === 'GET' && url.pathname === '/') {
      const rows = messages
        .slice()
        .reverse()
        .map((m) => `<li><strong>${escapeHtml(m.to)}</strong> · ${escapeHtml(m.status)} · ${escapeHtml(m.at)}<pre>${escapeHtml(m.body)}</pre></li>`)
        .join('');
      return send(
        res,
        200,
        `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Local text messages</title></head><body><h1>Text messages sent (local stand-in, newest first)</h1><ol>${rows || '<li>None yet.</li>'}</ol></body></html>`,
        'text/html; charset=utf-8',
      );
    }
    return send(res, 404, { code: 20404, message: 'The requested resource was not found', status: 404 });
  });

  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      const address = server.address();
      const actual = typeof address === 'object' && address ? address.port : port;
      base = `http://${host}:${actual}`;
      resolve({ port: actual, base, messages, close: () => new Promise((r) => server.close(r)) });
    });
  });
}

/** Starts the fake with a fresh account id, token and sender; returns the app's SMS_* env. */
export async function startLocalSms({ port = 12112, quiet = false } = {}) {
  const accountSid = `AC${hex(16)}`;
  const authToken = hex(16);
  const fake = await startSmsFake({ port, accountSid, authToken, quiet });
  return { ...fake, env: { SMS_ACCOUNT_SID: accountSid, SMS_AUTH_TOKEN: authToken, SMS_FROM: '+15005550006', SMS_API_BASE: fake.base } };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const port = Number(process.env.SMS_FAKE_PORT || 12112);
  const { base, env } = await listenOrExplain(startLocalSms({ port }), { port, what: 'local SMS service', setting: 'SMS_FAKE_PORT' });
  console.log(
    `Local SMS service on ${base}; the app's settings: ${Object.entries(env)
      .map(([k, v]) => `${k}=${v}`)
      .join(' ')}`,
  );
}
