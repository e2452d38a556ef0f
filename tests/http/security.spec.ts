// Session cookie flags, cross-site writes refused, repeated failed sign-ins limited, and pages
// that send signed-out visitors to sign-in.
import { beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { call, cookieFrom, DEMO, DEMO_PASSWORD, newShop, signIn } from './client';

let lead = '';
beforeAll(async () => {
  lead = await signIn(DEMO.lead);
});

describe('session cookie', () => {
  it('is HttpOnly, SameSite=Lax and scoped to the whole site', async () => {
    const r = await call('POST', '/api/auth/sign-in/email', { body: { email: DEMO.tailor, password: DEMO_PASSWORD } });
    expect(r.status).toBe(200);
    const session = r.headers.getSetCookie().find((c) => c.startsWith('better-auth.session_token='));
    expect(session).toBeDefined();
    expect(session).toMatch(/;\s*HttpOnly/i);
    expect(session).toMatch(/;\s*SameSite=Lax/i);
    expect(session).toMatch(/;\s*Path=\//);
  });
});

describe('cross-site writes', () => {
  it('refuses a JSON POST from another origin even with a valid session, and writes nothing', async () => {
    const r = await call('POST', '/api/customers', { cookie: lead, origin: 'http://evil.example', body: { name: 'Cross Site Carl' } });
    expect(r.status).toBe(403);
    const list = await call('GET', '/api/customers', { cookie: lead });
    expect(list.body.map((c: { name: string }) => c.name)).not.toContain('Cross Site Carl');
  });

  it('refuses a cookie-carrying POST without any Origin', async () => {
    const r = await call('POST', '/api/customers', { cookie: lead, origin: null, body: { name: 'No Origin Nora' } });
    expect(r.status).toBe(403);
  });

  it('refuses a cross-site form POST to sign-out, keeping the session', async () => {
    const res = await fetch(`${inject('baseURL')}/sign-out`, {
      method: 'POST',
      headers: { cookie: lead, origin: 'http://evil.example', 'content-type': 'application/x-www-form-urlencoded' },
      body: '',
      redirect: 'manual',
    });
    expect(res.status).toBe(403);
    expect((await call('GET', '/api/me', { cookie: lead })).status).toBe(200);
  });

  it('refuses a cross-site POST to better-auth itself', async () => {
    const r = await call('POST', '/api/auth/sign-in/email', { origin: 'http://evil.example', body: { email: DEMO.lead, password: DEMO_PASSWORD } });
    expect(r.status).toBe(403);
    expect(r.headers.getSetCookie()).toEqual([]);
  });
});

describe('failed sign-ins', () => {
  // Each test signs in from its own invented address (X-Forwarded-For; the test server trusts one hop).
  const wrong = (email: string, from: string, i: number) => call('POST', '/api/auth/sign-in/email', { from, body: { email, password: `wrong-${i}-password` } });

  it('after 5 wrong passwords from one address, that address answers 429 for the account, even to the right one; others are unaffected', async () => {
    const shop = await newShop('Rate Limit Hems');
    const from = '198.51.100.11';
    for (let i = 0; i < 5; i += 1) expect((await wrong(shop.email, from, i)).status).toBe(401);
    const blocked = await call('POST', '/api/auth/sign-in/email', { from, body: { email: shop.email, password: 'a-long-password' } });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(blocked.body.error).toMatch(/Too many failed sign-ins/);
    expect(cookieFrom(blocked.headers)).toBe('');
    // The same address in capitals is the same account.
    const shouted = await call('POST', '/api/auth/sign-in/email', { from, body: { email: shop.email.toUpperCase(), password: 'a-long-password' } });
    expect(shouted.status).toBe(429);
    expect(await signIn(DEMO.counter)).toContain('better-auth.session_token=');
  });

  it('counts form-encoded wrong passwords like JSON ones, and refuses the sixth whatever its encoding', async () => {
    const shop = await newShop('Form Guess Hems');
    const from = '198.51.100.12';
    for (let i = 0; i < 5; i += 1) {
      const r = await call('POST', '/api/auth/sign-in/email', { from, form: { email: shop.email, password: `wrong-${i}-password` } });
      expect(r.status).toBe(401);
    }
    const form = await call('POST', '/api/auth/sign-in/email', { from, form: { email: shop.email, password: 'a-long-password' } });
    expect(form.status).toBe(429);
    expect(form.body.error).toMatch(/Too many failed sign-ins/);
    expect(cookieFrom(form.headers)).toBe('');
    const asJson = await call('POST', '/api/auth/sign-in/email', { from, body: { email: shop.email, password: 'a-long-password' } });
    expect(asJson.status).toBe(429);
  });

  it("an attacker's failures from another address do not keep the owner out of their account", async () => {
    const shop = await newShop('Owner Still In Hems');
    const attacker = '203.0.113.50';
    for (let i = 0; i < 5; i += 1) expect((await wrong(shop.email, attacker, i)).status).toBe(401);
    expect((await wrong(shop.email, attacker, 5)).status).toBe(429);
    const owner = await call('POST', '/api/auth/sign-in/email', { from: '198.51.100.77', body: { email: shop.email, password: 'a-long-password' } });
    expect(owner.status).toBe(200);
    expect(cookieFrom(owner.headers)).toContain('better-auth.session_token=');
  });

  it('one address guessing across many accounts is refused after 30 failures, for any account', async () => {
    const from = '203.0.113.60';
    for (let i = 0; i < 30; i += 1) expect((await wrong(`nobody-${i}@guess.example`, from, i)).status).toBe(401);
    const refused = await call('POST', '/api/auth/sign-in/email', { from, form: { email: DEMO.counter, password: DEMO_PASSWORD } });
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await call('POST', '/api/auth/sign-in/email', { from: '203.0.113.61', body: { email: DEMO.counter, password: DEMO_PASSWORD } })).status).toBe(200);
  });

  it('a success before the limit clears the count', async () => {
    const shop = await newShop('Reset Count Hems');
    const from = '198.51.100.13';
    for (let round = 0; round < 2; round += 1) {
      for (let i = 0; i < 4; i += 1) expect((await wrong(shop.email, from, i)).status).toBe(401);
      expect((await call('POST', '/api/auth/sign-in/email', { from, body: { email: shop.email, password: 'a-long-password' } })).status).toBe(200);
    }
  });
});

describe('pages', () => {
  it('send a signed-out visitor to sign-in, keeping where they were going', async () => {
    for (const path of ['/bench', '/staff', '/sent-messages']) {
      const r = await call('GET', path);
      expect(r.status).toBe(302);
      expect(r.headers.get('location')).toBe(`/sign-in?next=${encodeURIComponent(path)}`);
    }
  });

  it('leave the public calculator and sign-in open', async () => {
    expect((await call('GET', '/')).status).toBe(200);
    expect((await call('GET', '/sign-in')).status).toBe(200);
    expect((await call('GET', '/sign-up')).status).toBe(200);
  });

  it('answer 403 on the staff page to an apprentice and 200 to the lead', async () => {
    const apprentice = await signIn(DEMO.apprentice);
    expect((await call('GET', '/staff', { cookie: apprentice })).status).toBe(403);
    expect((await call('GET', '/staff', { cookie: lead })).status).toBe(200);
  });

  it('sign-out by the header form ends the session', async () => {
    const counter = await signIn(DEMO.counter);
    const r = await call('POST', '/sign-out', { cookie: counter });
    expect(r.status).toBe(302);
    expect((await call('GET', '/api/me', { cookie: counter })).status).toBe(401);
  });
});
