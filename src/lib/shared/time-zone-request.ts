// The shop's time zone as the lead sends it: an IANA name Intl knows (checked again by the service).
import { z } from 'zod';
import { isTimeZone } from './overview/shop-days';
import { text } from './text';

/** PUT /api/shop-time-zone's body. */
export const timeZoneRequest = z.object({
  timeZone: text().trim().refine(isTimeZone, 'Choose a time zone this server knows, like Europe/London.'),
});
