// better-auth's own endpoints (/api/auth/*), with failed sign-ins and reset mail limited.
import type { APIRoute } from 'astro';
import { auth } from '@/lib/auth';
import { problem } from '@/lib/api';
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
  if (request.method === 'POST' && path === '/api/auth/sign-in/email') return limitedSignIn(request, clientOf(context), auth.handler);
  if (request.method === 'POST' && path === '/api/auth/request-password-reset') return limitedResetRequest(request, clientOf(context), auth.handler);
  return auth.handler(request);
};
