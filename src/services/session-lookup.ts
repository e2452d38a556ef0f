// Who a request is: the better-auth session and the shop membership behind its cookie, kept per
// session token for SESSION_CACHE_TTL_MS so a busy screen's reads do not ask the database twice
// each. A write to what they read forgets them all (sign-out, a removed member, a changed role take
// effect on the next request): on the embedded database told by the database itself (drizzle/0023),
// on PostgreSQL after every write request here; another server (DATABASE_URL) sees it within the TTL.
// better-auth (half a second of modules) is loaded at the first request with a session cookie, or
// by warmAuth() once the server has answered its first request, not before a signed-out page.
import { listenEmbedded } from '@/db/notifications';
import { lookupCache } from '@/lib/server/lookup-cache';
import { SESSION_CACHE_TTL_MS, sessionToken } from '@/lib/server/session-key';
import { activeMembership, type Membership } from './members';

/** The signed-in person and their membership, or nulls. */
export interface SessionLookup {
  user: { id: string; name: string; email: string } | null;
  member: Membership | null;
}

const cache = lookupCache<SessionLookup>(SESSION_CACHE_TTL_MS, 10_000);
const SIGNED_OUT: SessionLookup = { user: null, member: null };

/** Loads the auth module (once); called after start-up so the first sign-in does not wait for it. */
export function warmAuth(): Promise<unknown> {
  return import('@/lib/server/auth');
}

async function load(headers: Headers) {
  const { auth } = await import('@/lib/server/auth');
  const session = await auth.api.getSession({ headers });
  if (!session) return { value: SIGNED_OUT };
  const { id, name, email } = session.user;
  const member = await activeMembership(id, session.session.activeOrganizationId);
  return { value: { user: { id, name, email }, member }, expiresAt: new Date(session.session.expiresAt).getTime() };
}

/** The request's person and membership, from the cache when looked up less than the TTL ago. */
export function lookUpSession(headers: Headers): Promise<SessionLookup> {
  const token = sessionToken(headers.get('cookie'));
  // Without a token there is nobody to look up; a token is the key as sent, so only its holder hits it.
  if (!token) return Promise.resolve(SIGNED_OUT);
  void listenForSessionChanges();
  return cache.get(token, () => load(headers));
}

/** How many lookups are kept (for tests). */
export function keptSessionLookups(): number {
  return cache.size();
}

/** The channel told of every write to what a lookup reads (drizzle/0023), with the table's name. */
export const SESSION_LOOKUP_CHANNEL = 'session_lookup';
let told = false;
let listening: Promise<void> | undefined;

/** On the embedded database, listens (once) for writes to what a lookup reads: each forgets the kept lookups. */
export function listenForSessionChanges(): Promise<void> {
  listening ??= listenEmbedded(SESSION_LOOKUP_CHANNEL, () => cache.clear()).then((on) => {
    told = on;
  });
  return listening;
}

/** Called after each write request: forgets the kept lookups, unless the database tells this
 * process of the writes that matter (the embedded database, once listening). A sign-out, a removed
 * member or a changed role is then seen by the next request either way. */
export function forgetSessionsAfterWrite(): void {
  if (!told) cache.clear();
}
