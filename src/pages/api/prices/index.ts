// The shop's price list and counter settings: everyone at the counter reads it, the lead keeps it.
import { route } from '@/lib/server/route';
import { priceListInput } from '@/lib/shared/counter-request';
import { getPriceList, savePriceList } from '@/services/counter/prices';
import { priceListJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** The price list with currency, hours and the automatic-notice setting. */
export const GET = route(
  {
    summary: 'The price list with currency, opening hours, address and the automatic ready notice.',
    permission: ['prices', 'read'],
    responses: { 200: priceListJson },
  },
  ({ actor }) => getPriceList(actor),
);

/** Saves the whole list and the settings. */
export const PUT = route(
  {
    summary: 'Saves the whole price list and the counter settings (amounts in minor units: cents).',
    permission: ['prices', 'update'],
    body: priceListInput,
    examples: [
      {
        summary: 'Every line of the list, in euros',
        body: {
          currency: 'EUR',
          hours: 'Tue–Fri 9:00–18:00, Sat 9:00–13:00',
          location: '7 Bobbin Row, Wickhollow',
          autoReadyNotice: false,
          items: [
            { key: 'plain-hem', label: 'Plain hem', amountMinor: 1650 },
            { key: 'cuff-from-hem', label: 'Cuff from a plain hem', amountMinor: 2400 },
            { key: 'cuff-remake', label: 'Cuff let down and re-made', amountMinor: 2950 },
            { key: 'original-hem', label: 'Jeans, original hem kept', amountMinor: 2200 },
            { key: 'skirt-hem', label: 'Skirt or dress hem', amountMinor: 2600 },
            { key: 'sleeves-shorten', label: 'Jacket or coat sleeves shortened (the pair)', amountMinor: 3200 },
            { key: 'taper-let-out', label: 'Taper let-out at the cuff (per pair)', amountMinor: 1100 },
            { key: 'rush', label: 'Rush surcharge (per ticket)', amountMinor: 900 },
          ],
        },
      },
    ],
    responses: { 200: priceListJson },
  },
  ({ actor, body }) => savePriceList(actor, body),
);
