// The ticket book's numbering: the shop's initials and the plain number, in one function.
import { describe, expect, it } from 'vitest';
import { shopInitials, ticketLabel, ticketSearchNumber } from '@/lib/shared/ticket-number';

describe('ticketLabel', () => {
  it('writes the shop initials and the plain number, as on a paper ticket book', () => {
    expect(ticketLabel(1001, 'Pinmark & Hem')).toBe('PH 1001');
    expect(ticketLabel(42, 'The Hem and Cuff Room')).toBe('HCR 42');
    expect(ticketLabel(7, 'Quillon Alterations of Northgate Lane')).toBe('QAN 7');
    expect(ticketLabel(1001, 'Pinmark & Hem')).not.toMatch(/^T-/);
  });

  it('falls back to "No." for a name without letters, and keeps other scripts', () => {
    expect(ticketLabel(1001, '  & 12 ')).toBe('No. 1001');
    expect(ticketLabel(1001, '')).toBe('No. 1001');
    expect(shopInitials('ателье Игла')).toBe('АИ');
    expect(shopInitials('The')).toBe('T');
  });
});

describe('ticketSearchNumber', () => {
  it('reads the number from the ways a ticket is typed into a search box', () => {
    for (const typed of ['PH 1001', 'ph1001', 'PH-1001', 'No. 1001', '1001', 'T-1001', ' 1001 ']) expect(ticketSearchNumber(typed)).toBe('1001');
    expect(ticketSearchNumber('Quenby')).toBeNull();
    expect(ticketSearchNumber('Pinmark 1001')).toBeNull();
  });
});
