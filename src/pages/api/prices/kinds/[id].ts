// One kind of work on the price list: renamed, re-priced, rush or not, retired or brought back.
import { priceKindPatch } from '@/lib/shared/counter-request';
import { route } from '@/lib/server/route';
import { changeKind } from '@/services/counter/price-kinds';
import { priceKindJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Changes the kind; another shop's kind is 404, like one that does not exist. Tickets keep their lines. */
export const PATCH = route(
  {
    summary: 'Renames, re-prices, retires or brings back a kind of work (amounts in minor units); tickets keep their lines.',
    permission: ['prices', 'update'],
    body: priceKindPatch,
    examples: [{ summary: 'A new price', body: { amountMinor: 1900 } }],
    responses: { 200: priceKindJson },
  },
  ({ actor, params, body }) => changeKind(actor, params.id!, body),
);
