// The queue's filters as one pure function: the queue island narrows its table with it and the
// morning's batch of cut sheets (GET /api/queue/sheets) picks its garments with it, so "filtered
// as on screen" is the same code on both sides. No zod here: it ships in the queue's island.
import { dueState, type DueState } from './due-date';
import type { QueueRow, WhoOption } from './bench-types';
import type { GarmentStep } from './garment-steps';
import { ticketSearchNumber } from './ticket-number';

/** What the queue is narrowed to. */
export interface QueueFilter {
  /** 'open' = everything not yet collected */
  step: 'open' | 'all' | GarmentStep;
  /** 'all', 'mine', 'mine-open' (mine and unassigned), 'nobody', or a user id */
  who: string;
  due: 'all' | 'today' | 'overdue';
  search: string;
}

/** The filters the queue opens with. */
export const DEFAULT_QUEUE_FILTER: QueueFilter = { step: 'open', who: 'all', due: 'all', search: '' };

/** True when the row passes the filters for this user on this day. */
export function matchesQueue(row: QueueRow, f: QueueFilter, userId: string, today: string): boolean {
  if (f.step === 'open' ? row.status === 'collected' : f.step !== 'all' && row.status !== f.step) return false;
  if (f.who === 'mine' && row.assigneeId !== userId) return false;
  if (f.who === 'mine-open' && row.assigneeId !== userId && row.assigneeId !== null) return false;
  if (f.who === 'nobody' && row.assigneeId !== null) return false;
  if (!['all', 'mine', 'mine-open', 'nobody'].includes(f.who) && row.assigneeId !== f.who) return false;
  const due = workDueState(row, today);
  if (f.due === 'overdue' && due !== 'overdue') return false;
  if (f.due === 'today' && due !== 'today' && due !== 'overdue') return false;
  if (f.search.trim() && !matchesSearch(row, f.search)) return false;
  return true;
}

/** Where a row stands in the queue: still at the bench, ready and waiting for its customer (the
 * counter's work), or collected (history). */
export type QueueSection = 'bench' | 'waiting' | 'collected';

/** The queue section of a row, by its step. */
export function queueSection(row: Pick<QueueRow, 'status'>): QueueSection {
  return row.status === 'ready' ? 'waiting' : row.status === 'collected' ? 'collected' : 'bench';
}

/** The due state of the work itself: only work not yet ready can be late or due today; a ready or
 * collected garment is done at the bench whatever its date said ('none'). */
export function workDueState(row: Pick<QueueRow, 'status' | 'dueOn'>, today: string): DueState {
  return queueSection(row) === 'bench' ? dueState(row.dueOn, today) : 'none';
}

/** How long a ready garment has waited for its customer, in calendar days on this device, and in
 * words ("Ready 3 days"); null when the moment it became ready is not known. */
export function readyAge(readyAt: string | null | undefined, today: string): { days: number; text: string } | null {
  if (!readyAt) return null;
  const at = new Date(readyAt);
  if (Number.isNaN(at.getTime())) return null;
  // Both days as UTC midnights of their local calendar dates: whole days, whatever the clock change.
  const [y, m, d] = today.split('-').map(Number) as [number, number, number];
  const days = Math.max(0, Math.round((Date.UTC(y, m - 1, d) - Date.UTC(at.getFullYear(), at.getMonth(), at.getDate())) / 86_400_000));
  return { days, text: days === 0 ? 'Ready today' : `Ready ${days} ${days === 1 ? 'day' : 'days'}` };
}

/** The "Tailor" filter's choices for a role: with every garment in sight (read-all) everyone,
 * the unassigned and each other person; otherwise (the apprentice sees only their own and
 * unassigned work) only what can match: no one else's name, and "everything" is "mine and unassigned". */
export function whoOptions(seesAll: boolean, people: { userId: string; name: string }[], userId: string): WhoOption[] {
  if (!seesAll)
    return [
      { value: 'all', label: 'Mine and unassigned' },
      { value: 'mine', label: 'Mine' },
      { value: 'nobody', label: 'Unassigned' },
    ];
  return [
    { value: 'all', label: 'Everyone' },
    { value: 'mine-open', label: 'Mine and unassigned' },
    { value: 'mine', label: 'Mine' },
    { value: 'nobody', label: 'Unassigned' },
    ...people.filter((p) => p.userId !== userId).map((p) => ({ value: p.userId, label: p.name })),
  ];
}

/** True when the typed search names the row: its ticket number (T- optional), customer name,
 * garment description, or (3 digits at least, however written) the customer's phone. */
export function matchesSearch(row: QueueRow, search: string): boolean {
  const typed = search.trim().toLowerCase();
  // A ticket number as the shop writes it ("PH 1001"), bare, or in the old "T-1001" form.
  const number = ticketSearchNumber(typed);
  const digits = typed.replace(/\D+/g, '');
  return (
    (number !== null && String(row.ticketNumber).includes(number)) ||
    (row.customerName ?? '').toLowerCase().includes(typed) ||
    row.description.toLowerCase().includes(typed) ||
    (digits.length >= 3 && (row.customerPhone ?? '').replace(/\D+/g, '').includes(digits))
  );
}

/** 0 own work, 1 unassigned, 2 someone else's: the queue's first sort key. */
export function queueRank(row: QueueRow, userId: string): 0 | 1 | 2 {
  return row.assigneeId === userId ? 0 : row.assigneeId === null ? 1 : 2;
}

/** The rows the queue shows, in its opening order: own work, unassigned, the rest; earliest due first. */
export function filterQueue(rows: QueueRow[], f: QueueFilter, userId: string, today: string): QueueRow[] {
  const due = (r: QueueRow) => r.dueOn ?? '9999-12-31';
  // Array.prototype.sort is stable: ties keep the server's order (due, ticket, position).
  return rows
    .filter((r) => matchesQueue(r, f, userId, today))
    .sort((a, b) => queueRank(a, userId) - queueRank(b, userId) || (due(a) < due(b) ? -1 : due(a) > due(b) ? 1 : 0));
}

/** The address of the filtered queue's cut sheets (GET /api/queue/sheets), carrying the device's day. */
export function queueSheetsHref(f: QueueFilter, today: string): string {
  const q = new URLSearchParams({ step: f.step, who: f.who, due: f.due, today });
  if (f.search.trim()) q.set('search', f.search.trim());
  return `/api/queue/sheets?${q}`;
}
