// Signing in on screen, as the stories' people do.
import type { Browser, BrowserContext, BrowserContextOptions, Page } from 'playwright-core';
import { inject } from 'vitest';
import { DEMO, DEMO_PASSWORD } from '../http/client';
import { ready } from './browser';

/** Fills the sign-in form on the open page and sends it. */
export async function submitSignIn(page: Page, email: string, password: string = DEMO_PASSWORD): Promise<void> {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Signs in one of the demo shop's people by role and waits on `next` with its islands live. */
export async function signInAs(page: Page, role: keyof typeof DEMO, next: string): Promise<void> {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await ready(page);
  await submitSignIn(page, DEMO[role]);
  await page.waitForURL((u) => u.pathname === next);
  await ready(page);
}

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;
// Per test file (vitest gives each file its own module): a role's cookies after one sign-in on screen.
const signedIn = new Map<keyof typeof DEMO, Promise<StorageState>>();

/**
 * A new context already signed in as the role: the first call in a test file signs in on screen,
 * later ones reuse its cookies. Only for stories that do not sign out or change that person's
 * session (a POST to /sign-out would end it for every context sharing it).
 */
export async function signedInContext(browser: Browser, role: keyof typeof DEMO, options: BrowserContextOptions = {}): Promise<BrowserContext> {
  let state = signedIn.get(role);
  if (!state) {
    state = (async () => {
      const context = await browser.newContext({ baseURL: inject('baseURL') });
      try {
        await signInAs(await context.newPage(), role, '/queue');
        return await context.storageState();
      } finally {
        await context.close();
      }
    })();
    signedIn.set(role, state);
    state.catch(() => signedIn.delete(role));
  }
  return browser.newContext({ baseURL: inject('baseURL'), ...options, storageState: await state });
}

/** A page in a new context signed in as the role (see signedInContext), open on `next` with its islands live. */
export async function signedInPage(browser: Browser, role: keyof typeof DEMO, next: string, options: BrowserContextOptions = {}): Promise<Page> {
  const page = await (await signedInContext(browser, role, options)).newPage();
  await page.goto(next);
  await ready(page);
  return page;
}
