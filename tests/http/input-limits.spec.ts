// What the server does with input it cannot keep: too-large bodies are refused before they are read
// whole (413 JSON), a body that stops arriving is answered (408 JSON), a NUL or a lone surrogate
// is 422 naming the field with nothing written, and an id that cannot be one is 404 before any query.
import { connect } from 'node:net';
import { beforeAll, describe, expect, it, inject } from 'vitest';
import { call, DEMO, signIn } from './client';
import { someGarment } from './photo-upload';

let lead = '';

beforeAll(async () => {
  lead = await signIn(DEMO.lead);
});

/** Posts `bytes` of JSON-ish filler, optionally as a chunked stream with no Content-Length. */
async function postBig(path: string, bytes: number, opts: { cookie?: string; chunked?: boolean } = {}) {
  const base = inject('baseURL');
  const filler = `{"kind":"cuff","unit":"in","cuffDepth":"${'x'.repeat(bytes)}"}`;
  const body = opts.chunked
    ? new ReadableStream<Uint8Array>({
        start(c) {
          const all = new TextEncoder().encode(filler);
          for (let i = 0; i < all.length; i += 16 * 1024) c.enqueue(all.slice(i, i + 16 * 1024));
          c.close();
        },
      })
    : filler;
  const headers: Record<string, string> = { 'content-type': 'application/json', origin: base };
  if (opts.cookie) headers.cookie = opts.cookie;
  let res: Response;
  try {
    res = await fetch(base + path, { method: 'POST', headers, body, duplex: 'half', redirect: 'manual' } as RequestInit);
  } catch (e) {
    throw new Error(`${path}: ${(e as Error).message} (${String((e as Error).cause)})`);
  }
  const text = await res.text();
  return { status: res.status, type: res.headers.get('content-type') ?? '', body: text };
}

/** Sends the raw request text over a socket and resolves with what the server answers (or '' on close). */
function rawExchange(raw: string, waitMs: number): Promise<string> {
  const url = new URL(inject('baseURL'));
  return new Promise((resolve, reject) => {
    const socket = connect(Number(url.port), '127.0.0.1');
    let got = '';
    const done = () => {
      clearTimeout(timer);
      socket.destroy();
      resolve(got);
    };
    const timer = setTimeout(done, waitMs);
    socket.on('data', (d) => {
      got += d.toString('latin1');
      if (/\r\n\r\n[\s\S]*\}/.test(got)) done();
    });
    socket.on('error', reject);
    socket.on('close', done);
    socket.write(raw);
  });
}

describe('bodies are capped before they are parsed', () => {
  it('a 1 MB plan signed out is 413 JSON, with or without Content-Length', async () => {
    for (const chunked of [false, true]) {
      const r = await postBig('/api/plan', 1024 * 1024, { chunked });
      expect(r.status, `chunked: ${chunked}`).toBe(413);
      expect(r.type).toContain('application/json');
      expect(JSON.parse(r.body).error).toMatch(/larger than 64 KB/);
    }
  });

  it('a 1 MB body to better-auth, the cut sheet, the webhook and a signed-in route is 413 JSON', async () => {
    for (const [path, cookie] of [
      ['/api/auth/sign-in/email', undefined],
      ['/api/plan/sheet', undefined],
      ['/api/payments/webhook', undefined],
      ['/api/tickets', lead],
    ] as const) {
      const r = await postBig(path, 1024 * 1024, { cookie, chunked: true });
      expect(r.status, path).toBe(413);
      expect(r.type, path).toContain('application/json');
    }
  });

  it('a body under the cap still works', async () => {
    const r = await call('POST', '/api/plan', { body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' } });
    expect(r.status).toBe(200);
  });
});

describe('a body that stops arriving', () => {
  it('an upload cut off halfway is answered 408 JSON (BODY_IDLE_SECONDS, 3 s in tests)', async () => {
    const garment = await someGarment(lead);
    const boundary = 'cuffwrightboundary';
    const part = `--${boundary}\r\nContent-Disposition: form-data; name="photos"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`;
    const head = [
      `POST /api/garments/${garment}/photos HTTP/1.1`,
      `Host: ${new URL(inject('baseURL')).host}`,
      `Origin: ${inject('baseURL')}`,
      `Cookie: ${lead}`,
      `Content-Type: multipart/form-data; boundary=${boundary}`,
      `Content-Length: 200000`,
      '',
      '',
    ].join('\r\n');
    const answer = await rawExchange(head + part + 'x'.repeat(1000), 30_000);
    expect(answer).toMatch(/^HTTP\/1\.1 408/);
    expect(answer).toMatch(/content-type: application\/json/i);
    expect(answer).toMatch(/stopped arriving/);
  });

  it('a JSON body cut off halfway is answered 408 JSON too', async () => {
    const head = [`POST /api/plan HTTP/1.1`, `Host: ${new URL(inject('baseURL')).host}`, `Content-Type: application/json`, `Content-Length: 5000`, '', ''].join(
      '\r\n',
    );
    const answer = await rawExchange(`${head}{"kind":"cuff",`, 30_000);
    expect(answer).toMatch(/^HTTP\/1\.1 408/);
  });
});

describe('text PostgreSQL cannot keep', () => {
  it('a NUL or a lone surrogate in a garment description is 422 naming the field, and nothing changes', async () => {
    const garment = await someGarment(lead);
    const before = await call('GET', `/api/garments/${garment}`, { cookie: lead });
    for (const bad of ['pair \u0000 one', 'pair \ud800']) {
      const r = await call('PATCH', `/api/garments/${garment}`, { cookie: lead, body: { description: bad } });
      expect(r.status, JSON.stringify(bad)).toBe(422);
      expect(Object.keys(r.body.issues)).toEqual(['description']);
    }
    const after = await call('GET', `/api/garments/${garment}`, { cookie: lead });
    expect(after.body.description ?? after.body.garment?.description).toBe(before.body.description ?? before.body.garment?.description);
  });

  it('a lone surrogate in a phone or a preset name is 422', async () => {
    const t = await call('POST', '/api/tickets', { cookie: lead, body: { customer: { name: 'Surrogate Test', phone: '555 \udbff' }, garments: [] } });
    expect(t.status).toBe(422);
    expect(Object.keys(t.body.issues)).toEqual(['customer.phone']);
    const p = await call('POST', '/api/presets', { cookie: lead, body: { name: 'cuff \udc00', settings: { finish: 'cuff', unit: 'in' } } });
    expect(p.status).toBe(422);
    expect(Object.keys(p.body.issues)).toEqual(['name']);
  });
});

describe('ids that cannot be ids', () => {
  it('a NUL in an invitation id is 404, signed out, on the API and the page', async () => {
    for (const path of ['/api/invitations/a%00b', '/invite/a%00b', `/api/invitations/${'a'.repeat(5000)}`]) {
      const r = await call('GET', path);
      expect(r.status, path).toBe(404);
    }
    // An encoded lone surrogate is not even a path Astro can decode: refused before the route.
    expect((await call('GET', '/api/invitations/%ED%A0%80')).status).toBe(400);
    const accept = await call('POST', '/api/invitations/a%00b/accept', { body: { name: 'N', password: 'a-long-password' } });
    expect(accept.status).toBe(404);
  });

  it('a NUL in a staff member id or a notice id is 404 for the lead', async () => {
    const r = await call('DELETE', '/api/staff/a%00b', { cookie: lead });
    expect(r.status).toBe(404);
    const tickets = await call('GET', '/api/tickets', { cookie: lead });
    const ticket = tickets.body[0]?.id ?? tickets.body.tickets?.[0]?.id;
    const n = await call('POST', `/api/tickets/${ticket}/notices/a%00b/retry`, { cookie: lead });
    expect(n.status).toBe(404);
  });
});

describe("better-auth's own routes", () => {
  it('refuse a NUL or a lone surrogate in a field or the query with 422 JSON naming it, signed in or out', async () => {
    const lead2 = await signIn(DEMO.lead);
    const before = (await call('GET', '/api/me', { cookie: lead2 })).body.name;
    for (const bad of ['a\u0000b', 'pair \ud800']) {
      const rename = await call('POST', '/api/auth/update-user', { cookie: lead2, body: { name: bad } });
      expect(rename.status, JSON.stringify(bad)).toBe(422);
      expect(Object.keys(rename.body.issues)).toEqual(['name']);
      const signInAs = await call('POST', '/api/auth/sign-in/email', { body: { email: `x${bad}@example.com`, password: 'whatever-it-is' } });
      expect(signInAs.status).toBeGreaterThanOrEqual(400);
      expect(signInAs.status).toBeLessThan(500);
    }
    const verify = await call('GET', '/api/auth/verify-email?token=a%00b');
    expect(verify.status).toBe(422);
    expect((await call('GET', '/api/me', { cookie: lead2 })).body.name).toBe(before);
  });
});
