// A fitting saved while the tailor keeps typing: when the slow save comes back, the lengths typed
// in the meantime stay on screen and the form stays unsaved; the rest shows what was saved.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { freshGarment } from './fresh-garment';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });

/**
 * Lets a test hold back the page's queued work (posted messages, which React schedules its renders
 * with, and if asked zero-delay timers, which the query client answers with) while keys still
 * land, as on a busy tablet, where a key typed goes ahead of the render the page queued a moment
 * before. Set up before the page loads.
 */
async function canHoldQueuedWork(
  page: Page,
): Promise<{ hold: (timers: boolean) => Promise<void>; anyHeld: () => Promise<boolean>; release: () => Promise<void> }> {
  await page.addInitScript(() => {
    type Held = { on: boolean; timers: boolean; work: (() => void)[] };
    const held: Held = { on: false, timers: false, work: [] };
    (window as unknown as { held: Held }).held = held;
    const post = MessagePort.prototype.postMessage;
    MessagePort.prototype.postMessage = function (this: MessagePort, ...args: Parameters<MessagePort['postMessage']>) {
      if (!held.on) return post.apply(this, args);
      held.work.push(() => post.apply(this, args));
    } as MessagePort['postMessage'];
    const timer = window.setTimeout;
    window.setTimeout = ((fn: TimerHandler, ms?: number, ...rest: unknown[]) => {
      if (!held.on || !held.timers || (ms ?? 0) > 0 || typeof fn !== 'function') return timer(fn, ms, ...rest);
      held.work.push(() => fn(...rest));
      return 0;
    }) as typeof window.setTimeout;
  });
  type Held = { held: { on: boolean; timers: boolean; work: (() => void)[] } };
  return {
    hold: (timers) => page.evaluate((timers) => void Object.assign((window as unknown as Held).held, { on: true, timers }), timers),
    anyHeld: () => page.evaluate(() => (window as unknown as Held).held.work.length > 0),
    release: () =>
      page.evaluate(() => {
        const { held } = window as unknown as Held;
        held.on = false;
        for (const go of held.work.splice(0)) go();
      }),
  };
}

/** Holds requests to `url` (only those of `method`, if given) on their way, as a slow connection at the fitting would; answers how to let them go. */
async function holdRequests(page: Page, url: string, method?: string): Promise<() => void> {
  let release!: () => void;
  const held = new Promise<void>((r) => (release = r));
  await page.route(url, async (route) => {
    if (!method || route.request().method() === method) await held;
    await route.continue();
  });
  return release;
}

describe('a fitting saved while typing goes on', () => {
  it('keeps lengths typed during the save and shows the saved ones for the rest', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Slate flannel trousers', 'Ottoline Brask');
    await page.goto(`/garments/${id}`);
    await ready(page);

    await field(page, 'Pin at the back (finished length)').fill('31 1/4');
    await field(page, 'Cuff depth').fill('1 1/2');

    // Hold the save on its way, as a slow connection at the fitting would.
    const release = await holdRequests(page, '**/api/garments/*/measurements', 'PUT');
    await page.getByRole('button', { name: /^Save measurements/ }).click();
    await page.getByRole('button', { name: 'Saving…' }).waitFor();

    // Typed while saving: a new length, and a sent one changed again.
    await field(page, 'Cloth below the mark').fill('5');
    await field(page, 'Pin at the back (finished length)').fill('31');
    release();

    await page.getByText('Saved. What you typed while it was saving is kept here, not yet saved.').waitFor();
    expect(await field(page, 'Cloth below the mark').inputValue()).toBe('5');
    expect(await field(page, 'Pin at the back (finished length)').inputValue()).toBe('31');
    expect(await field(page, 'Cuff depth').inputValue()).toBe('1 1/2');
    // Still unsaved: the button asks to save, not "(no changes)".
    await page.getByRole('button', { name: 'Save measurements', exact: true }).waitFor();
    const history = page.getByTestId('history');
    await history.getByText('Left leg, Pin at the back (finished length): nothing → 31 1/4 in').waitFor();
    expect(await history.getByText('Cloth below the mark').count()).toBe(0);
    await page.screenshot({ path: 'test-results/fitting-typed-while-saving.png' });

    await page.unroute('**/api/garments/*/measurements');
    await page.getByRole('button', { name: 'Save measurements', exact: true }).click();
    await page.getByText('Saved both legs.').waitFor();
    await history.getByText('Left leg, Pin at the back (finished length): 31 1/4 in → 31 in').waitFor();
    await history.getByText('Left leg, Cloth below the mark: nothing → 5 in').waitFor();
    await page.getByRole('button', { name: 'Save measurements (no changes)' }).waitFor();
    await page.context().close();
  });

  it('keeps lengths typed before the house default arrives, unsaved, with the default under the rest', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Moss twill trousers', 'Ottoline Brask');
    // The shop's presets come late, as on a slow connection at the fitting.
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let asked = false;
    await page.route('**/api/presets', async (route) => {
      asked = true;
      await held;
      await route.continue();
    });
    await page.goto(`/garments/${id}`);
    await ready(page);
    await field(page, 'Pin at the back (finished length)').fill('31 1/4');
    await field(page, 'Cuff depth').fill('1 3/4');
    expect(asked).toBe(true);
    // The default can land before the typed lengths are kept as a draft (the same moment): as then.
    await page.evaluate(() => sessionStorage.clear());
    release();

    await page.getByText(/From house default/).waitFor();
    expect(await field(page, 'Pin at the back (finished length)').inputValue()).toBe('31 1/4');
    expect(await field(page, 'Cuff depth').inputValue()).toBe('1 3/4');
    // The default fills what was not typed: the demo shop's house default turns under 1/2 in.
    expect(await field(page, 'Turn-under').inputValue()).toBe('1/2');
    // What was typed is still a change to save, not swallowed into the starting point.
    await page.getByRole('button', { name: 'Save measurements', exact: true }).click();
    await page.getByText('Saved both legs.').waitFor();
    const history = page.getByTestId('history');
    await history.getByText('Left leg, Pin at the back (finished length): nothing → 31 1/4 in').waitFor();
    await history.getByText('Left leg, Cuff depth: nothing → 1 3/4 in').waitFor();
    await page.context().close();
  });

  // A key typed between the form taking the default (or the saved copy) and its next render was
  // dropped and the field put back: in CI the first pin typed on a new garment went missing from
  // the save when the house default landed at that moment.
  it('keeps a length typed in the moment the house default lands', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Heather tweed trousers', 'Ottoline Brask');
    const queued = await canHoldQueuedWork(page);
    const release = await holdRequests(page, '**/api/presets');
    await page.goto(`/garments/${id}`);
    await ready(page);
    await field(page, 'Pin at the back (finished length)').waitFor();
    await queued.hold(false);
    release();
    // The default is taken and the form's next render queued: the pin is typed before it runs.
    await expect.poll(queued.anyHeld).toBe(true);
    await field(page, 'Pin at the back (finished length)').fill('31 1/4');
    await queued.release();
    await page.getByText(/From house default/).waitFor();
    expect(await field(page, 'Pin at the back (finished length)').inputValue()).toBe('31 1/4');

    await page.getByRole('button', { name: 'Save measurements', exact: true }).click();
    await page.getByText('Saved both legs.').waitFor();
    await page.getByTestId('history').getByText('Left leg, Pin at the back (finished length): nothing → 31 1/4 in').waitFor();
    await page.context().close();
  });

  it('keeps a length typed in the moment a save comes back', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Rust corduroy trousers', 'Ottoline Brask');
    const queued = await canHoldQueuedWork(page);
    await page.goto(`/garments/${id}`);
    await ready(page);
    await page.getByText(/From house default/).waitFor();
    await field(page, 'Cuff depth').fill('1 3/4');
    const release = await holdRequests(page, '**/api/garments/*/measurements', 'PUT');
    await page.getByRole('button', { name: /^Save measurements/ }).click();
    await page.getByRole('button', { name: 'Saving…' }).waitFor();
    await queued.hold(true);
    release();
    await expect.poll(queued.anyHeld).toBe(true);
    await field(page, 'Pin at the back (finished length)').fill('31 1/4');
    await queued.release();
    // The save is in (its change is in the history), and the pin typed as it came back is still
    // there, a change not yet saved.
    await page.getByTestId('history').getByText('Left leg, Cuff depth: nothing → 1 3/4 in').waitFor();
    expect(await field(page, 'Pin at the back (finished length)').inputValue()).toBe('31 1/4');
    await page.getByRole('button', { name: 'Save measurements', exact: true }).click();
    await page.getByText('Saved both legs.').waitFor();
    await page.getByTestId('history').getByText('Left leg, Pin at the back (finished length): nothing → 31 1/4 in').waitFor();
    await page.context().close();
  });
});
