// The queue service (issue 15): a ready garment carries the moment it became ready (its last move
// to ready), bench work carries none; and the "Who" filter offers each role only what can match:
// an apprentice, who sees only their own and unassigned work, is offered nobody else's name.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { moveGarment } = await import('@/services/garments');
const { stepBackGarment } = await import('@/services/garment-step-back');
const { readQueue, queueWhoOptions } = await import('@/services/queue');
const { queueSection, workDueState } = await import('@/lib/shared/queue-filter');
const { makeShop } = await import('./fixtures');
const { openTicket } = await import('./garment-fixtures');

let a: Shop;
beforeAll(async () => {
  a = await makeShop('Queue Sections Shop');
});
afterAll(() => handle.close());

const open = async (actor: Shop['lead']) => (await readQueue(actor, { view: 'open', limit: 50 }, null)).rows!;

describe('ready work apart from bench work', () => {
  it('gives a ready garment the time of its last move to ready, and bench work none', async () => {
    const { garment: late } = await openTicket(a, { customer: { name: 'Ready Customer' }, garments: [{ description: 'Ready flannels', dueOn: '2020-01-06' }] });
    const { garment: bench } = await openTicket(a, { customer: { name: 'Bench Customer' }, garments: [{ description: 'Bench chinos', dueOn: '2020-01-06' }] });
    await moveGarment(a.lead, bench.id, 'marked');
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) await moveGarment(a.lead, late.id, to);
    // A wrong tap taken back and done again: the wait counts from the last time it became ready.
    await stepBackGarment(a.lead, late.id, 'ready');
    const before = Date.now();
    await moveGarment(a.lead, late.id, 'ready');
    const rows = await open(a.lead);
    const ready = rows.find((r) => r.id === late.id)!;
    const work = rows.find((r) => r.id === bench.id)!;
    expect(ready.readyAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
    expect(Date.parse(ready.readyAt!)).toBeGreaterThanOrEqual(before - 1000);
    expect(work.readyAt).toBeNull();
    // Both were wanted in 2020: only the bench work is overdue; the ready pair waits for pickup.
    expect([queueSection(work), workDueState(work, '2026-12-03')]).toEqual(['bench', 'overdue']);
    expect([queueSection(ready), workDueState(ready, '2026-12-03')]).toEqual(['waiting', 'none']);
  });
});

describe('the Who filter per role', () => {
  it('offers the lead and the tailor everyone, the unassigned and each other person by name', async () => {
    for (const actor of [a.lead, a.tailor]) {
      const values = (await queueWhoOptions(actor)).map((o) => o.value);
      expect(values.slice(0, 4)).toEqual(['all', 'mine-open', 'mine', 'nobody']);
      const others = [a.lead, a.tailor, a.apprentice, a.counter].filter((p) => p.userId !== actor.userId).map((p) => p.userId);
      expect(values.slice(4).sort()).toEqual(others.sort());
    }
  });

  it('offers the apprentice only their own and the unassigned work: no other person', async () => {
    const options = await queueWhoOptions(a.apprentice);
    expect(options.map((o) => o.value)).toEqual(['all', 'mine', 'nobody']);
    expect(options[0]!.label).toBe('Mine and unassigned');
    for (const p of [a.lead, a.tailor, a.counter]) expect(options.map((o) => o.value)).not.toContain(p.userId);
  });

  it('each option the apprentice is offered can match a row the apprentice sees', async () => {
    const { garment: mine } = await openTicket(a, {
      customer: { name: 'Apprentice Customer' },
      garments: [{ description: 'Apprentice pair', assigneeId: a.apprentice.userId }],
    });
    const rows = await open(a.apprentice);
    expect(rows.some((r) => r.id === mine.id)).toBe(true);
    expect(rows.every((r) => r.assigneeId === null || r.assigneeId === a.apprentice.userId)).toBe(true);
  });
});
