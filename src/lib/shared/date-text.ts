// Moments on screen (a payment, a photo, a notice, a fitting change) the one way the shop reads them.

import { DEFAULT_LOCALE } from '@/lib/shared/i18n/languages';

/** A moment as "1 Dec 2026, 14:05" (in `timeZone` when given: paper printed on the server names the
 * shop's zone, a screen reads the device's own); blank when there is none. */
export function dateTimeText(at: string | Date | null | undefined, timeZone?: string, locale: string = DEFAULT_LOCALE): string {
  return at ? new Date(at).toLocaleString(locale, { dateStyle: 'medium', timeStyle: 'short', timeZone }) : '';
}
