// Limits kept in the database, against the built server: password-reset mail per requested address
// and per client address, and anonymous cut sheets per client address (members are not limited),
// drawn in the sheet worker, off the thread serving members.
// Each test speaks from its own invented address (X-Forwarded-For; the test server trusts one hop).
import { describe, expect, inject, it } from 'vitest';
import { flatText, pageInfo, pdfFile } from '../lib/cut-sheet/poppler';
import { call, DEMO, freshEmail, newShop, signIn } from './client';

const reset = (email: string, from: string) => call('POST', '/api/auth/request-password-reset', { from, body: { email, redirectTo: '/reset' } });

describe('password-reset mail', () => {
  it('goes to one address at most 3 times an hour, whoever asks', async () => {
    const shop = await newShop('Reset Flood Hems');
    for (let i = 0; i < 3; i += 1) expect((await reset(shop.email, `198.51.100.${100 + i}`)).status).toBe(200);
    const refused = await reset(shop.email.toUpperCase(), '198.51.100.110');
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(refused.body.error).toMatch(/Too many password-reset requests/);
  });

  it('is asked for at most 10 times an hour from one client address', async () => {
    const from = '203.0.113.70';
    for (let i = 0; i < 10; i += 1) expect((await reset(freshEmail('nobody-reset'), from)).status).toBe(200);
    const refused = await reset(freshEmail('nobody-reset'), from);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    // Another address still may.
    expect((await reset(freshEmail('nobody-reset'), '203.0.113.71')).status).toBe(200);
  });
});

describe('anonymous cut sheets', () => {
  const plan = { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: '5' };

  it('answer 429 with Retry-After and JSON past 30 from one address; a signed-in member there is not limited', async () => {
    const from = '203.0.113.80';
    for (let i = 0; i < 30; i += 1) {
      const r = await call('POST', '/api/plan/sheet', { from, body: plan });
      expect(r.status).toBe(200);
    }
    const refused = await call('POST', '/api/plan/sheet', { from, body: plan });
    expect(refused.status).toBe(429);
    expect(refused.headers.get('content-type')).toMatch(/application\/json/);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(refused.body.error).toMatch(/sign in/i);
    const member = await signIn(DEMO.tailor);
    const signedIn = await call('POST', '/api/plan/sheet', { from, cookie: member, body: plan });
    expect(signedIn.status).toBe(200);
    expect(signedIn.headers.get('content-type')).toBe('application/pdf');
    // Another anonymous address still prints.
    expect((await call('POST', '/api/plan/sheet', { from: '203.0.113.81', body: plan })).status).toBe(200);
  });

  it('print for a stranger carrying an old session cookie (not a member) as for anyone signed out', async () => {
    const r = await call('POST', '/api/plan/sheet', { from: '203.0.113.82', cookie: 'better-auth.session_token=long-gone.signature', body: plan });
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toBe('application/pdf');
  });

  // The test server sets SHEET_RENDER_TRACE, so each sheet answers which thread drew it.
  async function sheet(plan: object, opts: { from: string; cookie?: string }) {
    const res = await fetch(`${inject('baseURL')}/api/plan/sheet`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: inject('baseURL'), 'x-forwarded-for': opts.from, ...(opts.cookie ? { cookie: opts.cookie } : {}) },
      body: JSON.stringify(plan),
    });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    return { by: res.headers.get('x-rendered-by'), file: pdfFile(new Uint8Array(await res.arrayBuffer())) };
  }

  it("are drawn in the sheet pool, not on the thread serving members, the same as a member's", async () => {
    const mm = { kind: 'cuff', unit: 'mm', cuffDepth: 40, available: 150, pageSize: 'A4' };
    const strangers = await Promise.all(['203.0.113.83', '203.0.113.84', '203.0.113.85'].map((from) => sheet(mm, { from })));
    expect(strangers.map((s) => s.by)).toEqual(['worker', 'worker', 'worker']);
    const member = await sheet(mm, { from: '203.0.113.86', cookie: await signIn(DEMO.tailor) });
    expect(member.by).toBe('worker');
    for (const s of strangers) {
      expect(pageInfo(s.file)).toEqual(pageInfo(member.file));
      expect(flatText(s.file)).toBe(flatText(member.file));
    }
    // TRADE.md: three cuff depths, 3 × 40 = 120 mm.
    expect(flatText(strangers[0]!.file)).toContain('120 mm');
  });
});
