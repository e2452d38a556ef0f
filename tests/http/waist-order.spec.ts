// A shop whose lead chooses "waist first": a fitting that pins a leg with a waist change still to do
// is refused on that leg's pin, as JSON the fitting form marks the field with; the waist change alone
// is saved and the garment page's note says to pin once the waist is done. A fresh shop of its own,
// so the demo shop's settings stay as the other specs expect.
import { beforeAll, describe, expect, it } from 'vitest';
import { call, newShop } from './client';

let lead: string;
let garmentId: string;
const blank = { finish: 'plain' as const };
// Invented lengths: taken in 1 in at the waist (common practice (no source) that the waist moves the hem).
const waiting = { ...blank, waistChange: '-1', hemAllowance: '1 1/2' };

beforeAll(async () => {
  ({ cookie: lead } = await newShop('Waist First Tailoring'));
  const put = await call('PUT', '/api/bench-settings', { cookie: lead, body: { scale: 'in8', stepLabels: {}, waistOrder: 'waist-first' } });
  expect(put.status).toBe(200);
  expect(put.body.waistOrder).toBe('waist-first');
  const ticket = await call('POST', '/api/tickets', {
    cookie: lead,
    body: { customer: { name: 'Perpetua Lindqvist' }, garments: [{ description: 'Grey trousers' }] },
  });
  expect(ticket.status).toBe(201);
  const detail = await call('GET', `/api/tickets/${ticket.body.id}`, { cookie: lead });
  garmentId = detail.body.garments[0].id;
});

describe('PUT /api/garments/:id/measurements in a waist-first shop', () => {
  it('answers 422 with the pinned leg’s field named when a waist change is still to do', async () => {
    const r = await call('PUT', `/api/garments/${garmentId}/measurements`, {
      cookie: lead,
      body: { unit: 'in', legs: { left: { ...waiting, backPin: '31 1/2' }, right: waiting } },
    });
    expect(r.status).toBe(422);
    expect(Object.keys(r.body.issues)).toEqual(['legs.left.backPin']);
    expect(r.body.issues['legs.left.backPin']).toMatch(/waist first/);
  });

  it('saves the waist change with no pin, and the note says to pin once the waist is done', async () => {
    const r = await call('PUT', `/api/garments/${garmentId}/measurements`, { cookie: lead, body: { unit: 'in', legs: { left: waiting, right: waiting } } });
    expect(r.status).toBe(200);
    expect(r.body.waist.left).toMatchObject({ code: 'first', change: '-1 in', mark: '' });
  });
});
