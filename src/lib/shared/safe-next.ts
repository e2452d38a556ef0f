// Where to send someone after signing in (?next=): only a path on this site. Parsed the way the
// browser will parse it (WHATWG URL), so tabs, newlines and backslashes that browsers quietly
// turn into "//" cannot smuggle in another host.

/** `raw` as pathname + search + hash when it resolves to `origin`, otherwise `fallback`. */
export function safeNext(raw: string | null | undefined, origin: string, fallback = '/bench'): string {
  if (!raw) return fallback;
  let url: URL;
  try {
    url = new URL(raw, origin);
  } catch {
    return fallback;
  }
  if (url.origin !== origin) return fallback;
  // "/.//evil.example" resolves here but leaves "//evil.example", which a browser reads as a host.
  if (url.pathname.startsWith('//')) return fallback;
  return url.pathname + url.search + url.hash;
}
