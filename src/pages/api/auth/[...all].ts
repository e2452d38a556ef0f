// better-auth's own endpoints (/api/auth/*), with failed sign-ins and reset mail limited.
import { auth } from '@/lib/server/auth';
import { problem, readBytes } from '@/lib/server/api';
import { route } from '@/lib/server/route';
import { withBody } from '@/lib/server/body';
import { clientOf } from '@/lib/server/client-address';
import { limitedResetRequest } from '@/services/reset-limit';
import { limitedSignIn } from '@/services/sign-in-limit';
import { UNSTORABLE_MESSAGE, unstorablePath } from '@/lib/shared/text';

export const prerender = false;

/** The body as better-auth will read it: JSON or a url-encoded form (anything else, nothing). */
function parsedBody(bytes: Uint8Array, type: string | null): Record<string, unknown> {
  const text = new TextDecoder().decode(bytes);
  try {
    if (type?.includes('application/x-www-form-urlencoded')) return Object.fromEntries(new URLSearchParams(text));
    const value: unknown = JSON.parse(text);
    return value && typeof value === 'object' ? (value as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

/** better-auth's refusals ({ code, message }) in the API's one error shape, keeping its own fields
 * (its client reads `message` and `code`). */
async function oneShape(res: Response): Promise<Response> {
  if (res.status < 400 || !res.headers.get('content-type')?.includes('application/json')) return res;
  const text = await res.text();
  let data: unknown = null;
  try {
    data = JSON.parse(text);
  } catch {
    // Not JSON after all: passed on as it came.
  }
  if (!data || typeof data !== 'object' || Array.isArray(data) || typeof (data as { error?: unknown }).error === 'string') {
    return new Response(text, { status: res.status, statusText: res.statusText, headers: res.headers });
  }
  const fields = data as Record<string, unknown>;
  const error = typeof fields.message === 'string' && fields.message ? fields.message : `The request was refused (${res.status}).`;
  const headers = new Headers(res.headers);
  headers.delete('content-length');
  return new Response(JSON.stringify({ ...fields, error }), { status: res.status, statusText: res.statusText, headers });
}

/** Hands every /api/auth request to better-auth. */
export const ALL = route(
  {
    summary: "better-auth's own endpoints: sign-in/email, sign-out, get-session, request-password-reset, reset-password, change-password, update-user…",
    description:
      'Public. Sign in with POST /api/auth/sign-in/email {email, password}: the answer sets the session cookie every other route reads. ' +
      "Sign-up is POST /api/shops or an invitation; better-auth's organization endpoints answer 404 (staff work goes through /api/staff).",
    permission: 'public',
    rawBody: { type: 'application/json' },
    examples: [{ summary: 'The session of the caller (null signed out)', params: { all: 'get-session' } }],
  },
  async ({ context, request }) => {
    const path = new URL(request.url).pathname;
    // Accounts come only with a shop (/api/shops) or an invitation (/api/invitations/…).
    if (path === '/api/auth/sign-up/email') return problem(404, 'Sign up through /sign-up.');
    if (path === '/api/auth/organization/create') return problem(404, 'Shops are created through /sign-up.');
    // better-auth reads the whole body as it comes: it gets the bytes once they are counted.
    let capped = request;
    // better-auth stores what it is sent: a NUL or a lone surrogate would fail its write with a 500.
    let fields: Record<string, unknown> = Object.fromEntries(new URL(request.url).searchParams);
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      const bytes = await readBytes(request);
      if (bytes instanceof Response) return bytes;
      capped = withBody(request, bytes);
      fields = { ...fields, ...parsedBody(bytes, request.headers.get('content-type')) };
    }
    const bad = unstorablePath(fields);
    if (bad) return problem(422, 'Some fields need attention.', { [bad]: UNSTORABLE_MESSAGE });
    if (capped.method === 'POST' && path === '/api/auth/sign-in/email') return oneShape(await limitedSignIn(capped, clientOf(context), auth.handler));
    if (capped.method === 'POST' && path === '/api/auth/request-password-reset')
      return oneShape(await limitedResetRequest(capped, clientOf(context), auth.handler));
    return oneShape(await auth.handler(capped));
  },
);
