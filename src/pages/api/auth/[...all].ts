// better-auth's own endpoints (/api/auth/*), with failed sign-ins and reset mail limited.
import type { APIRoute } from 'astro';
import { auth } from '@/lib/auth';
import { problem } from '@/lib/api';
import { BodyRefused, JSON_BODY_LIMIT, readLimited, withBody } from '@/lib/body';
import { clientOf } from '@/lib/client-address';
import { limitedResetRequest } from '@/lib/reset-limit';
import { limitedSignIn } from '@/lib/sign-in-limit';

export const prerender = false;

/** Hands every /api/auth request to better-auth. */
export const ALL: APIRoute = async (context) => {
  const { request } = context;
  const path = new URL(request.url).pathname;
  // Accounts come only with a shop (/api/shops) or an invitation (/api/invitations/…).
  if (path === '/api/auth/sign-up/email') return problem(404, 'Sign up through /sign-up.');
  if (path === '/api/auth/organization/create') return problem(404, 'Shops are created through /sign-up.');
  // better-auth reads the whole body as it comes: it gets the bytes once they are counted.
  let capped = request;
  if (request.method !== 'GET' && request.method !== 'HEAD') {
    try {
      capped = withBody(request, await readLimited(request, JSON_BODY_LIMIT));
    } catch (e) {
      if (e instanceof BodyRefused) return problem(e.status, e.message);
      throw e;
    }
  }
  if (capped.method === 'POST' && path === '/api/auth/sign-in/email') return limitedSignIn(capped, clientOf(context), auth.handler);
  if (capped.method === 'POST' && path === '/api/auth/request-password-reset') return limitedResetRequest(capped, clientOf(context), auth.handler);
  return auth.handler(capped);
};
