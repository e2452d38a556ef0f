// Every page in Chromium under the app's Content-Security-Policy, signed out and signed in as
// each role: no violation is reported (securitypolicyviolation events or console), and every
// island hydrates. Also: a sign-in with an off-site ?next= lands on this site.
import type { BrowserContext, ConsoleMessage, Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { ROLES } from '@/lib/roles';
import { pageIds, pagePaths } from '../http/pages';
import { sharedBrowser, ready } from './browser';
import { settled } from './layout-checks';
import { signInAs, submitSignIn } from './sign-in';

const browser = sharedBrowser();
let paths: Record<string, string> = {};

beforeAll(async () => {
  paths = pagePaths(await pageIds());
});

/** A page that records CSP violations from the first script on (the init script runs outside the page's CSP). */
async function watchedPage(context: BrowserContext): Promise<{ page: Page; violations: string[] }> {
  const page = await context.newPage();
  const violations: string[] = [];
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      console.error(`CSP violation: ${e.violatedDirective} blocked ${e.blockedURI || 'inline'} at ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  page.on('console', (m: ConsoleMessage) => {
    if (/Content Security Policy|CSP violation/i.test(m.text())) violations.push(`${page.url()}: ${m.text()}`);
  });
  return { page, violations };
}

/** Opens every page; returns the violations and the islands left unhydrated. */
async function visitAll(page: Page, violations: string[]): Promise<{ violations: string[]; dead: string[]; islands: number }> {
  const dead: string[] = [];
  let islands = 0;
  for (const [name, path] of Object.entries(paths)) {
    if (name === 'sign-out') continue; // a POST ends the session; GET only sends on to sign-in
    await page.goto(path);
    await settled(page);
    islands += await page.locator('astro-island').count();
    const unhydrated = await page.locator('astro-island[ssr]').count();
    if (unhydrated) dead.push(`${path}: ${unhydrated} island(s) not hydrated`);
  }
  return { violations, dead, islands };
}

describe('Content-Security-Policy in Chromium', () => {
  it('is enforced: an injected inline script is blocked and reported', async () => {
    const context = await browser().newContext({ baseURL: inject('baseURL') });
    const { page, violations } = await watchedPage(context);
    await page.goto('/');
    await settled(page);
    const ran = await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__injected = true';
      document.body.append(s);
      return new Promise<boolean>((r) => setTimeout(() => r(Boolean((window as unknown as { __injected?: boolean }).__injected)), 300));
    });
    expect(ran).toBe(false);
    expect(violations.length).toBeGreaterThan(0);
    await context.close();
  });

  it('signed out: no violation on any page, and every island hydrates', async () => {
    const context = await browser().newContext({ baseURL: inject('baseURL') });
    const { page, violations } = await watchedPage(context);
    const seen = await visitAll(page, violations);
    expect(seen.violations).toEqual([]);
    expect(seen.dead).toEqual([]);
    expect(seen.islands).toBeGreaterThan(0);
    await context.close();
  });

  for (const role of ROLES) {
    it(`signed in as ${role}: no violation on any page, and every island hydrates`, async () => {
      const context = await browser().newContext({ baseURL: inject('baseURL') });
      const { page, violations } = await watchedPage(context);
      await signInAs(page, role, '/queue');
      const seen = await visitAll(page, violations);
      expect(seen.violations).toEqual([]);
      expect(seen.dead).toEqual([]);
      expect(seen.islands).toBeGreaterThan(5);
      await context.close();
    });
  }
});

describe('sign-in with an off-site ?next=', () => {
  for (const next of ['/%5Cevil.example', '/%09/evil.example']) {
    it(`next=${next} lands on this site`, async () => {
      const context = await browser().newContext({ baseURL: inject('baseURL') });
      const page = await context.newPage();
      await page.goto(`/sign-in?next=${next}`);
      await ready(page);
      await submitSignIn(page, 'tailor@pinmark.test');
      await page.waitForURL((u) => u.pathname === '/queue');
      expect(new URL(page.url()).origin).toBe(inject('baseURL'));
      await context.close();
    });
  }
});
