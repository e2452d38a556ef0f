// Reading a request body with a byte limit and an idle deadline. Content-Length is only a claim:
// the stream itself is counted, and reading stops the moment it passes the limit, so a 100 MB
// body is never held in memory; a body that stops arriving is answered 408 instead of held open.
import { BODY_IDLE_SECONDS } from 'astro:env/server';

/** The most a JSON body may weigh (every route but uploads). */
export const JSON_BODY_LIMIT = 64 * 1024;

/** A body refused before it was read whole: 413 too large, 408 it stopped arriving. */
export class BodyRefused extends Error {
  constructor(
    public status: 408 | 413,
    message: string,
  ) {
    super(message);
  }
}

/** The messages for each refusal, with the limit in words. */
export function tooLargeMessage(limit: number): string {
  return limit >= 1024 * 1024
    ? `The request is larger than ${Math.floor(limit / (1024 * 1024))} MB.`
    : `The request is larger than ${Math.floor(limit / 1024)} KB.`;
}
const STALLED = 'The request stopped arriving before it was complete: send it again.';

// A refused body's rest is read and dropped up to this much, so the client (still sending) gets
// the 413 instead of a reset connection; past it the connection is cut.
const DRAIN_LIMIT = 4 * 1024 * 1024;

type Reader = ReadableStreamDefaultReader<Uint8Array>;

/** The next chunk, or 'stalled' when none comes within idleMs. */
async function nextChunk(reader: Reader, idleMs: number) {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const stalled = new Promise<'stalled'>((resolve) => (timer = setTimeout(() => resolve('stalled'), idleMs)));
  return Promise.race([reader.read(), stalled]).finally(() => clearTimeout(timer));
}

/** Reads and drops the rest of a refused body in the background (for idleMs at most), then lets it go. */
function drain(reader: Reader, idleMs: number): void {
  const until = Date.now() + idleMs;
  void (async () => {
    let dropped = 0;
    for (;;) {
      const next = await nextChunk(reader, Math.max(1, until - Date.now()));
      if (next === 'stalled' || next.done) break;
      dropped += next.value.byteLength;
      if (dropped > DRAIN_LIMIT) break;
    }
  })()
    .catch(() => {})
    .finally(() => reader.cancel().catch(() => {}));
}

/** The whole body as bytes, refused past `limit` bytes or after `idleMs` without a byte. */
export async function readLimited(request: Request, limit: number, idleMs = BODY_IDLE_SECONDS * 1000): Promise<Uint8Array> {
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  if (declared > limit) {
    drain(reader, idleMs);
    throw new BodyRefused(413, tooLargeMessage(limit));
  }
  const chunks: Uint8Array[] = [];
  let seen = 0;
  for (;;) {
    let next: Awaited<ReturnType<typeof nextChunk>>;
    try {
      next = await nextChunk(reader, idleMs);
    } catch {
      throw new BodyRefused(408, STALLED);
    }
    if (next === 'stalled') {
      reader.cancel().catch(() => {});
      throw new BodyRefused(408, STALLED);
    }
    if (next.done) break;
    seen += next.value.byteLength;
    if (seen > limit) {
      drain(reader, idleMs);
      throw new BodyRefused(413, tooLargeMessage(limit));
    }
    chunks.push(next.value);
  }
  const out = new Uint8Array(seen);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** The request again, its body the bytes already read (for handlers that read it themselves). */
export function withBody(request: Request, bytes: Uint8Array): Request {
  const hasBody = request.method !== 'GET' && request.method !== 'HEAD';
  return new Request(request.url, {
    method: request.method,
    headers: request.headers,
    body: hasBody ? (bytes as BodyInit) : undefined,
    signal: request.signal,
  });
}
