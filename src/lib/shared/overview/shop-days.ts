// The shop's days in its own time zone: which calendar day a moment falls on, where each day begins
// (23 or 25 hours long on a clock-change day), and the overview's periods. Pure: Intl only, so the
// server, the tests and the SQL's day boundaries (passed in as instants) all read one definition.
import { DEFAULT_LOCALE } from '../i18n/languages';

/** The time zone of a shop that has not chosen one: the app's dates are written the British way. */
export const DEFAULT_TIME_ZONE = 'Europe/London';

/** The overview's periods, as chosen in the URL (`?period=`). */
export const PERIODS = ['week', '4w'] as const;
/** An overview period: this week (Monday to Sunday), or the last four weeks ending with this one. */
export type Period = (typeof PERIODS)[number];

/** True when the value names an overview period. */
export function isPeriod(value: unknown): value is Period {
  return typeof value === 'string' && (PERIODS as readonly string[]).includes(value);
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function dayFormatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    // en-CA writes dates as YYYY-MM-DD; the parts are read one by one anyway.
    f = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    formatters.set(timeZone, f);
  }
  return f;
}

/** True when Intl knows the name as an IANA time zone (e.g. "Europe/Berlin", "UTC"). */
export function isTimeZone(name: unknown): name is string {
  if (typeof name !== 'string' || name.length === 0 || name.length > 64) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** The calendar day (YYYY-MM-DD) a moment falls on in the time zone. */
export function dayOf(at: Date | number, timeZone: string): string {
  const parts = dayFormatter(timeZone).formatToParts(typeof at === 'number' ? at : at.getTime());
  const get = (type: string) => parts.find((p) => p.type === type)!.value;
  return `${get('year')}-${get('month')}-${get('day')}`;
}

/** The day `n` days after (or before) an ISO day, by the calendar alone. */
export function addDays(day: string, n: number): string {
  const [y, m, d] = day.split('-').map(Number);
  return new Date(Date.UTC(y!, m! - 1, d! + n)).toISOString().slice(0, 10);
}

/** The weekday of an ISO day, Monday 0 … Sunday 6. */
export function weekdayOf(day: string): number {
  const [y, m, d] = day.split('-').map(Number);
  return (new Date(Date.UTC(y!, m! - 1, d!)).getUTCDay() + 6) % 7;
}

/**
 * The first moment of a day in the time zone: usually local midnight, later where the clock skips
 * midnight (it jumps from 23:59 to 01:00). Found by bisection on the moment, so it holds for any
 * offset, however odd; a day's bucket runs from its first moment to the next day's.
 */
export function startOfDay(day: string, timeZone: string): Date {
  const [y, m, d] = day.split('-').map(Number);
  const midnightUtc = Date.UTC(y!, m! - 1, d!);
  // Every offset in use lies within ±15 h of UTC; a day longer than that margin cannot hide.
  let lo = midnightUtc - 16 * 3_600_000; // still the day before everywhere
  let hi = midnightUtc + 16 * 3_600_000; // already this day (or later) everywhere
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (dayOf(mid, timeZone) >= day) hi = mid;
    else lo = mid;
  }
  return new Date(hi);
}

/** The days' boundaries: the first moment of each day, then the first moment after the last day. */
export function dayBounds(days: readonly string[], timeZone: string): Date[] {
  if (days.length === 0) return [];
  return [...days.map((d) => startOfDay(d, timeZone)), startOfDay(addDays(days[days.length - 1]!, 1), timeZone)];
}

/** Which day's bucket a moment falls in (0-based), or -1 outside the bounds (as SQL's width_bucket − 1). */
export function bucketOf(at: Date | number, bounds: readonly Date[]): number {
  const t = typeof at === 'number' ? at : at.getTime();
  if (bounds.length < 2 || t < bounds[0]!.getTime() || t >= bounds[bounds.length - 1]!.getTime()) return -1;
  let i = 0;
  while (t >= bounds[i + 1]!.getTime()) i += 1;
  return i;
}

/** How many of the moments fall on each day; moments outside the days are left out. */
export function countByDay(moments: readonly (Date | number)[], bounds: readonly Date[]): number[] {
  const counts = new Array<number>(Math.max(bounds.length - 1, 0)).fill(0);
  for (const at of moments) {
    const i = bucketOf(at, bounds);
    if (i >= 0) counts[i]! += 1;
  }
  return counts;
}

/** The days of a period around today: this week is Monday to Sunday; four weeks end with this week's Sunday. */
export function periodDays(period: Period, today: string): string[] {
  const monday = addDays(today, -weekdayOf(today));
  const first = period === 'week' ? monday : addDays(monday, -21);
  const count = period === 'week' ? 7 : 28;
  return Array.from({ length: count }, (_, i) => addDays(first, i));
}

/** A day as the shop reads it on a chart or table: "Mon 30 Nov". */
export function dayLabel(day: string, locale: string = DEFAULT_LOCALE): string {
  const [y, m, d] = day.split('-').map(Number);
  return new Date(Date.UTC(y!, m! - 1, d!)).toLocaleDateString(locale, { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' });
}
