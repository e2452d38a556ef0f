// The shop's time zone, where its days begin and end (the overview counts by them).
import { route } from '@/lib/server/route';
import { timeZoneRequest } from '@/lib/shared/time-zone-request';
import { saveShopTimeZone, shopTimeZone } from '@/services/shop-time-zone';
import { shopTimeZoneJson } from '@/lib/server/answers/bench';

/** The shop's time zone and whether it was chosen (every member reads it). */
export const GET = route(
  { summary: "The shop's time zone and whether it was chosen.", permission: ['tickets', 'read'], responses: { 200: shopTimeZoneJson } },
  ({ actor }) => shopTimeZone(actor.shopId),
);

/** Saves the shop's time zone (the lead); 422 for a name Intl does not know. */
export const PUT = route(
  {
    summary: "Saves the shop's time zone (an IANA name such as Europe/London), where its days begin and end.",
    permission: ['settings', 'update'],
    body: timeZoneRequest,
    examples: [{ summary: 'London', body: { timeZone: 'Europe/London' } }],
    responses: { 200: shopTimeZoneJson },
  },
  ({ actor, body }) => saveShopTimeZone(actor, body.timeZone),
);
