// Story (2): the lead saves a house preset and makes it the default; a tailor finds it
// preselected, applies presets in one tap, adjusts a length and keeps it as their own preset.
// The presets page has the fuller trial panel; the garment page (another worker's) mounts the same picker.
import { mkdirSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, ready, tabletPage } from './browser';
import { signInAs } from './sign-in';

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
    const page = await tabletPage(browser);
    await signInAs(page, 'lead', '/presets');
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

  it('a tailor finds it preselected, applies presets in one tap and keeps an adjusted one', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'tailor', '/presets');
    const depth = page.getByLabel('Cuff depth (in)', { exact: true });
    // The house default fills the leg before anything is tapped.
    await expect.poll(() => depth.inputValue()).toBe('1 3/8');
    const chosen = page.getByRole('button', { name: new RegExp(`^${houseName}`) });
    await expect.poll(() => chosen.getAttribute('aria-pressed')).toBe('true');

    await page.getByRole('button', { name: /^Wide cuff/ }).click();
    await expect.poll(() => depth.inputValue()).toBe('1 3/4');
    await page.getByRole('button', { name: /^Metric cuff 35/ }).click();
    await expect.poll(() => page.getByLabel('Cuff depth (mm)', { exact: true }).inputValue()).toBe('35');
    await expect.poll(() => page.getByRole('radio', { name: 'mm' }).isChecked()).toBe(true);
    await chosen.click();
    await expect.poll(() => depth.inputValue()).toBe('1 3/8');
    await expect.poll(() => chosen.getAttribute('aria-pressed')).toBe('true');

    await depth.fill('1 5/16');
    await page.getByLabel('Name for your preset').fill(ownName);
    await page.getByRole('button', { name: 'Save as my preset' }).click();
    await page.getByText(`Saved as ${ownName}.`).waitFor();
    const own = page.getByRole('region', { name: 'Your presets', exact: true });
    await own.getByRole('button', { name: new RegExp(`^${ownName}`) }).waitFor();
    // The tailor keeps no house presets: no form for them.
    expect(await page.getByRole('form', { name: 'New house preset' }).count()).toBe(0);
    await page.screenshot({ path: 'test-results/presets-tailor.png', fullPage: true });

    // One tap on their own preset after another brings the adjusted depth back.
    await page.getByRole('button', { name: /^Wide cuff/ }).click();
    await own.getByRole('button', { name: new RegExp(`^${ownName}`) }).click();
    await expect.poll(() => depth.inputValue()).toBe('1 5/16');
    await page.context().close();
  });

  it('on a garment page, the tailor fills a leg with the house preset in one tap', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'tailor', '/presets');
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
    await fitting.getByRole('button', { name: /^Wide cuff/ }).click();
    await expect.poll(() => fitting.getByLabel('Cuff depth', { exact: true }).inputValue()).toMatch(/^1 3\/4( in)?$/);
    await page.screenshot({ path: 'test-results/presets-garment.png', fullPage: true });
    await page.context().close();
  });

  it('the lead gives the house default back to the classic cuff and removes the trial preset', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'lead', '/presets');
    const list = page.getByRole('region', { name: 'Manage house presets' });
    await list.getByRole('button', { name: 'Make default: Classic cuff' }).click();
    await list.getByRole('listitem').filter({ hasText: 'Classic cuff' }).getByText('House default').waitFor();
    page.once('dialog', (d) => d.accept());
    await list.getByRole('button', { name: `Remove: ${houseName}` }).click();
    await list.getByRole('listitem').filter({ hasText: houseName }).waitFor({ state: 'detached' });
    await page.context().close();
  });
});
