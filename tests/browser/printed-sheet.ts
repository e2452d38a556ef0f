// The stories' last two steps, shared: print a garment's sheet from its page and read it back, and
// price a ticket from its garments at the counter.
import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';
import { flatText, pdfFile, squash } from '../lib/cut-sheet/poppler';
import { ready } from './browser';

/** Taps "Print cut sheet" on the garment page, checks a PDF came back, and returns the sheet's text squashed. */
export async function printSheetText(page: Page, garmentId: string): Promise<string> {
  const printed = page.waitForResponse((r) => /\/api\/garments\/[^/]+\/sheet$/.test(new URL(r.url()).pathname));
  await page.getByRole('button', { name: 'Print cut sheet' }).click();
  const response = await printed;
  expect(response.status()).toBe(200);
  expect(response.headers()['content-type']).toBe('application/pdf');
  const sheet = await page.request.get(`/api/garments/${garmentId}/sheet`);
  return squash(flatText(pdfFile(new Uint8Array(await sheet.body()))));
}

/** Reloads the ticket at the counter, prices it from its garments, and waits for the line and the total. */
export async function priceFromGarments(counter: Page, price: Locator, line: string, total: string): Promise<void> {
  await counter.reload();
  await ready(counter);
  await counter.getByRole('button', { name: 'Price from the garments' }).click();
  await price.getByText(line).waitFor();
  await expect(price.getByRole('row', { name: /Total/ }).textContent()).resolves.toContain(total);
}
