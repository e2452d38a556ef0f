// A wrong tap at the bench, taken back: in the queue a tap offers Undo for a few seconds (reached
// with the keyboard, announced politely), and the garment page has "Step back". The history shows
// each move on and each step back. Screenshots in test-results/step-back-*.png.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

/** Opens a ticket with one unassigned garment through the API, as the signed-in page. */
async function freshTicket(page: Page, description: string): Promise<{ number: number; garmentId: string }> {
  return page.evaluate(async (description) => {
    const post = await fetch('/api/tickets', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ customer: { name: 'Wystan Merrow' }, garments: [{ description }] }),
    });
    const ticket = await post.json();
    const detail = await (await fetch(`/api/tickets/${ticket.id}`)).json();
    return { number: ticket.number as number, garmentId: detail.garments[0].id as string };
  }, description);
}

describe('stepping back after a wrong tap', () => {
  it('undoes a tap in the queue from the keyboard, and steps back on the garment page; the history shows both', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const { number, garmentId } = await freshTicket(page, 'Heather tweed trousers');
    await page.reload();
    await ready(page);
    await page.getByLabel('Customer or ticket').fill(`PH ${number}`);
    await expect.poll(() => page.getByTestId('queue-row').count()).toBe(1);
    const row = page.getByTestId('queue-row');

    // The tap, by keyboard: focus stays on the button, Undo is the next stop.
    const mark = row.getByRole('button', { name: `Mark Chalk-marked: PH ${number} Heather tweed trousers` });
    await mark.focus();
    await page.keyboard.press('Enter');
    await row.getByRole('status').getByText('Marked Chalk-marked.').waitFor();
    await expect.poll(() => row.locator('td').nth(5).getByTestId('stage-name').textContent()).toBe('Chalk-marked');
    const undo = row.getByRole('button', { name: `Undo: step PH ${number} Heather tweed trousers back to Received` });
    await undo.waitFor();
    expect((await undo.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe(
      `Undo: step PH ${number} Heather tweed trousers back to Received`,
    );
    await page.screenshot({ path: 'test-results/step-back-undo.png' });
    await page.keyboard.press('Enter');
    await row.getByRole('status').getByText('Stepped back to Received.').waitFor();
    await expect.poll(() => row.locator('td').nth(5).getByTestId('stage-name').textContent()).toBe('Received');
    expect(await undo.count()).toBe(0);

    // On the garment page: a tap, then "Step back" a moment later.
    await page.goto(`/garments/${garmentId}`);
    await ready(page);
    await page.getByTestId('garment-step').getByText('Received').waitFor();
    // At "received" there is nothing to step back to.
    expect(await page.getByRole('button', { name: /^Step back/ }).count()).toBe(0);
    await page.getByRole('button', { name: 'Mark Chalk-marked' }).click();
    await page.getByTestId('garment-step').getByText('Chalk-marked').waitFor();
    // Undo is offered for a few seconds only, then the tap stands (Step back is still there).
    const pageUndo = page.getByRole('button', { name: /^Undo/ });
    await pageUndo.waitFor();
    await pageUndo.waitFor({ state: 'detached', timeout: 15_000 });
    await page.getByRole('button', { name: 'Step back to Received' }).click();
    await page.getByTestId('garment-step').getByText('Received').waitFor();
    await page.getByRole('status').getByText('Stepped back to Received.').waitFor();

    const history = page.getByTestId('history');
    await expect.poll(() => history.getByText('Moved from Received to Chalk-marked').count()).toBe(2);
    await expect.poll(() => history.getByText('Stepped back from Chalk-marked to Received').count()).toBe(2);
    expect(await history.getByText('Teodor Vasko').count()).toBeGreaterThanOrEqual(4);
    await page.screenshot({ path: 'test-results/step-back-garment.png', fullPage: true });
    await page.context().close();
  });
});
