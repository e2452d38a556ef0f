// The ticket page's "Add a garment" form when the server refuses a field the form let through:
// the server's message stands beside that field, tied to it, and nothing typed is lost.
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

describe('add a garment: the server’s field messages', () => {
  it('shows the refused due date beside the Due field and keeps the description', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const ticketId = await page.evaluate(async () => {
      const r = await fetch('/api/tickets', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ customer: { name: 'Hollis Fenwright' }, garments: [{ description: 'Rust corduroy trousers' }] }),
      });
      return (await r.json()).id as string;
    });
    await page.goto(`/tickets/${ticketId}`);
    await ready(page);

    // Forced: the request leaves with a date no calendar has, which the date input itself would never produce.
    let sent = '';
    await page.route('**/api/tickets/*/garments', async (route) => {
      const body = { ...route.request().postDataJSON(), dueOn: '2026-13-40' };
      sent = JSON.stringify(body);
      await route.continue({ postData: sent });
    });
    const form = page.getByRole('form', { name: 'Add a garment' });
    await form.getByLabel('Garment').fill('Second pair, grey twill');
    await form.getByLabel('Due').fill('2026-12-20');
    const answered = page.waitForResponse((r) => r.url().endsWith('/garments') && r.request().method() === 'POST');
    await form.getByRole('button', { name: 'Add garment' }).click();
    const answer = await answered;
    expect(answer.status()).toBe(422);
    const refusal = await answer.json();
    expect(sent).toContain('2026-13-40');

    const due = form.getByLabel('Due');
    await expect.poll(() => due.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await due.getAttribute('aria-describedby')) ?? '';
    expect(describedBy.split(' ')).toContain('add-due-error');
    expect(await page.locator('#add-due-error').textContent()).toBe(refusal.issues.dueOn);
    expect(refusal.issues.dueOn).toMatch(/date/i);
    expect(await form.getByLabel('Garment').inputValue()).toBe('Second pair, grey twill');
    expect(await form.getByLabel('Garment').getAttribute('aria-invalid')).toBeNull();
    await form.screenshot({ path: 'test-results/add-garment-server-error.png' });

    // Fixed and sent again without forcing: the garment joins the ticket.
    await page.unroute('**/api/tickets/*/garments');
    await form.getByRole('button', { name: 'Add garment' }).click();
    await page.getByRole('link', { name: 'Second pair, grey twill' }).waitFor();
    await page.context().close();
  });
});
