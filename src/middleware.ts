// Every request: the database is ready, cross-site writes are refused, the session is resolved
// into Astro.locals, and pages other than the public ones send signed-out visitors to sign-in.
// Every answer, refusals and redirects included, leaves with the security headers.
import type { MiddlewareHandler } from 'astro';
import { defineMiddleware } from 'astro:middleware';
import { BETTER_AUTH_URL } from 'astro:env/server';
import { memberRequestStarted } from '@/lib/server/member-activity';
import { badIdParam } from '@/lib/shared/ids';
import { forgetSessionsAfterWrite, lookUpSession, warmAuth } from '@/services/session-lookup';
import { afterFirstAnswer } from '@/lib/server/after-first-answer';
import { withSecurityHeaders } from '@/lib/server/security-headers';
import { logError, logRequest } from '@/lib/server/request-log';
import { ensureStarted } from '@/services/startup';

const PUBLIC_PAGES = ['/', '/sign-in', '/sign-up', '/forgot', '/reset', '/paid', '/api-reference'];
const PUBLIC_PREFIXES = ['/invite/', '/api/', '/_astro/', '/_image', '/favicon'];
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
const HEALTH_PATH = '/api/health';
// Routes that answer for themselves: better-auth resolves its own session, and the payment
// webhook and the SMS status callback are proven by their signatures. Looking the session up for
// them is work thrown away.
const OWN_AUTH_PREFIXES = ['/api/auth/', '/api/payments/webhook', '/api/sms/status'];

function isPublic(path: string): boolean {
  return PUBLIC_PAGES.includes(path) || PUBLIC_PREFIXES.some((p) => path.startsWith(p));
}

function crossSite(request: Request, selfOrigin: string): boolean {
  if (SAFE_METHODS.has(request.method)) return false;
  const origin = request.headers.get('origin');
  if (origin) return origin !== selfOrigin && origin !== BETTER_AUTH_URL;
  // A browser always sends Origin on a cross-site POST; without one, only refuse when a
  // session cookie would ride along (a script without cookies cannot act as anyone).
  return /better-auth\./.test(request.headers.get('cookie') ?? '') || request.headers.get('sec-fetch-site') === 'cross-site';
}

/** An API answer of 4xx/5xx that is not JSON (Astro's 404 page for a path no route matches,
 * better-auth's bare 404) as JSON with the same status, so every client can read every refusal. */
async function jsonRefusal(path: string, response: Response): Promise<Response> {
  if (!path.startsWith('/api/') || response.status < 400 || (response.headers.get('content-type') ?? '').includes('json')) return response;
  await response.body?.cancel().catch(() => {});
  const headers = new Headers(response.headers);
  headers.set('content-type', 'application/json');
  headers.delete('content-length');
  const error = response.status === 404 ? 'No such API route.' : response.statusText || 'The request was refused.';
  return new Response(JSON.stringify({ error }), { status: response.status, headers });
}

/** The one middleware; a member's request is marked in flight so anonymous renders wait for it.
 * Every answer leaves with the security headers; only `astro dev` (mode "development") goes
 * without the CSP: Vite inlines scripts of its own there (the tests' build runs under
 * NODE_ENV=test, so DEV is no guide). */
export const onRequest = defineMiddleware(async (context, next) => {
  const done = memberRequestStarted(context.request);
  const began = performance.now();
  let status = 500;
  try {
    const answered = withSecurityHeaders(await jsonRefusal(context.url.pathname, await answer(context, next, done)), {
      csp: import.meta.env.MODE !== 'development',
    });
    // better-auth is not needed to answer a signed-out page: it loads once the first answer is out.
    const res = afterFirstAnswer(answered, () => void warmAuth().catch(() => {}));
    status = res.status;
    return res;
  } catch (e) {
    logError(context.routePattern, e);
    throw e;
  } finally {
    done();
    // A write may sign out, remove a member or change a role: kept session lookups go (services/session-lookup.ts).
    if (!SAFE_METHODS.has(context.request.method)) forgetSessionsAfterWrite();
    logRequest({
      method: context.request.method,
      route: context.routePattern,
      status,
      ms: performance.now() - began,
      shop: context.locals.member?.shopId ?? null,
    });
  }
});

async function answer(context: Parameters<MiddlewareHandler>[0], next: Parameters<MiddlewareHandler>[1], notMember: () => void): Promise<Response> {
  // Health answers for itself, even while the database is down or not yet migrated; asking it
  // also starts the database (migrations) if no request has yet.
  if (context.url.pathname === HEALTH_PATH) {
    ensureStarted().catch(() => {});
    return next();
  }
  await ensureStarted();
  const { request, url, locals } = context;
  if (crossSite(request, url.origin)) {
    return new Response(JSON.stringify({ error: 'Cross-site request refused.' }), {
      status: 403,
      headers: { 'content-type': 'application/json' },
    });
  }
  locals.user = null;
  locals.member = null;
  // Every [id] of every route and page, checked once here before any handler can query with it.
  const badId = badIdParam(context.params, context.routePattern);
  if (badId) {
    const api = url.pathname.startsWith('/api/');
    return new Response(
      api ? JSON.stringify({ error: `No such record: the ${badId} in the address is not an id.` }) : 'Not found: the address does not name a record.',
      {
        status: 404,
        headers: { 'content-type': api ? 'application/json' : 'text/plain; charset=utf-8' },
      },
    );
  }
  if (OWN_AUTH_PREFIXES.some((p) => url.pathname.startsWith(p))) return next();
  const { user, member } = await lookUpSession(request.headers);
  // Copies: the lookup is shared by every request of the session while it is kept.
  locals.user = user && { ...user };
  locals.member = member && { ...member };
  // A cookie without a membership (an old session) is a stranger: it must not hold up anonymous work, its own included.
  if (!locals.member) notMember();
  if (!locals.member && !isPublic(url.pathname)) {
    return context.redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
  }
  return next();
}
