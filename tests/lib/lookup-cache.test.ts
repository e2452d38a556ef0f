// The session lookup cache's bound: a change made elsewhere (another server revoking a session or
// removing a member) is seen once the entry is older than the TTL; a clear (a write on this server)
// is seen at once, even by a lookup that was running when it came.
import { describe, expect, it } from 'vitest';
import { lookupCache } from '@/lib/server/lookup-cache';
import { SESSION_CACHE_TTL_MS, sessionToken } from '@/lib/server/session-key';

function clock() {
  let t = 1_000_000;
  return { now: () => t, advance: (ms: number) => (t += ms) };
}

describe('lookupCache', () => {
  it('answers from the cache within the TTL, and from the loader once the TTL has passed', async () => {
    const c = clock();
    const cache = lookupCache<string>(5_000, 10, c.now);
    let member = 'member';
    const load = async () => ({ value: member });
    expect(await cache.get('token', load)).toBe('member');
    member = 'removed'; // changed in the database by another server
    c.advance(4_999);
    expect(await cache.get('token', load)).toBe('member');
    c.advance(1);
    expect(await cache.get('token', load)).toBe('removed');
  });

  it("never keeps an answer past the session's own expiry", async () => {
    const c = clock();
    const cache = lookupCache<string>(5_000, 10, c.now);
    let loads = 0;
    const load = async () => ({ value: `v${++loads}`, expiresAt: c.now() + 1_000 });
    await cache.get('token', load);
    c.advance(1_000);
    expect(await cache.get('token', load)).toBe('v2');
  });

  it('forgets everything on clear, so a sign-out on this server is seen by the next request', async () => {
    const cache = lookupCache<string>(5_000, 10);
    let state = 'signed in';
    const load = async () => ({ value: state });
    await cache.get('token', load);
    state = 'signed out';
    cache.clear();
    expect(await cache.get('token', load)).toBe('signed out');
  });

  it('does not keep an answer whose lookup began before a clear', async () => {
    const cache = lookupCache<string>(5_000, 10);
    let release!: () => void;
    const slow = cache.get('token', () => new Promise((r) => (release = () => r({ value: 'stale' }))));
    cache.clear();
    release();
    expect(await slow).toBe('stale');
    expect(cache.size()).toBe(0);
    expect(await cache.get('token', async () => ({ value: 'fresh' }))).toBe('fresh');
  });

  it('asks the loader once for requests of the same key that come while it runs', async () => {
    const cache = lookupCache<string>(5_000, 10);
    let loads = 0;
    let release!: () => void;
    const load = () => new Promise<{ value: string }>((r) => ((loads += 1), (release = () => r({ value: `v${loads}` }))));
    const tabs = [cache.get('token', load), cache.get('token', load), cache.get('token', load)];
    const other = cache.get('other', async () => ({ value: 'other' }));
    release();
    expect(await Promise.all(tabs)).toEqual(['v1', 'v1', 'v1']);
    expect(await other).toBe('other');
    expect(loads).toBe(1);
  });

  it('shares no lookup begun before a clear with a request after it', async () => {
    const cache = lookupCache<string>(5_000, 10);
    let release!: () => void;
    const before = cache.get('token', () => new Promise((r) => (release = () => r({ value: 'signed in' }))));
    cache.clear(); // a sign-out on this server
    const after = cache.get('token', async () => ({ value: 'signed out' }));
    release();
    expect(await before).toBe('signed in');
    expect(await after).toBe('signed out');
    expect(await cache.get('token', async () => ({ value: 'not asked' }))).toBe('signed out');
  });

  it('lets a failed lookup fail its waiters, and asks again at the next request', async () => {
    const cache = lookupCache<string>(5_000, 10);
    let fail = true;
    const load = async () => {
      if (fail) throw new Error('database away');
      return { value: 'back' };
    };
    const both = [cache.get('token', load), cache.get('token', load)];
    for (const p of both) await expect(p).rejects.toThrow('database away');
    fail = false;
    expect(await cache.get('token', load)).toBe('back');
  });

  it('holds at most its maximum, dropping the oldest', async () => {
    const cache = lookupCache<string>(5_000, 3);
    for (const k of ['a', 'b', 'c', 'd']) await cache.get(k, async () => ({ value: k }));
    expect(cache.size()).toBe(3);
    expect(await cache.get('a', async () => ({ value: 'a again' }))).toBe('a again');
  });
});

describe('the session lookup', () => {
  it('keeps a lookup at most 5 s (the bound README states for other servers)', () => {
    expect(SESSION_CACHE_TTL_MS).toBeLessThanOrEqual(5_000);
  });

  it('keys on the session token cookie only', () => {
    expect(sessionToken('a=1; better-auth.session_token=abc.def; b=2')).toBe('abc.def');
    expect(sessionToken('__Secure-better-auth.session_token=xyz')).toBe('xyz');
    expect(sessionToken('better-auth.session_data=abc')).toBeNull();
    expect(sessionToken(null)).toBeNull();
  });
});
