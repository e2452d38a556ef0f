// Security headers on every page (signed out and signed in), on API answers and on redirects:
// a Content-Security-Policy without inline script allowances beyond the exact hashes of what the
// page inlines, framing refused, a referrer policy, and no MIME sniffing.
import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { call, type Answer } from './client';
import { pageFiles, pageIds, pagePaths } from './pages';

let lead = '';
let paths: Record<string, string> = {};
beforeAll(async () => {
  const ids = await pageIds();
  lead = ids.lead;
  paths = pagePaths(ids);
});

/** The CSP as directive → sources. */
function policy(a: Answer): Map<string, string[]> {
  const header = a.headers.get('content-security-policy');
  expect(header, 'Content-Security-Policy header').toBeTruthy();
  return new Map(
    header!
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...sources]) => [name!.toLowerCase(), sources]),
  );
}

const sha256 = (text: string) => `'sha256-${createHash('sha256').update(text).digest('base64')}'`;

function expectEveryHeader(a: Answer) {
  expect(a.headers.get('x-content-type-options')).toBe('nosniff');
  expect(a.headers.get('referrer-policy')).toBe('same-origin');
}

function expectPagePolicy(a: Answer) {
  expectEveryHeader(a);
  const csp = policy(a);
  expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
  expect(csp.get('default-src')).toEqual(["'self'"]);
  expect(csp.get('object-src')).toEqual(["'none'"]);
  expect(csp.get('base-uri')).toEqual(["'self'"]);
  expect(csp.get('form-action')).toEqual(["'self'"]);
  for (const directive of ['script-src', 'style-src']) {
    const sources = csp.get(directive) ?? [];
    expect(sources, directive).toContain("'self'");
    expect(sources, directive).not.toContain("'unsafe-inline'");
    expect(sources, directive).not.toContain("'unsafe-eval'");
    expect(
      sources.some((s) => s === '*' || s.endsWith(':')),
      `${directive} allows a whole scheme or any host`,
    ).toBe(false);
  }
  expect(a.headers.get('x-frame-options')).toBe('DENY');
  // Whatever the page inlines is allowed by its exact hash: nothing else inline can run.
  if (typeof a.body === 'string') {
    for (const m of a.body.matchAll(/<script(?![^>]*\ssrc=)[^>]*>([\s\S]*?)<\/script>/g)) expect(csp.get('script-src')).toContain(sha256(m[1]!));
    for (const m of a.body.matchAll(/<style[^>]*>([\s\S]*?)<\/style>/g)) expect(csp.get('style-src')).toContain(sha256(m[1]!));
    expect(a.body).not.toMatch(/\son[a-z]+=/i);
    expect(a.body).not.toMatch(/\sstyle="/i);
  }
}

describe('security headers', () => {
  it('the list of pages covers every page file', () => {
    expect(Object.keys(paths).sort()).toEqual(pageFiles().sort());
  });

  it('every page, signed out, has them (pages that send on to sign-in included)', async () => {
    for (const path of Object.values(paths)) {
      const a = await call('GET', path);
      expect(a.status, path).toBeLessThan(500);
      expectPagePolicy(a);
    }
  });

  it('every page, signed in as the lead, has them', async () => {
    for (const path of Object.values(paths)) {
      const a = await call('GET', path, { cookie: lead });
      expect(a.status, path).toBeLessThan(500);
      if (a.status === 200) expect(a.headers.get('content-type'), path).toMatch(/^text\/html/);
      expectPagePolicy(a);
    }
  });

  it('an unknown page (404) has them', async () => {
    const a = await call('GET', '/no-such-page', { cookie: lead });
    expect(a.status).toBe(404);
    expectPagePolicy(a);
  });

  it('API answers and refusals are not sniffed and keep the referrer to this site', async () => {
    expectEveryHeader(await call('GET', '/api/me', { cookie: lead }));
    expectEveryHeader(await call('GET', '/api/me'));
    expectEveryHeader(await call('POST', '/api/customers', { cookie: lead, origin: 'http://evil.example', body: {} }));
    expectEveryHeader(await call('GET', '/api/auth/get-session', { cookie: lead }));
  });
});
