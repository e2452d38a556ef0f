// Start-up loads only what answers the first signed-out page (issue 12: `npm start` → first 200):
// the payment SDK, the mail library, the S3 SDK, pino and better-auth load at their first use.
// Each mock below records that its package was imported and then hands out the real one.
import { describe, expect, it, vi } from 'vitest';

const loaded = vi.hoisted(() => new Set<string>());
vi.mock('@/db', () => import('../db/db-mock'));
vi.mock('stripe', async (real) => (loaded.add('stripe'), real()));
vi.mock('nodemailer', async (real) => (loaded.add('nodemailer'), real()));
vi.mock('@aws-sdk/client-s3', async (real) => (loaded.add('@aws-sdk/client-s3'), real()));
vi.mock('pino', async (real) => (loaded.add('pino'), real()));
vi.mock('better-auth', async (real) => (loaded.add('better-auth'), real()));

describe('start-up on existing data', () => {
  it('runs (migrations, the timers) and answers a signed-out lookup without the heavy libraries', async () => {
    // Existing data: someone is already there, so no demo seed (which signs people up through auth).
    const { db } = await import('@/db');
    const { user } = await import('@/db/schema');
    await db.insert(user).values({ id: 'existing-person', name: 'Wren Applegarth', email: 'wren@startup-loads.test' });
    const { ensureStarted, startedUp } = await import('@/services/startup');
    const { lookUpSession } = await import('@/services/session-lookup');
    await import('@/lib/server/storage');
    await import('@/lib/server/request-log');
    await ensureStarted();
    expect(startedUp()).toBe(true);
    expect(await lookUpSession(new Headers())).toEqual({ user: null, member: null });
    expect([...loaded]).toEqual([]);
  });

  it('loads better-auth when a request carries a session cookie', async () => {
    const { lookUpSession } = await import('@/services/session-lookup');
    const headers = new Headers({ cookie: 'better-auth.session_token=not-a-real-token.sig' });
    expect(await lookUpSession(headers)).toEqual({ user: null, member: null });
    expect(loaded.has('better-auth')).toBe(true);
  });
});
