// What an apprentice reads over HTTP: the tickets whose work is given to them (not a tailor's), and
// a ticket's or garment's customer by name only; the tailor and the lead still see the contact details.
import { beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, freshEmail, signIn } from './client';

const contact = { name: 'Odile Brackwater', phone: '555-0142', notes: 'Wants the cuffs to just touch the shoe' };
let lead = '';
let apprentice = '';
let tailor = '';
let theirs: { id: string; garmentId: string } = { id: '', garmentId: '' };
let tailors = '';
let email = '';

async function ticketFor(assigneeId: string, customerId: string) {
  const t = await call('POST', '/api/tickets', { cookie: lead, body: { customerId, garments: [{ description: 'Grey flannels', assigneeId }] } });
  expect(t.status).toBe(201);
  const detail = await call('GET', `/api/tickets/${t.body.id}`, { cookie: lead });
  return { id: t.body.id as string, garmentId: detail.body.garments[0].id as string };
}

beforeAll(async () => {
  [lead, apprentice, tailor] = await Promise.all([signIn(DEMO.lead), signIn(DEMO.apprentice), signIn(DEMO.tailor)]);
  const people = (await call('GET', '/api/assignees', { cookie: lead })).body as { userId: string; role: string }[];
  const who = (role: string) => people.find((p) => p.role === role)!.userId;
  email = freshEmail('odile');
  const c = await call('POST', '/api/customers', { cookie: lead, body: { ...contact, email } });
  expect(c.status).toBe(201);
  theirs = await ticketFor(who('apprentice'), c.body.id);
  tailors = (await ticketFor(who('tailor'), c.body.id)).id;
});

describe('the apprentice', () => {
  it("lists the tickets given to them, not the tailor's", async () => {
    const list = await call('GET', '/api/tickets', { cookie: apprentice });
    expect(list.status).toBe(200);
    const ids = list.body.map((t: { id: string }) => t.id);
    expect(ids).toContain(theirs.id);
    expect(ids).not.toContain(tailors);
    expect((await call('GET', `/api/tickets/${tailors}`, { cookie: apprentice })).status).toBe(404);
  });

  it("reads a ticket and a garment with the customer's name but no e-mail, phone or notes", async () => {
    for (const path of [`/api/tickets/${theirs.id}`, `/api/garments/${theirs.garmentId}`]) {
      const r = await call('GET', path, { cookie: apprentice });
      expect(r.status, path).toBe(200);
      expect(r.body.customer, path).toEqual({ id: expect.any(String), name: contact.name });
      const text = JSON.stringify(r.body);
      for (const secret of [email, contact.phone, contact.notes]) expect(text.includes(secret), `${secret} in ${path}`).toBe(false);
    }
  });
});

describe('the tailor and the lead', () => {
  it("still read the customer's e-mail, phone and notes on the ticket and the garment", async () => {
    for (const cookie of [tailor, lead]) {
      for (const path of [`/api/tickets/${theirs.id}`, `/api/garments/${theirs.garmentId}`]) {
        const r = await call('GET', path, { cookie });
        expect(r.status).toBe(200);
        expect(r.body.customer).toMatchObject({ ...contact, email });
      }
    }
  });
});
