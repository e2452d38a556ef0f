// The queue's filter, shared by the queue island and the morning's batch of cut sheets.
import { describe, expect, it } from 'vitest';
import type { QueueRow } from '@/lib/shared/bench-types';
import { DEFAULT_QUEUE_FILTER, filterQueue, queueSheetsHref } from '@/lib/shared/queue-filter';

const ME = 'user-me';
const row = (id: string, over: Partial<QueueRow>): QueueRow => ({
  id,
  description: 'Trousers',
  status: 'received',
  dueOn: null,
  assigneeId: null,
  assigneeName: null,
  ticketId: `t-${id}`,
  ticketNumber: 1000,
  customerName: null,
  ...over,
});

const ROWS = [
  row('a', { assigneeId: 'someone', dueOn: '2026-11-30', ticketNumber: 1001, customerName: 'Quenby' }),
  row('b', { assigneeId: ME, dueOn: '2026-12-03', ticketNumber: 1002 }),
  row('c', { dueOn: '2026-12-01', ticketNumber: 1003 }),
  row('d', { assigneeId: ME, dueOn: '2026-12-01', ticketNumber: 1004, status: 'collected' }),
  row('e', { assigneeId: ME, dueOn: '2026-11-29', ticketNumber: 1005 }),
];
const ids = (rows: QueueRow[]) => rows.map((r) => r.id);
const TODAY = '2026-12-01';

describe('filterQueue', () => {
  it('opens on everything not collected: own work, then unassigned, then the rest, earliest due first', () => {
    expect(ids(filterQueue(ROWS, DEFAULT_QUEUE_FILTER, ME, TODAY))).toEqual(['e', 'b', 'c', 'a']);
  });

  it('"mine-open" keeps own and unassigned work; "nobody" only unassigned; a user id only theirs', () => {
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, who: 'mine-open' }, ME, TODAY))).toEqual(['e', 'b', 'c']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, who: 'nobody' }, ME, TODAY))).toEqual(['c']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, who: 'someone' }, ME, TODAY))).toEqual(['a']);
  });

  it('"today" keeps due today and overdue; "overdue" only overdue, read against the day given', () => {
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, due: 'today' }, ME, TODAY))).toEqual(['e', 'c', 'a']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, due: 'overdue' }, ME, TODAY))).toEqual(['e', 'a']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, due: 'overdue' }, ME, '2026-11-30'))).toEqual(['e']);
  });

  it('searches the ticket number (as the shop writes it, bare, or the old T- form) and the customer name', () => {
    for (const search of ['PH 1003', 'ph1003', '1003', 'T-1003']) expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, search }, ME, TODAY))).toEqual(['c']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, search: 'quen' }, ME, TODAY))).toEqual(['a']);
  });

  it('"all" brings collected garments back; a step keeps only that step', () => {
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, step: 'all' }, ME, TODAY))).toEqual(['e', 'd', 'b', 'c', 'a']);
    expect(ids(filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, step: 'collected' }, ME, TODAY))).toEqual(['d']);
  });
});

describe('queueSheetsHref', () => {
  it('carries the filters and the device’s day, the search only when typed', () => {
    const href = new URL(queueSheetsHref({ step: 'cut', who: 'mine', due: 'today', search: ' Quenby ' }, TODAY), 'http://x');
    expect(href.pathname).toBe('/api/queue/sheets');
    expect(Object.fromEntries(href.searchParams)).toEqual({ step: 'cut', who: 'mine', due: 'today', today: TODAY, search: 'Quenby' });
    expect(new URL(queueSheetsHref(DEFAULT_QUEUE_FILTER, TODAY), 'http://x').searchParams.has('search')).toBe(false);
  });
});
