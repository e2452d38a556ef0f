// Two app servers on one PostgreSQL and one object store (the s3rver fake), as a chain of shops
// runs them: a session made on A works on B; failed sign-ins on A and B add up to one lock; a photo
// uploaded through A is served by B and deleted everywhere; a move on A is seen on B and two moves
// racing on A and B give one step; a due notice is sent once while both run; and a notice whose
// server is killed (SIGKILL) mid-send is sent once by the other. Runs where TEST_DATABASE_URL names
// a PostgreSQL server (CI's PostgreSQL run: scripts/with-postgres.sh).
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes, randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type DbHandle } from '@/db/open';
import { customers, garments, notices, organization, tickets, user } from '@/db/schema';
import { createServerDatabase, dropServerDatabase } from '../db/server-database';
import { DEMO, DEMO_PASSWORD } from './client';
import { sampleJpeg } from './photo-upload';
import { startMailCapture } from '../../scripts/mail-capture.mjs';
import { startS3Fake } from '../../scripts/s3-fake.mjs';

const serverUrl = process.env.TEST_DATABASE_URL;
const dist = process.env.TEST_DIST_DIR || '.test-dist';
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const LEASE_SECONDS = 4;

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

interface App {
  name: string;
  base: string;
  child: ChildProcess;
  exited: Promise<void>;
}

const cleanups: (() => Promise<void> | void)[] = [];
let dbName = '';
let url = '';
let handle: DbHandle;
const secret = randomBytes(32).toString('base64url');
let s3: { env: Record<string, string>; close: () => Promise<void> };
const mailDirs = { A: '', B: '' };
const smtpPorts = { A: 0, B: 0 };
const apps: Record<'A' | 'B', App> = {} as Record<'A' | 'B', App>;

async function startApp(name: 'A' | 'B', smtpPort: number): Promise<App> {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [`${dist}/server/entry.mjs`], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATABASE_URL: url,
      BETTER_AUTH_SECRET: secret,
      BETTER_AUTH_URL: base,
      DEMO_DATA: 'on',
      DATA_DIR: mkdtempSync(join(tmpdir(), `cw-pair-${name}-`)),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      MAIL_CAPTURE_DIR: undefined,
      NOTICE_TICK_SECONDS: '1',
      NOTICE_LEASE_SECONDS: String(LEASE_SECONDS),
      ...s3.env,
    },
  });
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  // Health turns 200 once start-up (migrations, then the demo seed under the same start lock) is
  // done, the moment the server also logs its "Database ready" line.
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  for (let i = 0; ; i += 1) {
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.status === 200,
      () => false,
    );
    if (ok && out.includes('Database ready')) break;
    if (i > 1800) throw new Error(`server ${name} did not come up`);
    await sleep(100);
  }
  return { name, base, child, exited };
}

async function stopApp(app: App, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (app.child.exitCode !== null || app.child.signalCode !== null) return;
  app.child.kill(signal);
  await app.exited;
}

/** One JSON call to a server; the answer's status and parsed body. */
async function call(app: App, method: string, path: string, opts: { cookie?: string; body?: unknown; headers?: Record<string, string> } = {}) {
  const headers: Record<string, string> = { origin: app.base, ...opts.headers };
  if (opts.cookie) headers.cookie = opts.cookie;
  if (opts.body !== undefined) headers['content-type'] = 'application/json';
  const res = await fetch(`${app.base}${path}`, { method, headers, body: opts.body === undefined ? undefined : JSON.stringify(opts.body), redirect: 'manual' });
  const text = await res.text();
  let body: any = text;
  try {
    body = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, body, headers: res.headers };
}

async function signIn(app: App, email: string, password = DEMO_PASSWORD) {
  return call(app, 'POST', '/api/auth/sign-in/email', { body: { email, password } });
}

const cookieOf = (headers: Headers) =>
  headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');

/** The demo shop's id. */
async function demoShop(): Promise<string> {
  const [row] = await handle.db.select({ id: organization.id }).from(organization).where(eq(organization.slug, 'pinmark-hem'));
  return row!.id;
}

/** A fresh ticket of the demo shop with one garment at `status`, straight in the database. */
async function freshGarment(status: (typeof garments.$inferInsert)['status'] = 'received', email: string | null = null) {
  const shopId = await demoShop();
  const [c] = await handle.db.insert(customers).values({ shopId, name: 'Odile Pairweather', email }).returning();
  const number = 50_000 + Math.floor(Math.random() * 40_000);
  const [t] = await handle.db
    .insert(tickets)
    .values({ shopId, number, customerId: c!.id, status: status === 'ready' ? 'ready' : 'received' })
    .returning();
  const [g] = await handle.db
    .insert(garments)
    .values({ shopId, ticketId: t!.id, description: 'Grey flannel', finish: 'cuff', position: 0, status })
    .returning();
  return { shopId, ticketId: t!.id, garmentId: g!.id, customerId: c!.id };
}

/** Messages a capture folder holds for one recipient. */
function mailsTo(dir: string, to: string): { subject: string }[] {
  return readdirSync(dir)
    .filter((n) => n.endsWith('.json'))
    .map((n) => JSON.parse(readFileSync(join(dir, n), 'utf8')) as { to: string[]; subject: string })
    .filter((m) => m.to.includes(to));
}

describe.skipIf(!serverUrl)('two app servers on one PostgreSQL', () => {
  beforeAll(async () => {
    dbName = `cw_pair_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    url = await createServerDatabase(serverUrl!, dbName);
    cleanups.push(() => dropServerDatabase(serverUrl!, dbName));
    s3 = await startS3Fake({ dir: mkdtempSync(join(tmpdir(), 'cw-pair-s3-')) });
    cleanups.push(() => s3.close());
    for (const n of ['A', 'B'] as const) {
      mailDirs[n] = mkdtempSync(join(tmpdir(), `cw-pair-mail-${n}-`));
      const cap = await startMailCapture({ dir: mailDirs[n], port: 0, quiet: true });
      smtpPorts[n] = cap.port;
      cleanups.push(() => cap.close());
    }
    // Both start together: migrations and the demo seed run once, under the start lock.
    [apps.A, apps.B] = await Promise.all([startApp('A', smtpPorts.A), startApp('B', smtpPorts.B)]);
    handle = await openDatabase({ url });
    cleanups.push(() => handle.close());
  }, 300_000);

  afterAll(async () => {
    for (const app of Object.values(apps)) if (app) await stopApp(app);
    for (const c of cleanups.splice(0).reverse()) await c();
  }, 60_000);

  it('seeded the demo shop once although both servers started together', async () => {
    expect(await handle.db.select({ id: organization.id }).from(organization).where(eq(organization.slug, 'pinmark-hem'))).toHaveLength(1);
    expect(await handle.db.select({ id: user.id }).from(user).where(eq(user.email, DEMO.lead))).toHaveLength(1);
  });

  it('a session made on A works on B, and signing out on B ends it on A', async () => {
    const r = await signIn(apps.A, DEMO.lead);
    expect(r.status).toBe(200);
    const cookie = cookieOf(r.headers);
    expect((await call(apps.B, 'GET', '/api/me', { cookie })).body).toMatchObject({ email: DEMO.lead, role: 'lead' });
    expect((await call(apps.B, 'POST', '/api/auth/sign-out', { cookie, body: {} })).status).toBe(200);
    expect((await call(apps.A, 'GET', '/api/me', { cookie })).status).toBe(401);
  });

  it('failed sign-ins on A and B add up to one lock', async () => {
    // SIGN_IN_RULES.pair in src/services/sign-in-limit.ts: five free tries per account from one address.
    const free = 5;
    const statuses: number[] = [];
    for (let i = 0; i < free + 1; i += 1) statuses.push((await signIn(i % 2 ? apps.B : apps.A, DEMO.tailor, 'not-the-password')).status);
    expect(statuses.slice(0, free).every((s) => s === 401)).toBe(true);
    expect(statuses[free]).toBe(429);
    // The right password on the other server is held back too, until the wait is over.
    expect((await signIn(apps.B, DEMO.tailor)).status).toBe(429);
  });

  it('a photo uploaded through A is served by B, and deleted through B is gone from A and the store', async () => {
    const cookie = cookieOf((await signIn(apps.A, DEMO.lead)).headers);
    const { garmentId } = await freshGarment();
    const form = new FormData();
    form.append('photos', new Blob([(await sampleJpeg(320, 240)) as BlobPart], { type: 'image/jpeg' }), 'pair.jpg');
    const up = await fetch(`${apps.A.base}/api/garments/${garmentId}/photos`, { method: 'POST', headers: { origin: apps.A.base, cookie }, body: form });
    expect(up.status).toBe(201);
    const [photo] = (await up.json()) as { id: string }[];
    const onB = await fetch(`${apps.B.base}/api/photos/${photo!.id}`, { headers: { cookie } });
    expect(onB.status).toBe(200);
    expect(onB.headers.get('content-type')).toMatch(/^image\//);
    expect((await onB.arrayBuffer()).byteLength).toBeGreaterThan(100);
    expect((await fetch(`${apps.B.base}/api/photos/${photo!.id}/thumb`, { headers: { cookie } })).status).toBe(200);
    expect((await call(apps.B, 'DELETE', `/api/photos/${photo!.id}`, { cookie })).status).toBeLessThan(300);
    expect((await fetch(`${apps.A.base}/api/photos/${photo!.id}`, { headers: { cookie } })).status).toBe(404);
    // Nothing of the shop's photos is left in the bucket.
    const { S3Client, ListObjectsV2Command } = await import('@aws-sdk/client-s3');
    const client = new S3Client({
      region: 'us-east-1',
      endpoint: s3.env.S3_ENDPOINT,
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    });
    const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.env.S3_BUCKET }));
    expect((listed.Contents ?? []).map((o) => o.Key)).toEqual([]);
  });

  it('a garment moved on A is seen moved on B; two moves racing on A and B give one step', async () => {
    const cookie = cookieOf((await signIn(apps.A, DEMO.lead)).headers);
    const { garmentId } = await freshGarment('received');
    expect((await call(apps.A, 'POST', `/api/garments/${garmentId}/step`, { cookie, body: { to: 'marked' } })).status).toBe(200);
    expect((await call(apps.B, 'GET', `/api/garments/${garmentId}`, { cookie })).body).toMatchObject({ status: 'marked' });
    const raced = await Promise.all([
      call(apps.A, 'POST', `/api/garments/${garmentId}/step`, { cookie, body: { to: 'cut' } }),
      call(apps.B, 'POST', `/api/garments/${garmentId}/step`, { cookie, body: { to: 'cut' } }),
    ]);
    // One wins; the other is refused: 409 when it raced the same row, 422 when it saw the step already taken.
    const statuses = raced.map((r) => r.status).sort();
    expect(statuses[0]).toBe(200);
    expect([409, 422]).toContain(statuses[1]);
    const [row] = await handle.db.select({ status: garments.status }).from(garments).where(eq(garments.id, garmentId));
    expect(row!.status).toBe('cut');
  });

  it('the queue kept on B is not answered after a move on A, nor after a write straight into the database', async () => {
    const cookie = cookieOf((await signIn(apps.A, DEMO.lead)).headers);
    const { garmentId, customerId } = await freshGarment('received');
    const read = (app: App, etag?: string) => call(app, 'GET', '/api/garments', { cookie, headers: etag ? { 'if-none-match': etag } : {} });
    const first = await read(apps.B);
    expect(first.body.find((r: { id: string }) => r.id === garmentId)).toMatchObject({ status: 'received' });
    const etag = first.headers.get('etag')!;
    // Unchanged: both servers answer 304 to B's ETag (the version is the database's, not one server's).
    expect((await read(apps.B, etag)).status).toBe(304);
    expect((await read(apps.A, etag)).status).toBe(304);
    expect((await call(apps.A, 'POST', `/api/garments/${garmentId}/step`, { cookie, body: { to: 'marked' } })).status).toBe(200);
    const after = await read(apps.B, etag);
    expect(after.status).toBe(200);
    expect(after.body.find((r: { id: string }) => r.id === garmentId)).toMatchObject({ status: 'marked' });
    // A script or another program writing the database: B sees it on its next read too.
    await handle.db.update(customers).set({ name: 'Odile Renamed' }).where(eq(customers.id, customerId));
    const renamed = await read(apps.B, after.headers.get('etag')!);
    expect(renamed.status).toBe(200);
    expect(renamed.body.find((r: { id: string }) => r.id === garmentId)).toMatchObject({ customerName: 'Odile Renamed' });
  });

  it('a notice falling due while both servers run is sent exactly once', async () => {
    const to = 'odile.due@example.com';
    const { shopId, ticketId } = await freshGarment('ready', to);
    await handle.db.insert(notices).values({
      shopId,
      ticketId,
      kind: 'ready',
      to,
      subject: 'Ready to collect',
      body: 'Ready.',
      status: 'failed',
      attempts: 1,
      nextAttemptAt: new Date(Date.now() + 1500),
    });
    for (let i = 0; i < 200; i += 1) {
      const [n] = await handle.db.select({ status: notices.status }).from(notices).where(eq(notices.ticketId, ticketId));
      if (n!.status === 'sent') break;
      await sleep(100);
    }
    // Both timers tick every second: give them several more ticks to send it twice, if they could.
    await sleep(3000);
    expect(mailsTo(mailDirs.A, to).length + mailsTo(mailDirs.B, to).length).toBe(1);
  });

  it('a notice whose server is killed mid-send is sent once, by the other server', async () => {
    // A restarted with a mail server that accepts the connection and never answers: A's send hangs.
    const stall: Server = createServer(() => {}).listen(0, '127.0.0.1');
    await new Promise((r) => stall.once('listening', r));
    cleanups.push(() => new Promise<void>((r) => stall.close(() => r())));
    await stopApp(apps.A);
    apps.A = await startApp('A', (stall.address() as { port: number }).port);
    const counter = cookieOf((await signIn(apps.A, DEMO.counter)).headers);
    const to = 'odile.killed@example.com';
    const { ticketId } = await freshGarment('ready', to);
    void call(apps.A, 'POST', `/api/tickets/${ticketId}/notices`, { cookie: counter, body: { kind: 'ready' } }).catch(() => {});
    // Wait until A has claimed the send (attempts 1, not sent), then kill it.
    for (let i = 0; ; i += 1) {
      const [n] = await handle.db
        .select()
        .from(notices)
        .where(and(eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')));
      if (n && n.attempts === 1) break;
      if (i > 300) throw new Error('A never claimed the notice');
      await sleep(50);
    }
    await stopApp(apps.A, 'SIGKILL');
    for (let i = 0; i < 300; i += 1) {
      const [n] = await handle.db.select({ status: notices.status }).from(notices).where(eq(notices.ticketId, ticketId));
      if (n!.status === 'sent') break;
      await sleep(100);
    }
    const [n] = await handle.db.select().from(notices).where(eq(notices.ticketId, ticketId));
    expect([n!.status, n!.attempts]).toEqual(['sent', 2]);
    await sleep(2500);
    expect(mailsTo(mailDirs.B, to)).toHaveLength(1);
    apps.A = await startApp('A', smtpPorts.A);
  }, 120_000);
});
