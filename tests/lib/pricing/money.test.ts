// Money display and entry: integer minor units in, the shop's currency out, and back.
import { describe, expect, it } from 'vitest';
import { formatMoney, parseMoney } from '@/lib/pricing/money';

describe('formatMoney', () => {
  it('shows minor units in the currency with its decimals (ISO 4217: EUR 2, JPY 0)', () => {
    expect(formatMoney(4550, 'EUR')).toBe('€45.50');
    expect(formatMoney(0, 'GBP')).toBe('£0.00');
    expect(formatMoney(1200, 'JPY')).toBe('JP¥1,200');
  });
});

describe('parseMoney', () => {
  it('reads typed amounts into minor units, with a point or a comma', () => {
    expect(parseMoney('45.50', 'EUR')).toBe(4550);
    expect(parseMoney('45,5', 'EUR')).toBe(4550);
    expect(parseMoney('€ 12', 'EUR')).toBe(1200);
    expect(parseMoney('-5.00', 'EUR')).toBe(-500);
    expect(parseMoney('1200', 'JPY')).toBe(1200);
  });

  it('refuses what is not an amount, or has more decimals than the currency', () => {
    expect(parseMoney('', 'EUR')).toBeNull();
    expect(parseMoney('4.555', 'EUR')).toBeNull();
    expect(parseMoney('12.5', 'JPY')).toBeNull();
    expect(parseMoney('ten', 'EUR')).toBeNull();
  });
});
