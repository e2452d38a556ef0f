// Signing in on screen, as the stories' people do.
import type { Page } from 'playwright-core';
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
