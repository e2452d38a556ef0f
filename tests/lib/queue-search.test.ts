// The queue's search box: ticket number and customer name as before, and now the customer's phone
// (digits, however written) and the garment's description.
import { describe, expect, it } from 'vitest';
import type { QueueRow } from '@/lib/shared/bench-types';
import { DEFAULT_QUEUE_FILTER, filterQueue } from '@/lib/shared/queue-filter';

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
  row('a', { ticketNumber: 1001, customerName: 'Quenby Marsh', customerPhone: '(555) 014-7788', description: 'Navy wool trousers, cuffs' }),
  row('b', { ticketNumber: 1002, customerName: 'Ottoline Fair', customerPhone: '555 019 2222', description: 'Grey chinos' }),
  // An apprentice's row carries no phone at all.
  row('c', { ticketNumber: 1003, customerName: 'Brannoc Hale', description: 'Linen trousers' }),
];
const found = (search: string) =>
  filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, search }, 'me', '2026-12-01')
    .map((r) => r.id)
    .sort();

describe('queue search', () => {
  it('finds by the customer phone, typed with or without spaces and dashes', () => {
    expect(found('014 7788')).toEqual(['a']);
    expect(found('0147788')).toEqual(['a']);
    expect(found('555-019')).toEqual(['b']);
  });

  it('finds by the garment description, in any case', () => {
    expect(found('chinos')).toEqual(['b']);
    expect(found('LINEN')).toEqual(['c']);
  });

  it('still finds by ticket number and customer name', () => {
    expect(found('T-1003')).toEqual(['c']);
    expect(found('quenby')).toEqual(['a']);
  });

  it('does not match a phone on fewer than 3 digits', () => {
    expect(found('55')).toEqual([]);
  });
});
