// Fresh rows of the demo shop for the API document's examples (open-api.spec.ts): each operation
// whose path names ids gets what its example needs, made by the demo lead through the API itself.
import { expect } from 'vitest';
import { call, freshEmail } from './client';
import { sampleJpeg, upload } from './photo-upload';

type Ids = Record<string, string>;

/** Makes fixtures as the holder of `lead` (the demo shop's lead). */
export function fixtures(lead: string) {
  const ok = async (method: string, path: string, body?: unknown, status = [200, 201]) => {
    const r = await call(method, path, { cookie: lead, body });
    expect(status, `${method} ${path}: ${JSON.stringify(r.body)}`).toContain(r.status);
    return r.body;
  };
  /** A new customer with an e-mail address (receipts and notices go somewhere). */
  const customer = async (): Promise<string> => (await ok('POST', '/api/customers', { name: 'Example Customer', email: freshEmail('example') })).id;
  /** A new ticket at "received" with one unassigned garment, for a customer with an address. */
  const ticket = async (): Promise<string> =>
    (await ok('POST', '/api/tickets', { customerId: await customer(), note: 'open-api example', garments: [{ description: 'Example trousers' }] })).id;
  const moved = async (id: string, ...steps: string[]): Promise<string> => {
    for (const status of steps) await ok('PATCH', `/api/tickets/${id}`, { status });
    return id;
  };
  const garmentOf = async (ticketId: string): Promise<string> => (await ok('GET', `/api/tickets/${ticketId}`)).garments[0].id;
  /** A skirt, fitted once (kind_fittings), on a new ticket. */
  const skirt = async (): Promise<string> =>
    garmentOf((await ok('POST', '/api/tickets', { customerId: await customer(), garments: [{ description: 'Example skirt', kind: 'skirt' }] })).id);
  const fitted = async (): Promise<string> => {
    const id = await garmentOf(await moved(await ticket(), 'marked'));
    await ok('PUT', `/api/garments/${id}/measurements`, {
      unit: 'in',
      legs: {
        left: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', available: '5' },
        right: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', available: '5' },
      },
    });
    return id;
  };
  const priced = async (): Promise<string> => {
    const id = await moved(await ticket(), 'marked');
    await ok('POST', `/api/tickets/${id}/price-lines`, { source: 'list', key: 'cuff-from-hem' });
    return id;
  };
  const ready = () => ticket().then((id) => moved(id, 'marked', 'cut', 'stitched', 'pressed', 'ready'));
  const invitation = async (): Promise<string> => (await ok('POST', '/api/staff', { email: freshEmail('invitee'), role: 'counter' })).id;
  const photo = async (): Promise<string> => {
    const r = await upload(lead, await garmentOf(await ticket()), [{ name: 'example.jpg', bytes: await sampleJpeg(64, 48) }]);
    expect(r.status).toBe(201);
    return r.body[0].id;
  };

  /** "METHOD /api/path/{param}" → the path parameters its example needs. */
  const byOperation: Record<string, () => Promise<Ids>> = {
    'GET /api/customers/{id}': async () => ({ id: await customer() }),
    'PATCH /api/customers/{id}': async () => ({ id: await customer() }),
    'POST /api/customers/{id}/erase': async () => ({ id: await customer() }),
    'GET /api/customers/{id}/file': async () => ({ id: await customer() }),
    'GET /api/customers/{id}/fittings': async () => ({ id: await customer() }),
    'GET /api/garments/{id}': async () => ({ id: await garmentOf(await ticket()) }),
    'PATCH /api/garments/{id}': async () => ({ id: await garmentOf(await ticket()) }),
    'GET /api/garments/{id}/measurements': async () => ({ id: await garmentOf(await ticket()) }),
    'PUT /api/garments/{id}/measurements': async () => ({ id: await garmentOf(await ticket()) }),
    'GET /api/garments/{id}/kind-fitting': async () => ({ id: await skirt() }),
    'PUT /api/garments/{id}/kind-fitting': async () => ({ id: await skirt() }),
    'GET /api/garments/{id}/photos': async () => ({ id: await garmentOf(await ticket()) }),
    'GET /api/garments/{id}/sheet': async () => ({ id: await fitted() }),
    // The examples move a garment from "marked": cut on, or back to received.
    'POST /api/garments/{id}/step': async () => ({ id: await garmentOf(await moved(await ticket(), 'marked')) }),
    'POST /api/garments/{id}/step-back': async () => ({ id: await garmentOf(await moved(await ticket(), 'marked')) }),
    'GET /api/invitations/{id}': async () => ({ id: await invitation() }),
    'POST /api/invitations/{id}/accept': async () => ({ id: await invitation() }),
    'GET /api/photos/{id}': async () => ({ id: await photo() }),
    'DELETE /api/photos/{id}': async () => ({ id: await photo() }),
    'GET /api/photos/{id}/thumb': async () => ({ id: await photo() }),
    'PATCH /api/presets/{id}': async () => ({
      id: (await ok('POST', '/api/presets', { name: freshEmail('preset'), scope: 'personal', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } }))
        .id,
    }),
    // A house preset, which every member may read (a colleague's own is hidden from the others).
    'GET /api/presets/{id}/history': async () => ({
      id: (await ok('POST', '/api/presets', { name: freshEmail('house'), scope: 'house', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } })).id,
    }),
    'DELETE /api/presets/{id}': async () => ({
      id: (await ok('POST', '/api/presets', { name: freshEmail('preset'), scope: 'personal', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } }))
        .id,
    }),
    'PATCH /api/prices/kinds/{id}': async () => ({
      id: (await ok('POST', '/api/prices/kinds', { name: freshEmail('kind'), amountMinor: 1200, rushApplies: true })).id,
    }),
    'PATCH /api/staff/{memberId}': async () => ({ memberId: await member() }),
    'DELETE /api/staff/{memberId}': async () => ({ memberId: await member() }),
    'GET /api/tickets/{id}': async () => ({ id: await ticket() }),
    // The example moves a ticket from received to marked.
    'PATCH /api/tickets/{id}': async () => ({ id: await ticket() }),
    'GET /api/tickets/{id}/claim-slip': async () => ({ id: await priced() }),
    'POST /api/tickets/{id}/garments': async () => ({ id: await ticket() }),
    'GET /api/tickets/{id}/notices': async () => ({ id: await ticket() }),
    'POST /api/tickets/{id}/notices': async () => ({ id: await ready() }),
    'GET /api/tickets/{id}/payments': async () => ({ id: await priced() }),
    'POST /api/tickets/{id}/payments': async () => ({ id: await priced() }),
    'POST /api/tickets/{id}/payments/link': async () => ({ id: await priced() }),
    'GET /api/tickets/{id}/payments/{paymentId}/receipt': () => payment(),
    'POST /api/tickets/{id}/payments/{paymentId}/receipt': () => payment(),
    'POST /api/tickets/{id}/pickup': async () => {
      const id = await ready();
      await ok('POST', `/api/tickets/${id}/price-lines`, { source: 'no-charge', reason: 'example: nothing to charge' });
      return { id };
    },
    'GET /api/tickets/{id}/price-lines': async () => ({ id: await priced() }),
    'POST /api/tickets/{id}/price-lines': async () => ({ id: await priced() }),
    'POST /api/tickets/{id}/price-lines/auto': async () => ({ id: await ticket() }),
    'POST /api/tickets/{id}/price-lines/{lineId}/void': async () => {
      const id = await priced();
      return { id, lineId: (await ok('GET', `/api/tickets/${id}/price-lines`))[0].id };
    },
    // Paid in full, then reduced by 1.00: 1.00 is owed back.
    'POST /api/tickets/{id}/refunds': async () => {
      const id = await priced();
      await ok('POST', `/api/tickets/${id}/payments`, { method: 'cash', amountMinor: 2400 });
      await ok('POST', `/api/tickets/${id}/price-lines`, { source: 'adjust', label: 'Example', amountMinor: -100, reason: 'example credit' });
      return { id };
    },
  };
  async function member(): Promise<string> {
    const email = freshEmail('member');
    const id = (await ok('POST', '/api/staff', { email, role: 'counter' })).id;
    await call('POST', `/api/invitations/${id}/accept`, { body: { name: 'Example Member', password: 'a-long-password' } });
    return (await ok('GET', '/api/staff')).members.find((m: { email: string }) => m.email === email).id;
  }
  async function payment(): Promise<Ids> {
    const id = await priced();
    const paid = await ok('POST', `/api/tickets/${id}/payments`, { method: 'cash', amountMinor: 1000 });
    return { id, paymentId: paid.payments[0].id };
  }
  /** Work some operations need besides ids: a fitted, unassigned garment for the queue's batch. */
  const before: Record<string, () => Promise<unknown>> = {
    'GET /api/queue/sheets': fitted,
  };
  return { byOperation, before };
}
