// Ready work waiting for its customer is not bench work: it stands apart with its own age ("ready 3
// days"), and only work not yet ready can be overdue (issue 15).
import { describe, expect, it } from 'vitest';
import type { QueueRow } from '@/lib/shared/bench-types';
import { DEFAULT_QUEUE_FILTER, filterQueue, queueSection, readyAge, workDueState } from '@/lib/shared/queue-filter';

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
  readyAt: null,
  ...over,
});
const TODAY = '2026-12-03';
const ROWS = [
  row('bench-late', { status: 'cut', dueOn: '2026-11-30' }),
  row('ready-late', { status: 'ready', dueOn: '2026-11-30', readyAt: '2026-11-30T10:00:00.000Z' }),
  row('gone-late', { status: 'collected', dueOn: '2026-11-30' }),
  row('bench-today', { status: 'pressed', dueOn: TODAY }),
];

describe('bench work and work waiting for pickup', () => {
  it('puts received … pressed at the bench, ready apart, collected in the history', () => {
    expect(ROWS.map(queueSection)).toEqual(['bench', 'waiting', 'collected', 'bench']);
  });

  it('calls only work not yet ready overdue or due today', () => {
    expect(ROWS.map((r) => workDueState(r, TODAY))).toEqual(['overdue', 'none', 'none', 'today']);
  });

  it('keeps ready and collected work out of the "Overdue" and "Today or overdue" filters', () => {
    const ids = (due: 'today' | 'overdue') => filterQueue(ROWS, { ...DEFAULT_QUEUE_FILTER, step: 'all', due }, 'me', TODAY).map((r) => r.id);
    expect(ids('overdue')).toEqual(['bench-late']);
    expect(ids('today')).toEqual(['bench-late', 'bench-today']);
  });

  it('counts a ready garment’s wait in whole days on the device’s calendar', () => {
    // Local noon, so the test reads the same in any time zone the machine has.
    const at = (d: string) => new Date(`${d}T12:00:00`).toISOString();
    expect(readyAge(at('2026-11-30'), TODAY)).toEqual({ days: 3, text: 'Ready 3 days' });
    expect(readyAge(at('2026-12-02'), TODAY)).toEqual({ days: 1, text: 'Ready 1 day' });
    expect(readyAge(at(TODAY), TODAY)).toEqual({ days: 0, text: 'Ready today' });
    // Across a month's end and a year's end (calendar days, not 24-hour spans).
    expect(readyAge(at('2026-12-31'), '2027-01-02')?.days).toBe(2);
    expect(readyAge(null, TODAY)).toBeNull();
  });
});
