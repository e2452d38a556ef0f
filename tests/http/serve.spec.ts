// `npm run serve`, the production start: settings checked first (one line per problem, exit 1);
// one JSON log line per request naming route, status and time; on SIGTERM the request in flight
// is finished and answered, new connections are refused, and the process exits 0.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { request } from 'node:http';
import { once } from 'node:events';
import { connect, createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { serveProblems } from '../../scripts/serve-settings.mjs';

const dist = process.env.TEST_DIST_DIR || '.test-dist';
const cleanups: (() => void)[] = [];
afterEach(() => {
  for (const c of cleanups.splice(0)) c();
});

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

/** Starts `node scripts/serve.mjs` with the test build; collects its output. */
function serve(env: Record<string, string | undefined>): { child: ChildProcess; out: () => string; exited: Promise<number | null> } {
  let out = '';
  const base = {
    ...process.env,
    DIST_DIR: dist,
    MAIL_CAPTURE_DIR: '/tmp/never-used',
    SMTP_HOST: undefined,
    BETTER_AUTH_URL: undefined,
    DATABASE_URL: undefined,
  };
  const child = spawn(process.execPath, ['scripts/serve.mjs'], { env: { ...base, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const exited = new Promise<number | null>((r) => child.on('exit', (code) => r(code)));
  cleanups.push(() => child.kill('SIGKILL'));
  return { child, out: () => out, exited };
}

/** `npm run serve` on a free port with a fresh data folder, once it answers its health check. */
async function serving() {
  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-serve-'));
  cleanups.push(() => rmSync(dataDir, { recursive: true, force: true }));
  const base = `http://127.0.0.1:${port}`;
  const s = serve({ PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, BETTER_AUTH_URL: base, SMTP_HOST: 'mail.invalid', DEMO_DATA: 'off' });
  for (let i = 0; ; i += 1) {
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.status === 200,
      () => false,
    );
    if (ok) break;
    if (i > 1800) throw new Error(`serve did not answer: ${s.out()}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return { port, base, s };
}

describe('npm run serve', () => {
  it('names every missing or unsafe setting on its own line and does not start', async () => {
    const s = serve({
      DATABASE_URL: 'postgres://x@127.0.0.1:1/x',
      SMTP_HOST: '127.0.0.1',
      STORAGE: 's3',
      PAYMENTS_API_BASE: 'http://127.0.0.1:9',
      SMS_ACCOUNT_SID: 'AC0',
      SMS_API_BASE: 'http://127.0.0.1:9',
    });
    expect(await s.exited).toBe(1);
    const lines = s.out();
    for (const setting of ['BETTER_AUTH_URL', 'BETTER_AUTH_SECRET', 'SMTP_HOST', 'S3_BUCKET', 'PAYMENTS_API_BASE', 'SMS_AUTH_TOKEN', 'SMS_API_BASE'])
      expect(lines).toMatch(new RegExp(`^  ${setting}: `, 'm'));
    expect(serveProblems({ BETTER_AUTH_URL: 'https://shop.example.com', SMTP_HOST: 'mail.example.com' })).toEqual([]);
  });

  it('logs each request as one JSON line, and on SIGTERM finishes the request in flight before exiting 0', async () => {
    const { base, s } = await serving();
    // A calculator request whose body is half sent when the signal arrives.
    const body = JSON.stringify({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: '5' });
    const answered = new Promise<{ status: number; text: string }>((resolve, reject) => {
      const req = request(
        `${base}/api/plan`,
        { method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } },
        (res) => {
          let text = '';
          res.on('data', (d) => (text += d));
          res.on('end', () => resolve({ status: res.statusCode!, text }));
        },
      );
      req.on('error', reject);
      req.write(body.slice(0, 10));
      setTimeout(() => {
        s.child.kill('SIGTERM');
        setTimeout(() => req.end(body.slice(10)), 500);
      }, 300);
    });
    const r = await answered;
    expect(r.status).toBe(200);
    expect(JSON.parse(r.text).error).toBeUndefined();
    expect(await s.exited).toBe(0);
    await expect(fetch(`${base}/api/health`)).rejects.toThrow();
    const lines = s
      .out()
      .split('\n')
      .filter((l) => l.startsWith('{'))
      .map((l) => JSON.parse(l) as { msg: string; route?: string; status?: number; ms?: number; shop?: string | null });
    const plan = lines.find((l) => l.msg === 'request' && l.route === '/api/plan');
    expect(plan).toMatchObject({ status: 200, shop: null });
    expect(typeof plan!.ms).toBe('number');
    expect(lines.some((l) => l.msg === 'request' && l.route === '/api/health' && l.status === 200)).toBe(true);
  }, 240_000);

  it('logs nothing for a calculator request whose client left before it was read (a cancelled fetch), and answers the next', async () => {
    const { port, base, s } = await serving();
    const body = JSON.stringify({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' });
    // Sent whole and the connection closed with it, 50 at once, as the calculator cancels plans it
    // no longer needs: a fifth to a half of these reach the app with their request already gone.
    for (let i = 0; i < 50; i += 1) {
      const socket = connect(port, '127.0.0.1');
      socket.on('error', () => {});
      await once(socket, 'connect');
      socket.end(
        `POST /api/plan HTTP/1.1\r\nHost: 127.0.0.1:${port}\r\nContent-Type: application/json\r\nContent-Length: ${Buffer.byteLength(body)}\r\n\r\n${body}`,
      );
    }
    // Behind the cancelled ones on the same server, so their handling is over when it is answered.
    const next = await fetch(`${base}/api/plan`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
    expect(next.status).toBe(200);
    expect((await next.json()).lines.length).toBeGreaterThan(0);
    const errors = s
      .out()
      .split('\n')
      .filter((l) => /Could not render|Internal Server Error|"level":50/.test(l));
    expect(errors).toEqual([]);
  }, 240_000);
});
