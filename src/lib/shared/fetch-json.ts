// The islands' one way to call the API: JSON in, JSON out, the server's message on failure.

/** An API error carrying the status and the server's message (and field issues when given). */
export class ApiError extends Error {
  constructor(
    public status: number,
    message: string,
    public issues: Record<string, string> = {},
    /** the whole JSON answer, for routes that say more than a message (the plan's refusal codes) */
    public body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

/** Fetches JSON from the app (a FormData body goes as a multipart form); throws ApiError with the server's message when not OK. */
export async function fetchJson<T>(url: string, init: { method?: string; body?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  const { body } = init;
  const form = body instanceof FormData;
  const response = await fetch(url, {
    method: init.method ?? (body === undefined ? 'GET' : 'POST'),
    // The browser writes a form's content type itself, boundary included.
    headers: body === undefined || form ? {} : { 'content-type': 'application/json' },
    body: body === undefined ? undefined : form ? body : JSON.stringify(body),
    credentials: 'same-origin',
    signal: init.signal,
  });
  const data = (await response.json().catch(() => ({}))) as Record<string, unknown>;
  if (!response.ok) {
    const message = String(data.error ?? data.message ?? `The server answered ${response.status}.`);
    // Every route answers field messages as `issues` (src/lib/server/route.ts).
    throw new ApiError(response.status, message, (data.issues as Record<string, string>) ?? {}, data);
  }
  return data as T;
}
