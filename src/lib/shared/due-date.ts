// Due dates at the bench: overdue, due today or later, read against the device's own calendar.
import { DEFAULT_LOCALE } from '@/lib/shared/i18n/languages';

/** How a due date stands today. */
export type DueState = 'overdue' | 'today' | 'later' | 'none';

/** Today's date as YYYY-MM-DD in local time. */
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** Where a due date stands against today (ISO dates compare as text). */
export function dueState(dueOn: string | null, today = todayIso()): DueState {
  if (!dueOn) return 'none';
  return dueOn < today ? 'overdue' : dueOn === today ? 'today' : 'later';
}

/** A due date the way the shop says it: "Tue 1 Dec" (in the shop's language's locale, `noDate` when there is none). */
export function dueText(dueOn: string | null, locale: string = DEFAULT_LOCALE, noDate = 'No date'): string {
  if (!dueOn) return noDate;
  const d = new Date(`${dueOn}T12:00:00`);
  return d.toLocaleDateString(locale, { weekday: 'short', day: 'numeric', month: 'short' });
}
