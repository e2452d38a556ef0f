// better-auth's surface as the app exposes it: where sign-in sends you on, what a password change
// does to other sessions, what sign-in answers in its body, and what update-user accepts.
import { beforeAll, describe, expect, it } from 'vitest';
import { call, cookieFrom, DEMO, newShop, signIn } from './client';

let lead = '';
beforeAll(async () => {
  lead = await signIn(DEMO.lead);
});

describe('sign-in ?next=', () => {
  // A signed-in member is sent straight on: the Location header is where the browser goes.
  const offSite = ['/%5Cevil.example', '/%09/evil.example', '//evil.example', '/.//evil.example', 'https://evil.example/', 'javascript:alert(1)'];
  for (const next of offSite) {
    it(`never sends the browser off-site for next=${next}`, async () => {
      const r = await call('GET', `/sign-in?next=${next}`, { cookie: lead });
      expect(r.status).toBe(302);
      expect(r.headers.get('location')).toBe('/bench');
    });
  }

  it('keeps a same-site path with its query and hash', async () => {
    const r = await call('GET', `/sign-in?next=${encodeURIComponent('/queue?mine=1#top')}`, { cookie: lead });
    expect(r.headers.get('location')).toBe('/queue?mine=1#top');
  });

  it('hands the sign-in form only the safe address', async () => {
    const r = await call('GET', '/sign-in?next=/%5Cevil.example');
    expect(r.status).toBe(200);
    expect(r.body).not.toContain('evil.example');
  });
});

describe('sign-in answer', () => {
  it('carries the session in the cookie only, not in the JSON body', async () => {
    const shop = await newShop('Token Body Hems');
    const r = await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email, password: 'a-long-password' } });
    expect(r.status).toBe(200);
    const cookie = r.headers.getSetCookie().find((c) => c.startsWith('better-auth.session_token='));
    expect(cookie).toBeDefined();
    expect(r.body.token).toBeUndefined();
    expect(JSON.stringify(r.body)).not.toContain(decodeURIComponent(cookie!.split(';')[0]!.split('=')[1]!).split('.')[0]!);
    expect(r.body.user.email).toBe(shop.email);
    expect((await call('GET', '/api/me', { cookie: cookieFrom(r.headers) })).status).toBe(200);
  });

  it('get-session does not hand the token to scripts either', async () => {
    const r = await call('GET', '/api/auth/get-session', { cookie: lead });
    expect(r.status).toBe(200);
    expect(r.body.user.email).toBe(DEMO.lead);
    expect(r.body.session.token).toBeUndefined();
  });
});

describe('list-sessions', () => {
  it('lists the sessions without their tokens', async () => {
    const r = await call('GET', '/api/auth/list-sessions', { cookie: lead });
    expect(r.status).toBe(200);
    expect(r.body.length).toBeGreaterThan(0);
    for (const s of r.body) expect(s.token).toBeUndefined();
  });
});

describe("better-auth's own return addresses", () => {
  // Already checked by better-auth (trustedOrigins, safe relative paths): kept so by this test.
  for (const redirectTo of ['https://evil.example/reset', '/\\evil.example', '//evil.example/reset']) {
    it(`request-password-reset refuses redirectTo ${redirectTo}`, async () => {
      const r = await call('POST', '/api/auth/request-password-reset', { body: { email: DEMO.counter, redirectTo } });
      expect(r.status).toBe(403);
    });
  }
});

describe('change password', () => {
  for (const revokeOtherSessions of [false, undefined]) {
    it(`ends every other session even when the client sends revokeOtherSessions: ${revokeOtherSessions}`, async () => {
      const shop = await newShop('Password Change Hems');
      const other = await signIn(shop.email, 'a-long-password');
      const r = await call('POST', '/api/auth/change-password', {
        cookie: shop.cookie,
        body: { currentPassword: 'a-long-password', newPassword: 'a-newer-password', revokeOtherSessions },
      });
      expect(r.status, JSON.stringify(r.body)).toBe(200);
      expect(r.body.token).toBeUndefined();
      expect((await call('GET', '/api/me', { cookie: other })).status).toBe(401);
      expect((await call('GET', '/api/me', { cookie: shop.cookie })).status).toBe(401);
      // The one who changed it stays signed in, through the new cookie.
      expect((await call('GET', '/api/me', { cookie: cookieFrom(r.headers) })).status).toBe(200);
      expect(await signIn(shop.email, 'a-newer-password')).toContain('better-auth.session_token=');
    });
  }
});

describe('update-user', () => {
  const bad: [string, unknown][] = [
    ['null', null],
    ['empty', ''],
    ['only spaces', '   '],
    // 10,000 rather than 100,000: a body over 64 KB is refused whole (413) before any rule reads it.
    ['10,000 characters', 'n'.repeat(10_000)],
    ['a number', 42],
  ];
  for (const [what, name] of bad) {
    it(`refuses a name that is ${what} with a JSON 400/422`, async () => {
      const shop = await newShop('Rename Hems');
      const r = await call('POST', '/api/auth/update-user', { cookie: shop.cookie, body: { name } });
      expect([400, 422]).toContain(r.status);
      expect(typeof r.body.message).toBe('string');
      const session = await call('GET', '/api/auth/get-session', { cookie: shop.cookie });
      expect(session.body.user.name).toBe('Test Lead');
    });
  }

  it('refuses fields other than the name', async () => {
    const shop = await newShop('Rename Hems');
    const r = await call('POST', '/api/auth/update-user', { cookie: shop.cookie, body: { image: 'http://evil.example/x.png' } });
    expect([400, 422]).toContain(r.status);
  });

  it('changes a good name, trimmed', async () => {
    const shop = await newShop('Rename Hems');
    const r = await call('POST', '/api/auth/update-user', { cookie: shop.cookie, body: { name: '  Ada P. Wickham ' } });
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect((await call('GET', '/api/me', { cookie: shop.cookie })).body.name).toBe('Ada P. Wickham');
  });
});
