// A small HTTP client for the tests against the built server: JSON calls carrying a session
// cookie and, like a browser, the page's Origin on writes.
import { inject } from 'vitest';

/** The demo password every seeded account uses (src/services/demo-seed.ts). */
export const DEMO_PASSWORD = 'cuffwright-demo';

/** The demo shop's people by role. */
export const DEMO = {
  lead: 'lead@pinmark.test',
  tailor: 'tailor@pinmark.test',
  apprentice: 'apprentice@pinmark.test',
  counter: 'counter@pinmark.test',
} as const;

/** A response with its parsed JSON body (null when not JSON). */
export interface Answer {
  status: number;
  body: any;
  headers: Headers;
}

/** Calls the server as the holder of `cookie` (or signed out). */
export async function call(
  method: string,
  path: string,
  opts: { cookie?: string; body?: unknown; form?: Record<string, string>; origin?: string | null; from?: string } = {},
): Promise<Answer> {
  const base = inject('baseURL');
  const headers: Record<string, string> = {};
  if (opts.cookie) headers.cookie = opts.cookie;
  if (opts.body !== undefined) headers['content-type'] = 'application/json';
  if (opts.form) headers['content-type'] = 'application/x-www-form-urlencoded';
  // The test server trusts one proxy hop (TRUSTED_PROXY_HOPS=1), so this stands for the client's address.
  if (opts.from) headers['x-forwarded-for'] = opts.from;
  const origin = opts.origin === undefined ? base : opts.origin;
  if (origin && method !== 'GET') headers.origin = origin;
  const res = await fetch(base + path, {
    method,
    headers,
    body: opts.form ? new URLSearchParams(opts.form).toString() : opts.body === undefined ? undefined : JSON.stringify(opts.body),
    redirect: 'manual',
  });
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = text;
  }
  return { status: res.status, body, headers: res.headers };
}

/** The cookie header a Set-Cookie answer establishes. */
export function cookieFrom(headers: Headers): string {
  return headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

/** Signs in and returns the session cookie; throws when the server refuses. */
export async function signIn(email: string, password = DEMO_PASSWORD): Promise<string> {
  const r = await call('POST', '/api/auth/sign-in/email', { body: { email, password } });
  if (r.status !== 200) throw new Error(`sign-in of ${email} answered ${r.status}: ${JSON.stringify(r.body)}`);
  return cookieFrom(r.headers);
}

let counter = 0;
/** An e-mail address no other test uses. */
export function freshEmail(tag: string): string {
  counter += 1;
  return `${tag}-${Date.now().toString(36)}-${counter}@example.com`;
}

/** Opens a new shop through sign-up; returns its id, lead e-mail and session cookie. */
export async function newShop(name: string): Promise<{ shopId: string; email: string; cookie: string }> {
  const email = freshEmail('lead');
  const r = await call('POST', '/api/shops', { body: { shopName: name, name: 'Test Lead', email, password: 'a-long-password' } });
  if (r.status !== 201) throw new Error(`sign-up answered ${r.status}: ${JSON.stringify(r.body)}`);
  return { shopId: r.body.shopId, email, cookie: cookieFrom(r.headers) };
}
