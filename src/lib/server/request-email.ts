// The e-mail field of a request to better-auth, read the way its router (better-call) reads bodies:
// JSON, form-encoded or multipart, so a limit sees every encoding better-auth would accept.

/** The lower-cased `email` of the body, or '' when there is none. Reads a clone; the request stays unread. */
export async function requestEmail(request: Request): Promise<string> {
  const type = (request.headers.get('content-type') ?? '').toLowerCase();
  let value: unknown;
  try {
    const copy = request.clone();
    if (type.includes('application/x-www-form-urlencoded') || type.includes('multipart/form-data')) {
      value = (await copy.formData()).get('email');
    } else {
      // better-call parses application/*+json as JSON; anything else better-auth refuses (415),
      // but reading it as JSON costs nothing and counts a body that would be taken if it could.
      value = ((JSON.parse(await copy.text()) ?? {}) as { email?: unknown }).email;
    }
  } catch {
    return '';
  }
  return typeof value === 'string' ? value.trim().toLowerCase().slice(0, 320) : '';
}
