// A short-lived cache of one answer per key (the middleware's session and membership lookup per
// session token). An entry lives at most `ttlMs` and never past its own expiry; `clear()` forgets
// everything at once and a lookup that began before a clear is not kept, so a sign-out or a removed
// member on this server takes effect on the next request. Other servers (DATABASE_URL) see such a
// change when their entry runs out: within `ttlMs`.

/** What a loader found, and until when (ms since the epoch) it may be kept at most. */
export interface Loaded<T> {
  value: T;
  expiresAt?: number;
}

/** A bounded map of answers kept for a short while. */
export interface LookupCache<T> {
  /** The kept answer for the key, or the loader's (kept when nothing was cleared meanwhile). */
  get(key: string, load: () => Promise<Loaded<T>>): Promise<T>;
  /** Forgets every answer, and any lookup running now. */
  clear(): void;
  /** How many answers are kept (for tests). */
  size(): number;
}

/** A cache of at most `max` answers, each kept at most `ttlMs`; `now` is injectable for tests. */
export function lookupCache<T>(ttlMs: number, max: number, now: () => number = Date.now): LookupCache<T> {
  const entries = new Map<string, { value: T; until: number }>();
  // Lookups running now, one per key: requests for the same key meanwhile (a screen's tabs after a
  // write cleared the cache) wait for it instead of each asking the database. A clear empties it.
  const running = new Map<string, Promise<T>>();
  let generation = 0;
  async function fresh(key: string, load: () => Promise<Loaded<T>>): Promise<T> {
    const started = generation;
    try {
      const loaded = await load();
      if (started === generation) {
        // Oldest first out: a flood of strangers' tokens cannot grow the process without bound.
        if (entries.size >= max) entries.delete(entries.keys().next().value!);
        entries.set(key, { value: loaded.value, until: Math.min(now() + ttlMs, loaded.expiresAt ?? Infinity) });
      }
      return loaded.value;
    } finally {
      if (started === generation) running.delete(key);
    }
  }
  return {
    get(key, load) {
      const hit = entries.get(key);
      if (hit && hit.until > now()) return Promise.resolve(hit.value);
      if (hit) entries.delete(key);
      let lookup = running.get(key);
      if (!lookup) {
        lookup = fresh(key, load);
        running.set(key, lookup);
      }
      return lookup;
    },
    clear() {
      generation += 1;
      entries.clear();
      running.clear();
    },
    size: () => entries.size,
  };
}
