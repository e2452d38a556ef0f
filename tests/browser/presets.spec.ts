// Story (2): the lead saves a house preset and makes it the default; a tailor keeps and edits their
// own; on a garment page presets fill a leg in one tap, and a new fitting starts from the house
// default, said on screen. Issue 15: the lead edits a house preset (name and depth) and a fitting
// that used it shows the new name.
import { mkdirSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, ready, TABLET } from './browser';
import { signedInPage } from './sign-in';

let browser: Browser;
const stamp = Date.now().toString(36);
const houseName = `Bench trim ${stamp}`;
const ownName = `Teo's narrow ${stamp}`;

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
});
afterAll(async () => {
  await browser?.close();
});

describe('house presets from the lead to the bench', () => {
  it('the lead saves a house preset and makes it the house default', async () => {
    const page = await signedInPage(browser, 'lead', '/presets', TABLET);
    await expect(page.getByRole('link', { name: 'Presets' }).getAttribute('aria-current')).resolves.toBe('page');
    const form = page.getByRole('form', { name: 'New house preset' });
    await form.getByLabel('Preset name').fill(houseName);
    await form.getByLabel('Cuff depth (in)').fill('1 3/8');
    await form.getByLabel('Turn-under (in)').fill('1/2');
    await form.getByLabel('Make it the house default').check();
    await form.getByRole('button', { name: 'Save house preset' }).click();
    await page.getByText(`House preset ${houseName} saved.`).waitFor();
    const list = page.getByRole('region', { name: 'Manage house presets' });
    const row = list.getByRole('listitem').filter({ hasText: houseName });
    await row.getByText('House default').waitFor();
    // Only one default: the classic cuff lost the mark and offers to take it back.
    await list.getByRole('button', { name: 'Make default: Classic cuff' }).waitFor();
    expect(await list.getByText('House default').count()).toBe(1);
    await page.screenshot({ path: 'test-results/presets-lead.png', fullPage: true });
    await page.context().close();
  });

  it('a tailor keeps a preset of their own and edits it; house presets are theirs to read only', async () => {
    const page = await signedInPage(browser, 'tailor', '/presets', TABLET);
    const house = page.getByRole('region', { name: 'House presets', exact: true });
    await house.getByRole('listitem').filter({ hasText: houseName }).getByText('House default').waitFor();
    // The tailor keeps no house presets: no form, no edit or remove on them.
    expect(await page.getByRole('form', { name: 'New house preset' }).count()).toBe(0);
    expect(await house.getByRole('button', { name: /^(Edit|Remove|Make default):/ }).count()).toBe(0);
    // No trial panel that fills nothing: presets are applied on a garment's fitting.
    expect(await page.getByRole('heading', { name: 'Apply a preset' }).count()).toBe(0);

    const form = page.getByRole('form', { name: 'New preset of your own' });
    await form.getByLabel('Preset name').fill(ownName);
    await form.getByLabel('Cuff depth (in)').fill('1 5/16');
    await form.getByRole('button', { name: 'Save my preset' }).click();
    await page.getByText(`Your preset ${ownName} saved.`).waitFor();
    const own = page.getByRole('region', { name: 'Manage your own presets' });
    await own.getByRole('button', { name: `Edit: ${ownName}` }).click();
    const edit = own.getByRole('form', { name: `Edit ${ownName}` });
    await edit.getByLabel('Cuff depth (in)').fill('1 3/8');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    const row = own.getByRole('listitem').filter({ has: page.getByRole('button', { name: `Edit: ${ownName}` }) });
    await row.getByText('1 3/8 in').waitFor();
    await row.getByText(`History of ${ownName}`).click();
    await row.getByText('Cuff depth: 1 5/16 → 1 3/8').waitFor();
    await page.screenshot({ path: 'test-results/presets-tailor.png', fullPage: true });
    page.once('dialog', (d) => d.accept());
    await own.getByRole('button', { name: `Remove: ${ownName}` }).click();
    await own.getByRole('button', { name: `Edit: ${ownName}` }).waitFor({ state: 'detached' });
    await page.context().close();
  });

  it('on a garment page, the tailor fills a leg with the house preset in one tap', async () => {
    const page = await signedInPage(browser, 'tailor', '/presets', TABLET);
    const queue = (await (await page.request.get('/api/garments')).json()) as { id: string }[];
    await page.goto(`/garments/${queue[0]!.id}`);
    await ready(page);
    const fitting = page.getByRole('form', { name: 'Fitting measurements' });
    await fitting.getByText('Presets for the left leg').click();
    const house = fitting.getByRole('button', { name: new RegExp(`^${houseName}`) });
    await house.waitFor();
    // Marked as the house default, listed first among the house presets.
    await expect(house.getByText('House default').isVisible()).resolves.toBe(true);
    await house.click();
    await expect.poll(() => fitting.getByLabel('Cuff depth', { exact: true }).inputValue()).toMatch(/^1 3\/8( in)?$/);
    // A tap applies the preset and closes the list: open it again for another.
    await fitting.getByText('Presets for the left leg').click();
    await fitting.getByRole('button', { name: /^Wide cuff/ }).click();
    await expect.poll(() => fitting.getByLabel('Cuff depth', { exact: true }).inputValue()).toMatch(/^1 3\/4( in)?$/);
    await page.screenshot({ path: 'test-results/presets-garment.png', fullPage: true });
    await page.context().close();
  });

  it('the lead gives the house default back to the classic cuff and removes the trial preset', async () => {
    const page = await signedInPage(browser, 'lead', '/presets', TABLET);
    const list = page.getByRole('region', { name: 'Manage house presets' });
    await list.getByRole('button', { name: 'Make default: Classic cuff' }).click();
    await list.getByRole('listitem').filter({ hasText: 'Classic cuff' }).getByText('House default').waitFor();
    page.once('dialog', (d) => d.accept());
    await list.getByRole('button', { name: `Remove: ${houseName}` }).click();
    await list.getByRole('listitem').filter({ hasText: houseName }).waitFor({ state: 'detached' });
    await page.context().close();
  });

  it('a new fitting starts from the house default, said on screen, one tap from another preset', async () => {
    const page = await signedInPage(browser, 'tailor', '/queue', TABLET);
    const id = await freshGarment(page, `Default story trousers ${stamp}`);
    await page.goto(`/garments/${id}`);
    await ready(page);
    const fitting = page.getByRole('form', { name: 'Fitting measurements' });
    const depth = fitting.getByLabel('Cuff depth', { exact: true });
    // Classic cuff: 1 1/2 in (the house standard, common practice, no source; TRADE.md).
    await fitting.getByText('From house default:').waitFor();
    expect(await fitting.locator('p', { hasText: 'From house default:' }).innerText()).toContain('Classic cuff (cuff 1 1/2 in)');
    expect(await depth.inputValue()).toBe('1 1/2');
    await page.screenshot({ path: 'test-results/presets-new-fitting-default.png', fullPage: true });
    // Both legs start from it.
    await fitting.locator('label', { has: page.getByRole('radio', { name: 'Right leg', exact: true }) }).click();
    await expect.poll(() => depth.inputValue()).toBe('1 1/2');
    await fitting.getByText('From house default:').waitFor();
    // One tap opens the list, one tap changes it.
    await fitting.getByRole('button', { name: 'Change' }).click();
    await fitting.getByRole('button', { name: /^Wide cuff/ }).click();
    await expect.poll(() => depth.inputValue()).toBe('1 3/4');
    await fitting.getByText('From the preset').waitFor();
    await fitting.getByLabel('Pin at the back (finished length)').fill('31');
    await fitting.locator('label', { has: page.getByRole('radio', { name: 'Left leg', exact: true }) }).click();
    await fitting.getByLabel('Pin at the back (finished length)').fill('31');
    await fitting.getByRole('button', { name: /^Save measurements/ }).click();
    await page.getByText('Saved both legs.').waitFor();
    const saved = await apiGet(page, `/api/garments/${id}/measurements`);
    expect(saved.legs.map((l: { leg: string; preset: string; values: { cuffDepth: { text: string } } }) => [l.leg, l.preset, l.values.cuffDepth.text])).toEqual(
      [
        ['left', 'Classic cuff', '1 1/2'],
        ['right', 'Wide cuff', '1 3/4'],
      ],
    );
    await page.context().close();
  });

  it('the lead edits a house preset’s depth and name, and a fitting that used it shows the new name', async () => {
    const page = await signedInPage(browser, 'lead', '/presets', TABLET);
    const before = `Story cuff ${stamp}`;
    const after = `Story cuff 1 5/8 ${stamp}`;
    const preset = await apiSend(page, 'POST', '/api/presets', {
      name: before,
      scope: 'house',
      settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2', turnUnder: '1/2' },
    });
    const id = await freshGarment(page, `Renamed preset trousers ${stamp}`);
    const leg = { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', turnUnder: '1/2', presetId: preset.id };
    await apiSend(page, 'PUT', `/api/garments/${id}/measurements`, { unit: 'in', legs: { left: leg, right: leg } });

    await page.reload();
    await ready(page);
    const list = page.getByRole('region', { name: 'Manage house presets' });
    await list.getByRole('button', { name: `Edit: ${before}` }).click();
    const edit = list.getByRole('form', { name: `Edit ${before}` });
    await edit.getByLabel('Preset name').fill(after);
    await edit.getByLabel('Cuff depth (in)').fill('1 5/8');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    const row = list.getByRole('listitem').filter({ has: page.getByRole('button', { name: `Edit: ${after}` }) });
    await row.getByText('1 5/8 in').waitFor();
    await row.getByText(`History of ${after}`).click();
    await row.getByText(`Name: ${before} → ${after}`).waitFor();
    await row.getByText('Cuff depth: 1 1/2 → 1 5/8').waitFor();
    // Who: the demo shop's lead (demo seed).
    await row.getByText('Ada Penhallow ·').first().waitFor();
    await page.screenshot({ path: 'test-results/presets-lead-edit.png', fullPage: true });

    // The fitting points at the preset by id: its page shows the new name.
    await page.goto(`/garments/${id}`);
    await ready(page);
    const fitting = page.getByRole('form', { name: 'Fitting measurements' });
    await fitting.locator('strong', { hasText: after }).waitFor();
    // The apprentice reads it the same way.
    const reader = await signedInPage(browser, 'apprentice', '/queue', TABLET);
    await reader.goto(`/garments/${id}`);
    await ready(reader);
    await reader
      .getByRole('row', { name: /^Preset/ })
      .getByText(after)
      .first()
      .waitFor();
    await reader.context().close();
    await apiSend(page, 'DELETE', `/api/presets/${preset.id}`);
    await page.context().close();
  });
});

/** Opens a ticket with one garment through the API, as the signed-in page, and returns the garment's id. */
async function freshGarment(page: Page, description: string): Promise<string> {
  const ticket = await apiSend(page, 'POST', '/api/tickets', { customer: { name: 'Ysolde Varrick' }, garments: [{ description }] });
  return (await apiGet(page, `/api/tickets/${ticket.id}`)).garments[0].id as string;
}

/** A JSON call from the signed-in page; fails the story on an error answer. */
async function apiSend(page: Page, method: string, path: string, body?: unknown) {
  const r = await page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      return { status: res.status, body: await res.json() };
    },
    { method, path, body },
  );
  if (r.status >= 300) throw new Error(`${method} ${path}: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
}

async function apiGet(page: Page, path: string) {
  return apiSend(page, 'GET', path);
}
