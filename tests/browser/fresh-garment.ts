// A garment of its own for a story, so what the story changes touches no demo garment another reads.
import type { Page } from 'playwright-core';

/** Opens a ticket for `customer` with one garment (`more`: other intake fields) through the API, as the signed-in page; returns the garment's id. */
export async function freshGarment(page: Page, description: string, customer: string, more: Record<string, unknown> = {}): Promise<string> {
  return page.evaluate(
    async ({ description, customer, more }) => {
      const post = await fetch('/api/tickets', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ customer: { name: customer }, garments: [{ description, ...more }] }),
      });
      const ticket = await post.json();
      const detail = await (await fetch(`/api/tickets/${ticket.id}`)).json();
      return detail.garments[0].id as string;
    },
    { description, customer, more },
  );
}
