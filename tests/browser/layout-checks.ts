// What "fits the screen" means for the narrow-screen stories: no sideways scroll, every control
// wholly on screen and not cut off by a frame that scrolls or clips, and every control a finger can hit.
import type { Page, Request } from 'playwright-core';

/** One thing that does not fit, in words a test failure can show. */
export type LayoutProblem = string;

// The requests each tracked page has in flight (see trackRequests).
const inFlight = new WeakMap<Page, Set<Request>>();

/**
 * Counts the page's requests in flight from now on (call it before the page's first navigation),
 * so settled() waits for exactly those to end instead of for Playwright's 500 ms of network quiet.
 */
export function trackRequests(page: Page): void {
  const open = new Set<Request>();
  page.on('request', (r) => open.add(r));
  page.on('requestfinished', (r) => open.delete(r));
  page.on('requestfailed', (r) => open.delete(r));
  inFlight.set(page, open);
}

/**
 * Waits until the page's islands are live (when it has any) and its data requests have settled.
 * On a tracked page: every island hydrated (or 15 s gone by, for the caller's check to report), then
 * no request in flight across two rounds of the page's own work (its fonts, two frames and the
 * tasks queued behind them, where React sends a request that depends on one just answered).
 * Untracked: one island hydrated, then 500 ms with no network connection (Playwright's networkidle).
 */
export async function settled(page: Page): Promise<void> {
  await page.waitForLoadState('load');
  const open = inFlight.get(page);
  if ((await page.locator('astro-island').count()) > 0) {
    if (open) await page.waitForFunction(() => !document.querySelector('astro-island[ssr]'), null, { timeout: 15_000 }).catch(() => {});
    else await page.waitForSelector('astro-island:not([ssr])', { state: 'attached', timeout: 15_000 });
  }
  if (!open) {
    await page.waitForLoadState('networkidle');
    return;
  }
  const until = Date.now() + 30_000;
  for (let calm = 0; calm < 2; ) {
    if (open.size > 0) {
      calm = 0;
      if (Date.now() > until) throw new Error(`requests still open after 30 s: ${[...open].map((r) => r.url()).join(', ')}`);
      await new Promise((r) => setTimeout(r, 20));
      continue;
    }
    const stayed = await page
      .evaluate(async () => {
        await document.fonts.ready;
        await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
        await new Promise((r) => setTimeout(r, 0));
        return true;
      })
      // The page went on to another address meanwhile: wait for that one to load and start again.
      .catch(() => page.waitForLoadState('load').then(() => false));
    calm = stayed && open.size === 0 ? calm + 1 : 0;
  }
}

/**
 * Everything on the open page that runs off the side, hides behind a frame's edge, or is too
 * small to tap: the page wider than the window, a control outside the window or outside an
 * ancestor that clips or scrolls sideways, a button, field or block link under 44 px tall
 * (links inside running text are exempt, as in WCAG's target-size rule).
 */
export function layoutProblems(page: Page): Promise<LayoutProblem[]> {
  return page.evaluate(() => {
    const problems: string[] = [];
    const width = window.innerWidth;
    const doc = document.documentElement.scrollWidth;
    if (doc > width) problems.push(`page is ${doc} px wide in a ${width} px window`);
    const name = (el: Element) => {
      const text = (el.getAttribute('aria-label') ?? (el as HTMLElement).innerText ?? '').trim().replace(/\s+/g, ' ').slice(0, 40);
      const id = el.id ? `#${el.id}` : '';
      return `<${el.tagName.toLowerCase()}${id}> "${text}"`;
    };
    // A frame whose content scrolls sideways inside it hides part of what it holds.
    for (const el of document.body.querySelectorAll('*')) {
      const ox = getComputedStyle(el).overflowX;
      // Exempt: a data table in its own labelled, focusable scroll region (WCAG 1.4.10 lets tables
      // that need two dimensions scroll; the keyboard reaches the region, a screen reader names it).
      const tableRegion =
        el.getAttribute('role') === 'region' && el.hasAttribute('aria-label') && el.getAttribute('tabindex') === '0' && el.querySelector(':scope > table');
      if ((ox === 'auto' || ox === 'scroll') && el.scrollWidth > el.clientWidth + 1 && !tableRegion) {
        problems.push(`<${el.tagName.toLowerCase()} class="${el.className}"> scrolls sideways (${el.scrollWidth} px in ${el.clientWidth} px)`);
      }
    }
    const controls = document.querySelectorAll('a[href], button, input, select, textarea, summary, [role="button"], [tabindex]:not([tabindex="-1"])');
    for (const el of controls) {
      const r = el.getBoundingClientRect();
      // Not shown (closed details, hidden panels) or visually hidden for screen readers only.
      if (r.width <= 1 || r.height <= 1) continue;
      const style = getComputedStyle(el);
      if (style.visibility === 'hidden' || el.closest('.sr-only')) continue;
      if (r.left < -0.5 || r.right > width + 0.5) problems.push(`${name(el)} runs off the screen (${Math.round(r.left)}–${Math.round(r.right)} px)`);
      for (let a = el.parentElement; a && a !== document.body; a = a.parentElement) {
        if (getComputedStyle(a).overflowX === 'visible') continue;
        const f = a.getBoundingClientRect();
        if (r.left < f.left - 0.5 || r.right > f.right + 0.5) {
          problems.push(`${name(el)} is cut off by its frame <${a.tagName.toLowerCase()} class="${a.className}">`);
          break;
        }
      }
      const tag = el.tagName.toLowerCase();
      const type = el.getAttribute('type');
      if (type === 'checkbox' || type === 'radio' || type === 'hidden') continue;
      const isLink = tag === 'a';
      // A link in running text is exempt; a link laid out as its own target is not.
      if (isLink && style.display === 'inline') continue;
      if (r.height < 43.5) problems.push(`${name(el)} is only ${Math.round(r.height)} px tall`);
    }
    return problems;
  });
}
