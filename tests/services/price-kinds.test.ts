// Issue 14, "The counter and the customers": the lead adds kinds of work to the price list (flat
// prices, rush or not), renames, re-prices and retires them (never deleted: old tickets keep their
// lines), every change in the history; the counter prices at intake, before any fitting, with one
// rush rule for every way a line comes onto a ticket. Shops never reach each other's kinds.
// Amounts are invented (cents).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', () => ({ BODY_IDLE_SECONDS: 20, PAYMENTS_API_KEY: undefined, PAYMENTS_API_BASE: undefined, PAYMENTS_WEBHOOK_SECRET: undefined }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { garments, measurements, priceLines, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const kinds = await import('@/services/counter/price-kinds');
const pay = await import('@/services/counter/payments');
const { createTicket } = await import('@/services/tickets');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
let b: Shop;
let zip = '';
let taper = '';
let press = '';

const live = <T extends { voidedAt: Date | null }>(rows: T[]) => rows.filter((l) => !l.voidedAt);
const ticketCount = async (shopId: string) => (await db.select().from(tickets).where(eq(tickets.shopId, shopId))).length;

beforeAll(async () => {
  a = await makeShop('Thimble Row Alterations');
  b = await makeShop('Other Bobbin Shop');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
  zip = (await kinds.addKind(a.lead, { name: 'Replace zip', amountMinor: 1500, rushApplies: true })).id;
  taper = (await kinds.addKind(a.lead, { name: 'Taper legs', amountMinor: 2200, rushApplies: true })).id;
  // A small job the shop never rushes for: it alone does not make a rush ticket.
  press = (await kinds.addKind(a.lead, { name: 'Press only', amountMinor: 500, rushApplies: false })).id;
});
afterAll(() => handle.close());

describe('kinds of work on the price list', () => {
  it('are the shop’s own, beside the eight worked-out lines', async () => {
    const list = await prices.getPriceList(a.counter);
    expect(list.items).toHaveLength(8);
    expect(list.kinds.map((k) => [k.name, k.amountMinor, k.rushApplies, k.retiredAt])).toEqual([
      ['Replace zip', 1500, true, null],
      ['Taper legs', 2200, true, null],
      ['Press only', 500, false, null],
    ]);
    expect((await prices.getPriceList(b.counter)).kinds).toEqual([]);
  });

  it('refuse a second live kind of the same name (letter case aside)', async () => {
    await expect(kinds.addKind(a.lead, { name: 'replace ZIP', amountMinor: 100, rushApplies: true })).rejects.toMatchObject({ status: 409 });
    // Another shop may use the name.
    await expect(kinds.addKind(b.lead, { name: 'Replace zip', amountMinor: 1400, rushApplies: true })).resolves.toMatchObject({ name: 'Replace zip' });
  });

  it('are renamed, re-priced and retired while old tickets keep their lines and wording', async () => {
    const k = await kinds.addKind(a.lead, { name: 'Take in waist', amountMinor: 1800, rushApplies: true });
    const t = await createTicket(a.counter, { garments: [{ description: 'Olive cords' }] });
    const line = await prices.addLine(a.counter, t.id, { source: 'kind', kindId: k.id });
    expect([line.label, line.amountMinor, line.kindId, line.source]).toEqual(['Take in waist', 1800, k.id, 'list']);
    await kinds.changeKind(a.lead, k.id, { name: 'Take in waist (centre back)', amountMinor: 2000 });
    const retired = await kinds.changeKind(a.lead, k.id, { retired: true });
    expect(retired.retiredAt).toBeInstanceOf(Date);
    const [kept] = await db.select().from(priceLines).where(eq(priceLines.id, line.id));
    expect([kept!.label, kept!.amountMinor]).toEqual(['Take in waist', 1800]);
    expect((await pay.counterSummary(a.counter, t.id)).total).toBe(1800);
    // Retired: off the counter's choices, still listed for the lead, after the live ones.
    await expect(prices.addLine(a.counter, t.id, { source: 'kind', kindId: k.id })).rejects.toMatchObject({
      status: 422,
      message: expect.stringContaining('retired'),
    });
    const list = await prices.getPriceList(a.lead);
    expect(list.kinds.at(-1)).toMatchObject({ id: k.id, name: 'Take in waist (centre back)', amountMinor: 2000 });
    // Brought back: usable again at its new price.
    await kinds.changeKind(a.lead, k.id, { retired: false });
    expect((await prices.addLine(a.counter, t.id, { source: 'kind', kindId: k.id })).amountMinor).toBe(2000);
  });

  it('are kept in the history: who, when, old → new, also for the worked-out lines', async () => {
    await prices.savePriceList(a.lead, {
      currency: 'EUR',
      hours: '',
      location: '',
      autoReadyNotice: false,
      items: TEST_PRICES.map((i) => (i.key === 'plain-hem' ? { ...i, amountMinor: 1900 } : i)),
    });
    await kinds.changeKind(a.lead, zip, { amountMinor: 1600 });
    const history = await kinds.priceHistory(a.lead);
    expect(history[0]).toMatchObject({
      action: 'price-kind.changed',
      actorName: 'lead of Thimble Row Alterations',
      line: 'Replace zip',
      changes: [{ field: 'amountMinor', from: 1500, to: 1600 }],
    });
    expect(Date.parse(history[0]!.at)).toBeGreaterThan(Date.now() - 60_000);
    expect(history.find((h) => h.action === 'price-item.changed')).toMatchObject({
      line: 'Plain hem',
      changes: [{ field: 'amountMinor', from: 1800, to: 1900 }],
    });
    expect(history.filter((h) => h.action === 'price-kind.added').map((h) => h.line)).toEqual(
      expect.arrayContaining(['Replace zip', 'Taper legs', 'Press only']),
    );
    // A change to nothing is no change: no entry.
    await kinds.changeKind(a.lead, zip, { amountMinor: 1600 });
    expect((await kinds.priceHistory(a.lead)).length).toBe(history.length);
    // The other shop sees only its own history.
    expect((await kinds.priceHistory(b.lead)).map((h) => h.line)).toEqual(['Replace zip']);
    await kinds.changeKind(a.lead, zip, { amountMinor: 1500 });
    await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
  });
});

describe('across shops', () => {
  it('another shop’s kind answers as one that does not exist, wherever its id is sent', async () => {
    const missing = '00000000-0000-4000-8000-000000000000';
    await expect(kinds.changeKind(b.lead, zip, { amountMinor: 1 })).rejects.toMatchObject({ status: 404 });
    const notFound = await kinds.changeKind(b.lead, missing, { amountMinor: 1 }).catch((e: Error) => e.message);
    const theirs = await kinds.changeKind(b.lead, zip, { amountMinor: 1 }).catch((e: Error) => e.message);
    expect(theirs).toBe(notFound);
    await expect(kinds.changeKind(b.lead, 'not-a-uuid', { amountMinor: 1 })).rejects.toMatchObject({ status: 404 });

    const tb = await createTicket(b.counter, { garments: [{ description: 'Rust chinos' }] });
    const refusal = (p: Promise<unknown>) =>
      p.then(
        () => [0, 'accepted'],
        (e: { status: number; message: string }) => [e.status, e.message],
      );
    const onTicket = await refusal(prices.addLine(b.counter, tb.id, { source: 'kind', kindId: zip }));
    const nothing = await refusal(prices.addLine(b.counter, tb.id, { source: 'kind', kindId: missing }));
    expect(onTicket).toEqual(nothing);
    expect(onTicket[0]).toBe(422);
    // Shop A's own kind on shop B's ticket: the ticket is not theirs, 404.
    await expect(prices.addLine(a.counter, tb.id, { source: 'kind', kindId: zip })).rejects.toMatchObject({ status: 404 });

    // At intake the whole ticket is refused, nothing half written.
    const before = await ticketCount(b.shopId);
    await expect(createTicket(b.counter, { garments: [{ description: 'Rust chinos', work: [zip] }] })).rejects.toMatchObject({ status: 422 });
    expect(await ticketCount(b.shopId)).toBe(before);
    expect(await kinds.changeKind(a.lead, zip, { name: 'Replace zip' })).toMatchObject({ amountMinor: 1500 });
  });

  it('the database itself refuses a line of one shop carrying another shop’s kind', async () => {
    const tb = await createTicket(b.counter, { garments: [{ description: 'Rust chinos' }] });
    await expect(
      db.insert(priceLines).values({ shopId: b.shopId, ticketId: tb.id, kindId: zip, source: 'list', label: 'Replace zip', amountMinor: 1500 }),
    ).rejects.toThrow();
  });
});

describe('pricing at intake', () => {
  it('prices the asked-for finish as an estimate and the kinds per garment, with a total before any fitting', async () => {
    const t = await createTicket(a.counter, {
      garments: [
        { description: 'Navy wool trousers', existingFinish: 'cuff', finish: 'cuff', work: [zip] },
        { description: 'Grey flannel', finish: 'hem' },
        { description: 'Black jeans', work: [taper, press] },
      ],
    });
    const lines = await prices.listLines(a.counter, t.id);
    expect(lines.map((l) => [l.label, l.amountMinor, l.source])).toEqual([
      // An old cuff is let down before the new one is made: the list's re-made line.
      ['Cuff let down and re-made — Navy wool trousers', 3200, 'auto'],
      ['Replace zip — Navy wool trousers', 1500, 'list'],
      ['Plain hem — Grey flannel', 1800, 'auto'],
      ['Taper legs — Black jeans', 2200, 'list'],
      ['Press only — Black jeans', 500, 'list'],
    ]);
    expect((await pay.counterSummary(a.counter, t.id)).total).toBe(3200 + 1500 + 1800 + 2200 + 500);
  });

  it('the fitting replaces the estimate; the kinds picked at intake stay', async () => {
    const t = await createTicket(a.counter, { garments: [{ description: 'Navy twill', finish: 'hem', work: [zip] }] });
    const [g] = await db.select().from(garments).where(eq(garments.ticketId, t.id));
    expect(g!.finish).toBe('hem');
    // The fitting decides a cuff whose leg narrows 1 in over 10 in: a let-out too.
    await db.insert(measurements).values({
      shopId: a.shopId,
      garmentId: g!.id,
      leg: 'left',
      unit: 'in',
      finish: 'cuff',
      values: {
        cuffDepth: { text: '1 1/2' },
        widthAtEdge: { text: '8' },
        widthAbove: { text: '9' },
        heightAbove: { text: '10' },
        seamAllowance: { text: '1' },
      },
    });
    const { lines } = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(live(lines).map((l) => [l.label, l.amountMinor])).toEqual([
      ['Replace zip — Navy twill', 1500],
      ['Cuff from a plain hem — Navy twill', 2600],
      ['Taper let-out — Navy twill', 1200],
    ]);
  });

  it('only the counter and the lead price at intake; a tailor may still take work in', async () => {
    await expect(createTicket(a.tailor, { garments: [{ description: 'Sand chinos', work: [zip] }] })).rejects.toMatchObject({ status: 422 });
    await expect(createTicket(a.tailor, { garments: [{ description: 'Sand chinos' }] })).resolves.toMatchObject({ shopId: a.shopId });
    await expect(createTicket(a.lead, { garments: [{ description: 'Sand chinos', finish: 'hem' }] })).resolves.toMatchObject({ shopId: a.shopId });
  });
});

describe('rush counts the same everywhere (RUSH_RULE), kinds of work included', () => {
  it('at intake: once per ticket with work rush applies to; refused on work it does not apply to', async () => {
    const t = await createTicket(a.counter, {
      rush: true,
      garments: [
        { description: 'Navy wool', work: [zip] },
        { description: 'Grey wool', work: [taper], finish: 'hem' },
      ],
    });
    const lines = await prices.listLines(a.counter, t.id);
    expect(lines.filter((l) => l.key === 'rush').map((l) => [l.garmentId, l.amountMinor])).toEqual([[null, 1000]]);
    expect(lines.at(-1)!.key).toBe('rush');
    const before = await ticketCount(a.shopId);
    await expect(createTicket(a.counter, { rush: true, garments: [{ description: 'Linen', work: [press] }] })).rejects.toMatchObject({ status: 422 });
    await expect(createTicket(a.counter, { rush: true, garments: [{ description: 'Linen' }] })).rejects.toMatchObject({ status: 422 });
    await expect(createTicket(a.counter, { rush: true })).rejects.toMatchObject({ status: 422 });
    expect(await ticketCount(a.shopId)).toBe(before);
  });

  it('at the counter: rush from the list needs work rush applies to, a kind’s as much as a hem', async () => {
    const t = await createTicket(a.counter, { garments: [{ description: 'Linen' }] });
    await prices.addLine(a.counter, t.id, { source: 'kind', kindId: press });
    await expect(prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' })).rejects.toMatchObject({ status: 422 });
    await prices.addLine(a.counter, t.id, { source: 'kind', kindId: zip });
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' });
    await expect(prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' })).rejects.toMatchObject({ status: 409 });
  });

  it('pricing from the garments: a kind’s line is work rush goes on, unless rush does not apply to it', async () => {
    const rushable = await createTicket(a.counter, { garments: [{ description: 'Linen', work: [zip] }] });
    const one = await prices.priceFromGarments(a.counter, rushable.id, { rush: true });
    expect(live(one.lines).map((l) => l.key ?? l.label)).toEqual(['Replace zip — Linen', 'rush']);
    const not = await createTicket(a.counter, { garments: [{ description: 'Linen', work: [press] }] });
    const none = await prices.priceFromGarments(a.counter, not.id, { rush: true });
    expect(live(none.lines).map((l) => l.key ?? l.label)).toEqual(['Press only — Linen']);
  });

  it('a kind changed to rush-free later leaves the lines already on tickets as they were', async () => {
    const t = await createTicket(a.counter, { garments: [{ description: 'Moleskin', work: [taper] }] });
    await kinds.changeKind(a.lead, taper, { rushApplies: false });
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' });
    expect(live(await prices.listLines(a.counter, t.id)).map((l) => l.key ?? l.label)).toEqual(['Taper legs — Moleskin', 'rush']);
    await kinds.changeKind(a.lead, taper, { rushApplies: true });
  });
});

describe('a price list sent with fewer lines than the list has (a client written before a line was added)', () => {
  it('saves the lines sent and keeps the rest as they were; a line sent twice is refused', async () => {
    const c = await makeShop('Older Till Alterations');
    await prices.savePriceList(c.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
    const before = await prices.getPriceList(c.lead);
    const kept = before.items.find((i) => i.key === 'original-hem')!;
    const fewer = TEST_PRICES.filter((i) => i.key !== 'original-hem').map((i) => (i.key === 'plain-hem' ? { ...i, amountMinor: i.amountMinor + 100 } : i));
    await prices.savePriceList(c.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: fewer });
    const after = await prices.getPriceList(c.lead);
    expect(after.items.find((i) => i.key === 'original-hem')).toEqual(kept);
    expect(after.items.find((i) => i.key === 'plain-hem')!.amountMinor).toBe(TEST_PRICES.find((i) => i.key === 'plain-hem')!.amountMinor + 100);
    const twice = [TEST_PRICES[0]!, TEST_PRICES[0]!];
    await expect(prices.savePriceList(c.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: twice })).rejects.toMatchObject({
      status: 422,
    });
  });
});
