// What the middleware's session lookup cache (services/session-lookup.ts) keys on and how long it
// keeps an answer; here, apart from better-auth and the database, so tests can read them.

/** How long a session lookup is kept: the most another server may honour a signed-out session or removed member. */
export const SESSION_CACHE_TTL_MS = 5_000;

/** The session token cookie's value (signed by better-auth), or null when none was sent. */
export function sessionToken(cookie: string | null): string | null {
  const m = /(?:^|;\s*)(?:__Secure-)?better-auth\.session_token=([^;]+)/.exec(cookie ?? '');
  return m ? m[1]! : null;
}
