// Brings the database up once per process before the first request: migrations, then demo data.
import { BETTER_AUTH_SECRET, DATABASE_URL, DEMO_DATA, NOTICE_TICK_SECONDS } from 'astro:env/server';
import { demoWanted, refuseUnsafeStart } from '@/lib/server/deployment';
import { handle } from '@/db';
import { seedDemoIfEmpty } from './demo-seed';
import { startNoticeTimer } from './notices';
import './ready-notice-listener';

// A shared database without a session secret stops here, as the server loads (auth.ts, which says
// the same, now loads only at the first signed-in request).
refuseUnsafeStart({ DATABASE_URL, BETTER_AUTH_SECRET });

const holder = globalThis as typeof globalThis & { __cuffwrightReady?: Promise<void>; __cuffwrightStarted?: boolean };

async function start(): Promise<void> {
  const began = Date.now();
  // Under the start lock: two servers starting on one PostgreSQL neither migrate nor seed twice.
  const seeded = await handle.withStartLock(async () => {
    await handle.migrate();
    // The demo shop's password is in the README: only on the embedded database unless asked for.
    return demoWanted({ DATABASE_URL, DEMO_DATA }) ? await seedDemoIfEmpty() : false;
  });
  startNoticeTimer(NOTICE_TICK_SECONDS);
  holder.__cuffwrightStarted = true;
  console.log(`Database ready (${handle.kind}) in ${Date.now() - began} ms${seeded ? ', demo shop seeded' : ''}.`);
}

/** Resolves when the database is migrated and seeded; retried on the next request if it failed. */
export function ensureStarted(): Promise<void> {
  holder.__cuffwrightReady ??= start().catch((e) => {
    holder.__cuffwrightReady = undefined;
    throw e;
  });
  return holder.__cuffwrightReady;
}

/** Whether this process has finished its start-up work (migrations, the demo seed, the timers). */
export function startedUp(): boolean {
  return holder.__cuffwrightStarted === true;
}
