// Due dates at the bench: overdue before today, due today, later, or none; read in local time.
import { describe, expect, it } from 'vitest';
import { dueState, dueText, todayIso } from '@/lib/shared/due-date';

describe('due dates', () => {
  it('stand against today as overdue, today, later or none', () => {
    expect(dueState('2026-11-30', '2026-12-01')).toBe('overdue');
    expect(dueState('2026-12-01', '2026-12-01')).toBe('today');
    expect(dueState('2026-12-02', '2026-12-01')).toBe('later');
    expect(dueState(null, '2026-12-01')).toBe('none');
  });

  it('compare across a month and a year end', () => {
    expect(dueState('2026-12-31', '2027-01-01')).toBe('overdue');
    expect(dueState('2027-01-01', '2026-12-31')).toBe('later');
  });

  it('take today from the local calendar, zero-padded', () => {
    expect(todayIso(new Date(2026, 0, 5, 23, 30))).toBe('2026-01-05');
  });

  it('read as the shop says them', () => {
    expect(dueText('2026-12-01')).toBe('Tue 1 Dec');
    expect(dueText(null)).toBe('No date');
  });
});
