// The one id check: every id in a route's path goes through it before any query, so an id that
// cannot name a row (a NUL, a slash, 10 kB of text) is a 404, never a database error.
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
// Our rows use uuids; better-auth's (members, invitations, users) use 32 letters and digits.
const RECORD_ID = /^[A-Za-z0-9_-]{1,64}$/;

/** True when the text is a uuid (anything else cannot name a row of a uuid column). */
export function isUuid(id: string): boolean {
  return UUID.test(id);
}

/** True when the text can be an id at all: a uuid or better-auth's letters and digits. */
export function isRecordId(id: string): boolean {
  return RECORD_ID.test(id);
}

/** The names of a route pattern's rest parameters ([...all]), which hold paths, not ids. */
function restParams(routePattern: string): Set<string> {
  return new Set([...routePattern.matchAll(/\[\.\.\.([^\]]+)\]/g)].map((m) => m[1]!));
}

/** The first path parameter of the route that cannot be an id, or null when all can. */
export function badIdParam(params: Record<string, string | undefined>, routePattern: string): string | null {
  const rest = restParams(routePattern);
  for (const [name, value] of Object.entries(params)) {
    if (rest.has(name) || value === undefined) continue;
    if (!isRecordId(value)) return name;
  }
  return null;
}
