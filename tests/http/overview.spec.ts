// The overview over HTTP: the page and its JSON and CSV for the lead only, the CSV's rows the same
// figures as the JSON, a bad period refused with a message, and a new shop seeing none of the demo
// shop's figures.
import { beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, newShop, signIn } from './client';

const cookies: Record<string, string> = {};

beforeAll(async () => {
  for (const role of ['lead', 'tailor', 'apprentice', 'counter'] as const) cookies[role] = await signIn(DEMO[role]);
});

describe('the overview over HTTP', () => {
  it('opens for the lead only: the page, its JSON and its CSV', async () => {
    for (const path of ['/overview', '/api/overview', '/api/overview.csv']) {
      expect((await call('GET', path, { cookie: cookies.lead })).status, path).toBe(200);
      for (const role of ['tailor', 'apprentice', 'counter']) expect((await call('GET', path, { cookie: cookies[role] })).status, `${role} ${path}`).toBe(403);
    }
    expect((await call('GET', '/api/overview.csv')).status).toBe(401);
    const page = await call('GET', '/overview');
    expect(page.status).toBe(302);
    expect(page.headers.get('location')).toMatch(/^\/sign-in/);
  });

  it('sends text/csv named after the period, a row per day and a totals row holding the JSON figures', async () => {
    for (const period of ['week', '4w'] as const) {
      const json = (await call('GET', `/api/overview?period=${period}`, { cookie: cookies.lead })).body;
      const csv = await call('GET', `/api/overview.csv?period=${period}`, { cookie: cookies.lead });
      expect(csv.headers.get('content-type')).toBe('text/csv; charset=utf-8');
      const first = json.days[0].day;
      const last = json.days.at(-1).day;
      expect(csv.headers.get('content-disposition')).toBe(`attachment; filename="cuffwright-overview-${first}-to-${last}.csv"`);
      const lines = String(csv.body).trimEnd().split('\r\n');
      expect(lines).toHaveLength(json.days.length + 2);
      expect(lines[0]).toBe('date,taken_in,handed_over,due_done,due_open,overdue,takings_cash_EUR,takings_card_EUR,takings_online_EUR,takings_total_EUR');
      const rows = lines.slice(1).map((l) => l.split(','));
      for (const [i, d] of json.days.entries()) {
        const money = (m: string) => ((d.takings[m] ?? 0) / 100).toFixed(2);
        const total = (Object.values(d.takings) as number[]).reduce((a, b) => a + b, 0);
        expect(rows[i]).toEqual([
          d.day,
          ...[d.takenIn, d.handedOver, d.dueDone, d.dueOpen, d.overdue].map(String),
          money('cash'),
          money('card'),
          money('online'),
          (total / 100).toFixed(2),
        ]);
      }
      // The totals row is the sum of the days, and the takings total the JSON's per-method sums.
      const totals = rows.at(-1)!;
      expect(totals[0]).toBe('total');
      for (let c = 1; c <= 5; c++) expect(Number(totals[c])).toBe(rows.slice(0, -1).reduce((s, r) => s + Number(r[c]), 0));
      const taken = json.takings.reduce((s: number, t: { amountMinor: number }) => s + t.amountMinor, 0);
      expect(Number(totals.at(-1))).toBeCloseTo(taken / 100, 2);
    }
  });

  it('the demo shop shows seeded figures over four weeks', async () => {
    const o = (await call('GET', '/api/overview?period=4w', { cookie: cookies.lead })).body;
    expect(o.days.reduce((s: number, d: { takenIn: number }) => s + d.takenIn, 0)).toBeGreaterThan(0);
    expect(o.days.reduce((s: number, d: { handedOver: number }) => s + d.handedOver, 0)).toBeGreaterThan(0);
    // Other tests may pay online in the shared demo shop: card and cash are there whatever.
    expect(o.takings.map((t: { method: string }) => t.method)).toEqual(expect.arrayContaining(['card', 'cash']));
    expect(o.intakeToReady.averageDays).toBeGreaterThan(0);
  });

  it('refuses a period it does not know, and a time zone Intl does not know, with a message', async () => {
    const bad = await call('GET', '/api/overview.csv?period=year', { cookie: cookies.lead });
    expect(bad.status).toBe(422);
    expect(bad.body.issues.period).toMatch(/week/);
    const zone = await call('PUT', '/api/shop-time-zone', { cookie: cookies.lead, body: { timeZone: 'Mars/Olympus_Mons' } });
    expect(zone.status).toBe(422);
    expect(zone.body.issues.timeZone).toMatch(/time zone/);
  });

  it('a new shop sees its own empty overview, never the demo shop figures', async () => {
    const other = await newShop('Overview Other Alterations');
    const o = (await call('GET', '/api/overview?period=4w', { cookie: other.cookie })).body;
    expect(o.days.every((d: { takenIn: number; handedOver: number }) => d.takenIn === 0 && d.handedOver === 0)).toBe(true);
    expect(o.takings).toEqual([]);
    expect(o.waiting.every((w: { garments: number }) => w.garments === 0)).toBe(true);
    const csv = await call('GET', '/api/overview.csv?period=4w', { cookie: other.cookie });
    expect(String(csv.body).trimEnd().split('\r\n').at(-1)).toBe('total,0,0,0,0,0,0.00,0.00,0.00,0.00');
    // Its time zone is its own: choosing one changes nothing for the demo shop.
    expect((await call('PUT', '/api/shop-time-zone', { cookie: other.cookie, body: { timeZone: 'Pacific/Auckland' } })).body).toEqual({
      timeZone: 'Pacific/Auckland',
      chosen: true,
    });
    expect((await call('GET', '/api/overview', { cookie: other.cookie })).body.timeZone).toBe('Pacific/Auckland');
    expect((await call('GET', '/api/overview', { cookie: cookies.lead })).body.timeZone).toBe('Europe/London');
  });
});
