// better-auth's own endpoints (/api/auth/*), with failed sign-ins and reset mail limited.
import type { APIRoute } from 'astro';
import { auth } from '@/lib/auth';
import { problem, readBytes } from '@/lib/api';
import { withBody } from '@/lib/body';
import { clientOf } from '@/lib/client-address';
import { limitedResetRequest } from '@/services/reset-limit';
import { limitedSignIn } from '@/services/sign-in-limit';
import { UNSTORABLE_MESSAGE, unstorablePath } from '@/lib/text';

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

/** Hands every /api/auth request to better-auth. */
export const ALL: APIRoute = async (context) => {
  const { request } = context;
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
  if (capped.method === 'POST' && path === '/api/auth/sign-in/email') return limitedSignIn(capped, clientOf(context), auth.handler);
  if (capped.method === 'POST' && path === '/api/auth/request-password-reset') return limitedResetRequest(capped, clientOf(context), auth.handler);
  return auth.handler(capped);
};
