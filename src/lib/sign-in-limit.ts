// Limits repeated failed sign-ins per account: after MAX_FAILURES within WINDOW_MS, sign-ins for
// that e-mail are refused with 429 until the oldest failure ages out. Kept in memory: one process
// serves the shop, and a restart clearing the count is acceptable.
const MAX_FAILURES = 5;
const WINDOW_MS = 15 * 60 * 1000;
const failures = new Map<string, number[]>();

function recent(email: string, now: number): number[] {
  const list = (failures.get(email) ?? []).filter((t) => now - t < WINDOW_MS);
  if (list.length) failures.set(email, list);
  else failures.delete(email);
  return list;
}

/** Seconds until this e-mail may try again, or 0 when it may sign in now. */
export function signInBlockedFor(email: string, now = Date.now()): number {
  const list = recent(email.toLowerCase(), now);
  if (list.length < MAX_FAILURES) return 0;
  return Math.ceil((list[0]! + WINDOW_MS - now) / 1000);
}

/** Records a sign-in outcome: failures count, a success clears the count. */
export function recordSignIn(email: string, ok: boolean, now = Date.now()): void {
  const key = email.toLowerCase();
  if (ok) failures.delete(key);
  else failures.set(key, [...recent(key, now), now]);
}

/** Wraps better-auth's e-mail sign-in with the limit. */
export async function limitedSignIn(request: Request, handler: (r: Request) => Promise<Response>): Promise<Response> {
  let email = '';
  try {
    const body = (await request.clone().json()) as { email?: unknown };
    if (typeof body.email === 'string') email = body.email;
  } catch {
    /* better-auth answers the malformed body itself */
  }
  const wait = email ? signInBlockedFor(email) : 0;
  if (wait > 0) {
    return new Response(
      JSON.stringify({ error: `Too many failed sign-ins for this account. Try again in ${Math.ceil(wait / 60)} min.` }),
      { status: 429, headers: { 'content-type': 'application/json', 'retry-after': String(wait) } },
    );
  }
  const response = await handler(request);
  if (email && (response.status === 200 || response.status === 401)) recordSignIn(email, response.status === 200);
  return response;
}
