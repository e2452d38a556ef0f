// "Same as last time": a returning customer's earlier fitting is offered per garment kind and
// copied into a new garment at intake or when a garment is added; never another customer's.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { createCustomer } = await import('@/services/customers');
const { previousFittings } = await import('@/services/fitting-copy');
const { addGarment, garmentsOfTicket } = await import('@/services/garments');
const { legsOf } = await import('@/services/measurements');
const { createTicket } = await import('@/services/tickets');
const { auditOf } = await import('@/services/audit');
const { makeShop } = await import('./fixtures');
const { createPreset } = await import('@/services/presets');
const { ticketLabel } = await import('@/lib/shared/ticket-number');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');

let a: Shop;
let b: Shop;
let customerId = '';
let lastGarment = '';
let lastTicket = 0;
let deepCuff = '';

beforeAll(async () => {
  a = await makeShop('Fitting Copy A');
  b = await makeShop('Fitting Copy B');
  customerId = (await createCustomer(a.counter, { name: 'Lune Abernath', phone: '555 020 1111' })).id;
  const { ticket, garment } = await openTicket(a, { customerId, garments: [{ description: 'Olive cords' }] });
  // Finished length and cuff depth: invented figures in the range of common practice (no source).
  deepCuff = (await createPreset(a.lead, { name: 'Deep cuff', scope: 'house', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 3/4' } })).id;
  await saveFitting(a.tailor, garment.id, fittingRequest({ backPin: '30 1/2', cuffDepth: '1 3/4', presetId: deepCuff }));
  lastGarment = garment.id;
  lastTicket = ticket.number;
});
afterAll(() => handle.close());

describe('same as last time', () => {
  it("offers the customer's last fitting with finished length, cuff depth and preset", async () => {
    const [f] = await previousFittings(a.counter, customerId);
    expect(f).toMatchObject({ garmentId: lastGarment, kind: 'trousers', description: 'Olive cords', ticketNumber: lastTicket, unit: 'in' });
    expect(f!.legs).toEqual([
      { leg: 'left', finish: 'cuff', preset: 'Deep cuff', finishedLength: '30 1/2', cuffDepth: '1 3/4' },
      { leg: 'right', finish: 'cuff', preset: 'Deep cuff', finishedLength: '30 1/2', cuffDepth: '1 3/4' },
    ]);
  });

  it('copies it into a garment taken in at intake, each value in the history', async () => {
    const t = await createTicket(a.counter, {
      customerId,
      garments: [{ description: 'Olive cords, again', fittingFrom: lastGarment }, { description: 'No fitting yet' }],
    });
    const [copied, plain] = await garmentsOfTicket(a.shopId, t.id);
    const legs = await legsOf(copied!.id);
    // The copy points at the same preset by id.
    expect(legs.map((l) => [l.leg, l.preset, l.presetId, l.values.backPin?.text, l.values.cuffDepth?.text])).toEqual([
      ['left', 'Deep cuff', deepCuff, '30 1/2', '1 3/4'],
      ['right', 'Deep cuff', deepCuff, '30 1/2', '1 3/4'],
    ]);
    expect(await legsOf(plain!.id)).toEqual([]);
    const history = await auditOf(a.shopId, [copied!.id], ['measurement.changed']);
    expect(history.filter((h) => h.detail.field === 'backPin').map((h) => h.detail.copiedFrom)).toEqual([
      ticketLabel(lastTicket, 'Fitting Copy A'),
      ticketLabel(lastTicket, 'Fitting Copy A'),
    ]);
  });

  it('copies it into a garment added to a ticket', async () => {
    const t = await createTicket(a.counter, { customerId, garments: [] });
    const g = await addGarment(a.counter, t.id, { description: 'Added later', dueOn: null, assigneeId: null, fittingFrom: lastGarment });
    expect((await legsOf(g.id)).map((l) => l.values.backPin?.text)).toEqual(['30 1/2', '30 1/2']);
  });

  it("refuses another customer's fitting, or another shop's, and opens no ticket", async () => {
    const other = (await createCustomer(a.counter, { name: 'Someone Else' })).id;
    await expect(createTicket(a.counter, { customerId: other, garments: [{ description: 'x', fittingFrom: lastGarment }] })).rejects.toMatchObject({
      status: 422,
    });
    await expect(
      createTicket(a.counter, { customer: { name: 'New Person' }, garments: [{ description: 'x', fittingFrom: lastGarment }] }),
    ).rejects.toMatchObject({ status: 422 });
    const theirs = (await createCustomer(b.counter, { name: 'Lune Abernath' })).id;
    await expect(previousFittings(b.counter, customerId)).rejects.toMatchObject({ status: 404 });
    await expect(createTicket(b.counter, { customerId: theirs, garments: [{ description: 'x', fittingFrom: lastGarment }] })).rejects.toMatchObject({
      status: 422,
    });
    expect(await previousFittings(a.counter, other)).toEqual([]);
  });
});
