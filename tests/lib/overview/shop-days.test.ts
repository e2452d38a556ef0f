// The shop's days in its time zone: properties over generated moments and zones, and the clock-change
// days checked one by one. The DST dates are from the zones' published rules (IANA tz database, as
// Node's ICU carries it): London 29 Mar and 25 Oct 2026, New York 8 Mar and 1 Nov 2026, Santiago
// skips midnight on 6 Sep 2026.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addDays, bucketOf, countByDay, dayBounds, dayOf, isTimeZone, periodDays, startOfDay, weekdayOf } from '@/lib/shared/overview/shop-days';

// Zones with whole-hour, half-hour and 45-minute offsets, 30-minute DST (Lord Howe) and a clock
// that skips midnight (Santiago). Left out: zones that once turned the clock back across midnight
// (São Paulo before 2019, Tehran before 2022), where an hour of day D-1 repeats after D began; there
// the rule "a day runs from its first moment to the next day's" puts that hour in D.
const ZONES = [
  'UTC',
  'Europe/London',
  'America/New_York',
  'Australia/Lord_Howe',
  'Asia/Kolkata',
  'Asia/Kathmandu',
  'Pacific/Chatham',
  'America/Santiago',
  'Europe/Berlin',
];
const zone = fc.constantFrom(...ZONES);
const FROM = Date.UTC(2015, 0, 1);
const TO = Date.UTC(2032, 0, 1);
const moment = fc.integer({ min: FROM, max: TO });
const aDay = fc.integer({ min: 0, max: 6000 }).map((n) => addDays('2015-01-05', n));
const HOUR = 3_600_000;

describe('a shop day in its time zone', () => {
  it('every moment lands in exactly one day bucket, the day it falls on', () => {
    fc.assert(
      fc.property(zone, moment, (tz, at) => {
        const day = dayOf(at, tz);
        const days = [addDays(day, -1), day, addDays(day, 1)];
        const bounds = dayBounds(days, tz);
        const holding = days.filter((_, i) => bounds[i]!.getTime() <= at && at < bounds[i + 1]!.getTime());
        expect(holding).toEqual([day]);
        expect(bucketOf(at, bounds)).toBe(1);
      }),
    );
  });

  it('the totals equal the sum of the day buckets, and moments outside the days count nowhere', () => {
    fc.assert(
      fc.property(zone, aDay, fc.integer({ min: 1, max: 28 }), fc.array(moment, { maxLength: 60 }), (tz, first, n, extra) => {
        const days = Array.from({ length: n }, (_, i) => addDays(first, i));
        const bounds = dayBounds(days, tz);
        const start = bounds[0]!.getTime();
        const end = bounds[n]!.getTime();
        // Half the moments inside the period, the rest anywhere.
        const inside = extra.map((t) => start + (Math.abs(t) % (end - start)));
        const moments = [...inside, ...extra];
        const counts = countByDay(moments, bounds);
        const expected = moments.filter((t) => t >= start && t < end).length;
        expect(counts.reduce((a, b) => a + b, 0)).toBe(expected);
        for (const [i, c] of counts.entries()) expect(c).toBe(moments.filter((t) => dayOf(t, tz) === days[i] && t >= start && t < end).length);
      }),
    );
  });

  it('days follow one another without gap or overlap, each 23 to 25 hours long', () => {
    fc.assert(
      fc.property(zone, aDay, (tz, first) => {
        const days = Array.from({ length: 8 }, (_, i) => addDays(first, i));
        const bounds = dayBounds(days, tz);
        for (let i = 0; i < days.length; i++) {
          const length = bounds[i + 1]!.getTime() - bounds[i]!.getTime();
          expect(length).toBeGreaterThanOrEqual(23 * HOUR);
          expect(length).toBeLessThanOrEqual(25 * HOUR);
          // The first moment is the day's; the moment before it is the day before's.
          expect(dayOf(bounds[i]!, tz)).toBe(days[i]);
          expect(dayOf(bounds[i]!.getTime() - 1, tz)).toBe(addDays(days[i]!, -1));
        }
      }),
    );
  });

  it('the clock-change days are 23 and 25 hours long (London, New York)', () => {
    const length = (day: string, tz: string) => (startOfDay(addDays(day, 1), tz).getTime() - startOfDay(day, tz).getTime()) / HOUR;
    expect(length('2026-03-29', 'Europe/London')).toBe(23);
    expect(length('2026-10-25', 'Europe/London')).toBe(25);
    expect(length('2026-10-24', 'Europe/London')).toBe(24);
    expect(length('2026-03-08', 'America/New_York')).toBe(23);
    expect(length('2026-11-01', 'America/New_York')).toBe(25);
    // 00:30 BST on the day after the spring change is 23:30 UTC the evening before.
    expect(dayOf(new Date('2026-03-29T23:30:00Z'), 'Europe/London')).toBe('2026-03-30');
    expect(dayOf(new Date('2026-03-29T23:30:00Z'), 'UTC')).toBe('2026-03-29');
  });

  it('a day whose midnight the clock skips starts at 01:00 (Santiago, 6 Sep 2026)', () => {
    // Chile's winter offset is −4 h: 01:00 summer time (−3 h) on 6 Sep is 04:00 UTC.
    expect(startOfDay('2026-09-06', 'America/Santiago').toISOString()).toBe('2026-09-06T04:00:00.000Z');
    expect(startOfDay('2026-09-05', 'America/Santiago').toISOString()).toBe('2026-09-05T04:00:00.000Z');
  });
});

describe('the overview periods', () => {
  it('this week is Monday to Sunday around today; four weeks end with the same Sunday', () => {
    fc.assert(
      fc.property(aDay, (today) => {
        const week = periodDays('week', today);
        const four = periodDays('4w', today);
        expect(week).toHaveLength(7);
        expect(four).toHaveLength(28);
        expect(weekdayOf(week[0]!)).toBe(0);
        expect(weekdayOf(four[0]!)).toBe(0);
        expect(week).toContain(today);
        expect(four.slice(21)).toEqual(week);
      }),
    );
  });

  it('1 Dec 2026 is a Tuesday: its week runs from 30 Nov to 6 Dec', () => {
    expect(periodDays('week', '2026-12-01')).toEqual(['2026-11-30', '2026-12-01', '2026-12-02', '2026-12-03', '2026-12-04', '2026-12-05', '2026-12-06']);
  });

  it('time zones are checked with Intl', () => {
    for (const tz of ['Europe/London', 'UTC', 'Asia/Kathmandu', 'America/Argentina/Buenos_Aires']) expect(isTimeZone(tz), tz).toBe(true);
    for (const bad of ['', 'Mars/Olympus', 'Europe/Lon don', 'GMT+25', 'x'.repeat(80), 42, null]) expect(isTimeZone(bad), String(bad)).toBe(false);
  });
});
