// Builds the app once into .test-dist/ and serves it on a free loopback port with a fresh data
// folder (the demo shop is seeded on first start) and the local mail capture; every browser story
// and HTTP test reaches it through inject('baseURL'), and reads captured mail in inject('mailDir').
import { spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer } from 'node:net';
import { randomBytes } from 'node:crypto';
import type { TestProject } from 'vitest/node';
import { buildIfNeeded } from '../../scripts/build-if-needed.mjs';
import { startMailCapture } from '../../scripts/mail-capture.mjs';
import { startLocalPayments } from '../../scripts/payments-fake.mjs';
import { startLocalSms } from '../../scripts/sms-fake.mjs';
import { createServerDatabase } from '../db/server-database';
import { serverNodeFlags } from '../../scripts/env.mjs';
import { startBrowserServer } from './chromium-server';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
    dataDir: string;
    mailDir: string;
    paymentsEnv: { PAYMENTS_API_KEY: string; PAYMENTS_API_BASE: string; PAYMENTS_WEBHOOK_SECRET: string };
    /** the local SMS fake: its address (GET /messages lists what it was asked to send) and the app's SMS_* settings */
    smsBase: string;
    smsEnv: { SMS_ACCOUNT_SID: string; SMS_AUTH_TOKEN: string; SMS_FROM: string; SMS_API_BASE: string };
    /** the run's Chromium, which the test files connect to (tests/browser/browser.ts) */
    browserEndpoint: string;
    /** the server process's pid (its command line is checked in tests/http/server-heap.spec.ts) */
    serverPid: number;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      srv.close(() => (typeof addr === 'object' && addr ? resolve(addr.port) : reject(new Error('no port'))));
    });
  });
}

async function waitFor(url: string, ms: number): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      const r = await fetch(url);
      if (r.status < 500) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server at ${url} did not answer within ${ms} ms`);
}

let server: ChildProcess | undefined;
let dataDir = '';

/** Starts the built server for the browser stories. */
export default async function setup(project: TestProject) {
  // TEST_DIST_DIR lets two test runs on one machine build side by side without clashing.
  const outDir = process.env.TEST_DIST_DIR || '.test-dist';
  buildIfNeeded(outDir);
  const port = await freePort();
  dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-browser-'));
  const baseURL = `http://localhost:${port}`;
  const mailDir = join(dataDir, 'mail');
  // With TEST_DATABASE_URL (scripts/with-postgres.sh) the server runs on a fresh PostgreSQL database.
  const databaseUrl = process.env.TEST_DATABASE_URL
    ? await createServerDatabase(process.env.TEST_DATABASE_URL, `cw_http_${Date.now().toString(36)}`)
    : undefined;
  const capture = await startMailCapture({ dir: mailDir, port: 0, quiet: true });
  const payments = await startLocalPayments({ appUrl: `http://127.0.0.1:${port}`, port: 0, quiet: true });
  const sms = await startLocalSms({ port: 0, quiet: true });
  // With the heap npm start gives it (scripts/env.mjs), so the stories run the server as shipped.
  server = spawn('node', [...serverNodeFlags(), `${outDir}/server/entry.mjs`], {
    env: {
      ...process.env,
      // As npm start and npm run serve run it: vitest passes NODE_ENV=test on, and with it the
      // server and its sheet workers would load React's development build.
      NODE_ENV: 'production',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATA_DIR: dataDir,
      BETTER_AUTH_URL: baseURL,
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(capture.port),
      MAIL_CAPTURE_DIR: mailDir,
      ...payments.env,
      ...sms.env,
      // The notice timer ticks fast so automatic ready notices and retries show within a test.
      NOTICE_TICK_SECONDS: '1',
      // As behind one reverse proxy: tests give each would-be client its own X-Forwarded-For address,
      // so the per-address limits of one test do not fall on the others (all come from loopback).
      TRUSTED_PROXY_HOPS: '1',
      // A stalled upload is answered 408 after this long (tests/http/input-limits.spec.ts waits for it).
      BODY_IDLE_SECONDS: '3',
      // The stories sign in as the demo shop's people: asked for explicitly, as it is off by
      // default on PostgreSQL, which also needs a session secret from the environment.
      DEMO_DATA: 'on',
      // Anonymous cut sheets say which thread drew them (X-Rendered-By), for tests/http/limits.spec.ts.
      SHEET_RENDER_TRACE: 'true',
      ...(databaseUrl ? { DATABASE_URL: databaseUrl, BETTER_AUTH_SECRET: randomBytes(32).toString('base64url') } : {}),
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  await waitFor(`${baseURL}/`, 60_000);
  project.provide('baseURL', baseURL);
  project.provide('dataDir', dataDir);
  project.provide('mailDir', mailDir);
  project.provide('paymentsEnv', payments.env);
  project.provide('smsBase', sms.base);
  project.provide('smsEnv', sms.env);
  project.provide('serverPid', server.pid ?? 0);
  const chromium = await startBrowserServer();
  project.provide('browserEndpoint', chromium.wsEndpoint());
  return async () => {
    await chromium.close();
    // The data folder goes once the server has let go of it: wait for its exit, not a fixed time.
    const exited = server && server.exitCode === null && server.signalCode === null ? once(server, 'exit') : Promise.resolve();
    server?.kill('SIGTERM');
    await capture.close();
    await payments.close();
    await sms.close();
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000).unref())]);
    rmSync(dataDir, { recursive: true, force: true });
  };
}
