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

  it("refuses a cross-site form POST to sign-out, keeping the session", async () => {
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
  it('after 5 wrong passwords the account answers 429, even to the right one; others are unaffected', async () => {
    const shop = await newShop('Rate Limit Hems');
    for (let i = 0; i < 5; i += 1) {
      const r = await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email, password: `wrong-${i}-password` } });
      expect(r.status).toBe(401);
    }
    const blocked = await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email, password: 'a-long-password' } });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(blocked.body.error).toMatch(/Too many failed sign-ins/);
    expect(cookieFrom(blocked.headers)).toBe('');
    // The same address in capitals is the same account.
    const shouted = await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email.toUpperCase(), password: 'a-long-password' } });
    expect(shouted.status).toBe(429);
    expect(await signIn(DEMO.counter)).toContain('better-auth.session_token=');
  });

  it('a success before the limit clears the count', async () => {
    const shop = await newShop('Reset Count Hems');
    for (let round = 0; round < 2; round += 1) {
      for (let i = 0; i < 4; i += 1) {
        expect((await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email, password: 'nope-nope-nope' } })).status).toBe(401);
      }
      expect(await signIn(shop.email, 'a-long-password')).toContain('better-auth.session_token=');
    }
  });
});

describe('pages', () => {
  it('send a signed-out visitor to sign-in, keeping where they were going', async () => {
    for (const path of ['/bench', '/staff', '/outbox']) {
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
