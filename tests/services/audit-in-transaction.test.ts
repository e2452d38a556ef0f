// Each audit entry is written in the transaction of the change it records: when the entry cannot be
// written (a crash between the two, or text PostgreSQL refuses), the change is not kept either, so
// nothing stands without its history and a client's retry cannot write it twice.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));
// The real audit, made to fail on demand (as a kill between the change and its entry would).
const failing = vi.hoisted(() => ({ on: false }));
vi.mock('@/services/audit', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/services/audit')>();
  const gate =
    <A extends unknown[], R>(fn: (...args: A) => R) =>
    (...args: A): R => {
      if (failing.on) throw new Error('audit entry lost');
      return fn(...args);
    };
  return { ...real, audit: gate(real.audit), auditMany: gate(real.auditMany) };
});

const { handle } = await import('@/db');
const { getGarment, moveGarment, updateGarment, addGarment, garmentsOfTicket } = await import('@/services/garments');
const { moveTicket, getTicket } = await import('@/services/tickets');
const { createCustomer, listCustomers } = await import('@/services/customers');
const { createPreset, listPresets } = await import('@/services/presets');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { openTicket, fittingRequest, saveFitting } = await import('./garment-fixtures');

let a: Shop;

beforeAll(async () => {
  a = await makeShop('Audit Shop');
});
afterAll(() => handle.close());

/** Runs the work with every audit entry failing; it must be refused. */
async function withAuditFailing(work: () => Promise<unknown>) {
  failing.on = true;
  try {
    await expect(work()).rejects.toThrow();
  } finally {
    failing.on = false;
  }
}

describe('audit entries share the change’s transaction', () => {
  it('a garment move whose entry is lost is not kept (no step without its history)', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Audit trousers' }] });
    await withAuditFailing(() => moveGarment(a.lead, garment.id, 'marked'));
    expect((await getGarment(a.lead, garment.id)).status).toBe('received');
  });

  it('a whole ticket moved, a garment edited or added: none kept without the entry', async () => {
    const { ticket, garment } = await openTicket(a, { garments: [{ description: 'Edit trousers' }] });
    await withAuditFailing(() => moveTicket(a.lead, ticket.id, 'marked'));
    expect((await getTicket(a.lead, ticket.id)).status).toBe('received');
    await withAuditFailing(() => updateGarment(a.lead, garment.id, { description: 'Changed' }));
    expect((await getGarment(a.lead, garment.id)).description).toBe('Edit trousers');
    await withAuditFailing(() => addGarment(a.lead, ticket.id, { description: 'Second pair', dueOn: null, assigneeId: null }));
    expect(await garmentsOfTicket(a.shopId, ticket.id)).toHaveLength(1);
  });

  it('a fitting, a customer and a preset: none kept without the entry', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Fitting trousers' }] });
    await withAuditFailing(() => saveFitting(a.tailor, garment.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2' })));
    expect((await fittingOf(a.tailor, garment.id)).legs).toHaveLength(0);
    await withAuditFailing(() => createCustomer(a.lead, { name: 'Lost Customer' }));
    expect((await listCustomers(a.lead)).map((c) => c.name)).not.toContain('Lost Customer');
    await withAuditFailing(() => createPreset(a.lead, { name: 'Lost preset', scope: 'house', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } }));
    expect((await listPresets(a.lead)).map((p) => p.name)).not.toContain('Lost preset');
  });

  it('a lone surrogate reaching the service (past no schema) leaves the garment as it was', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Plain trousers' }] });
    await expect(updateGarment(a.lead, garment.id, { description: 'pair \ud800' })).rejects.toThrow();
    expect((await getGarment(a.lead, garment.id)).description).toBe('Plain trousers');
  });
});
