// The lead's kinds of work on the price list: a new one ("Replace zip"), with a flat price.
import { priceKindInput } from '@/lib/shared/counter-request';
import { route } from '@/lib/server/route';
import { addKind } from '@/services/counter/price-kinds';
import { priceKindJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Adds a kind of work; 409 when a kind on the list already has that name. */
export const POST = route(
  {
    summary: 'Adds a kind of work with a flat price (minor units); 409 when a kind on the list has that name.',
    permission: ['prices', 'update'],
    body: priceKindInput,
    status: 201,
    examples: [{ summary: 'Shorten a lining', body: { name: 'Shorten a lining', amountMinor: 1400, rushApplies: true } }],
    responses: { 201: priceKindJson },
  },
  ({ actor, body }) => addKind(actor, body),
);
