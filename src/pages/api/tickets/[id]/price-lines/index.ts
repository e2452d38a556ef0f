// A ticket's price lines: read them, or add one from the list or an adjustment with its reason.
import { route } from '@/lib/server/route';
import { lineInput } from '@/lib/shared/counter-request';
import { addLine, listLines } from '@/services/counter/prices';
import { priceLineJson } from '@/db/schema/prices';
import { z } from 'zod';

export const prerender = false;

/** The ticket's lines. */
export const GET = route(
  { summary: "The ticket's price lines.", permission: ['prices', 'read'], responses: { 200: z.array(priceLineJson) } },
  ({ actor, params }) => listLines(actor, params.id!),
);

/** Adds a line from the list, or an adjustment with its reason. */
export const POST = route(
  {
    summary: 'Adds a line from the price list, an adjustment with its reason, or "no charge" with its reason.',
    permission: ['prices', 'adjust'],
    body: lineInput,
    status: 201,
    examples: [
      { summary: 'A cuff from the list', body: { source: 'list', key: 'cuff-from-hem' } },
      { summary: 'A 1.00 reduction', body: { source: 'adjust', label: 'Loyal customer', amountMinor: -100, reason: 'Third pair this month' } },
    ],
    responses: { 201: priceLineJson },
  },
  ({ actor, params, body }) => addLine(actor, params.id!, body),
);
