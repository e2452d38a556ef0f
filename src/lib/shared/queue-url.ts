// The queue's filters, sort and search in the page's address (?step=cut&who=…&due=…&search=…&sort=-due),
// so a reload or a shared link opens the same queue. Defaults stay out of the address; anything
// not understood (an old link, a person the reader is not offered) falls back to the default.
import { GARMENT_STEPS } from './garment-steps';
import { DEFAULT_QUEUE_FILTER, type QueueFilter } from './queue-filter';

/** One sort key as TanStack Table holds it (column id, descending or not). */
export interface QueueSortKey {
  id: string;
  desc: boolean;
}

/** The queue's columns that sort, by id (the table's column ids). */
export const QUEUE_SORT_COLUMNS = ['rank', 'due', 'ticketNumber', 'customer', 'description', 'step', 'waiting'] as const;

/** The opening order: own work, unassigned, the rest; earliest due first. */
export const DEFAULT_QUEUE_SORT: QueueSortKey[] = [
  { id: 'rank', desc: false },
  { id: 'due', desc: false },
];

const STEPS: readonly string[] = ['open', 'all', ...GARMENT_STEPS];
const DUES: readonly string[] = ['all', 'today', 'overdue'];

/** The filters and sort an address asks for; `who` only among the values the reader is offered. */
export function readQueueUrl(search: string, who: readonly string[]): { filter: QueueFilter; sort: QueueSortKey[] } {
  const q = new URLSearchParams(search);
  const pick = <T extends string>(key: string, allowed: readonly string[], fallback: T): T => {
    const v = q.get(key);
    return v !== null && allowed.includes(v) ? (v as T) : fallback;
  };
  const filter: QueueFilter = {
    step: pick('step', STEPS, DEFAULT_QUEUE_FILTER.step),
    who: pick('who', who, DEFAULT_QUEUE_FILTER.who),
    due: pick('due', DUES, DEFAULT_QUEUE_FILTER.due),
    search: (q.get('search') ?? '').slice(0, 200),
  };
  const sort = (q.get('sort') ?? '')
    .split(',')
    .map((k) => ({ id: k.replace(/^-/, ''), desc: k.startsWith('-') }))
    .filter((k, i, all) => (QUEUE_SORT_COLUMNS as readonly string[]).includes(k.id) && all.findIndex((o) => o.id === k.id) === i);
  return { filter, sort: sort.length ? sort : DEFAULT_QUEUE_SORT };
}

/** The address's query for these filters and sort ('' for the default queue), to pass to history.replaceState. */
export function queueUrlSearch(f: QueueFilter, sort: readonly QueueSortKey[]): string {
  const q = new URLSearchParams();
  if (f.step !== DEFAULT_QUEUE_FILTER.step) q.set('step', f.step);
  if (f.who !== DEFAULT_QUEUE_FILTER.who) q.set('who', f.who);
  if (f.due !== DEFAULT_QUEUE_FILTER.due) q.set('due', f.due);
  if (f.search) q.set('search', f.search);
  const keys = sort.map((k) => `${k.desc ? '-' : ''}${k.id}`).join(',');
  if (keys !== DEFAULT_QUEUE_SORT.map((k) => k.id).join(',')) q.set('sort', keys);
  const s = q.toString();
  return s ? `?${s}` : '';
}
