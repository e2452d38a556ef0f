// The queue API (GET /api/garments): open work by default, collected history a page at a time by
// cursor, an unchanged list answered 304 through its ETag (never across shops, people or roles),
// and the session lookup kept per request yet refused at once after sign-out or removal here.
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { call, freshEmail, newShop, signIn } from './client';

interface Row {
  id: string;
  status: string;
  ticketId: string;
  customerName: string | null;
}

let lead = '';
let apprentice = '';
let apprenticeMemberId = '';
let apprenticeUserId = '';
let otherLead = '';
let customerId = '';
const open: string[] = [];
const collected: string[] = [];
let openTicket = '';

async function ticket(garments: { description: string; assigneeId?: string }[]): Promise<{ id: string; garments: string[] }> {
  const t = await call('POST', '/api/tickets', { cookie: lead, body: { customerId, note: 'queue fixture', garments } });
  expect(t.status).toBe(201);
  const detail = await call('GET', `/api/tickets/${t.body.id}`, { cookie: lead });
  return { id: t.body.id, garments: detail.body.garments.map((g: { id: string }) => g.id) };
}

async function member(role: string): Promise<{ cookie: string; memberId: string; userId: string }> {
  const email = freshEmail(role);
  const inv = await call('POST', '/api/staff', { cookie: lead, body: { email, role } });
  expect(inv.status).toBe(201);
  const ok = await call('POST', `/api/invitations/${inv.body.id}/accept`, { body: { name: `Queue ${role}`, password: 'a-long-password' } });
  expect(ok.status).toBe(200);
  const staff = await call('GET', '/api/staff', { cookie: lead });
  const m = staff.body.members.find((x: { email: string }) => x.email === email);
  return { cookie: await signIn(email, 'a-long-password'), memberId: m.id, userId: m.userId };
}

beforeAll(async () => {
  lead = (await newShop('Queue Hems')).cookie;
  otherLead = (await newShop('Other Queue Hems')).cookie;
  const c = await call('POST', '/api/customers', { cookie: lead, body: { name: 'Wilhelmina Queueworth' } });
  expect(c.status).toBe(201);
  customerId = c.body.id;
  ({ cookie: apprentice, memberId: apprenticeMemberId, userId: apprenticeUserId } = await member('apprentice'));
  const first = await ticket([{ description: 'Open flannels' }, { description: "Apprentice's cords", assigneeId: apprenticeUserId }]);
  openTicket = first.id;
  open.push(...first.garments);
  // Five collected garments on five tickets, taken in one after another.
  for (let i = 0; i < 5; i++) {
    const t = await ticket([{ description: `Collected pair ${i + 1}` }]);
    // A ticket is handed over only priced: this work goes out with no charge.
    expect((await call('POST', `/api/tickets/${t.id}/price-lines`, { cookie: lead, body: { source: 'no-charge', reason: 'queue fixture' } })).status).toBe(201);
    for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready', 'collected']) {
      const moved = await call('PATCH', `/api/tickets/${t.id}`, { cookie: lead, body: { status } });
      expect(moved.status, status).toBe(200);
    }
    collected.push(...t.garments);
  }
});

describe('GET /api/garments', () => {
  it('answers open work by default: every garment not yet collected, none collected', async () => {
    const r = await call('GET', '/api/garments', { cookie: lead });
    expect(r.status).toBe(200);
    const ids = (r.body as Row[]).map((g) => g.id);
    expect(ids.sort()).toEqual([...open].sort());
    expect((r.body as Row[]).every((g) => g.status !== 'collected')).toBe(true);
    expect(r.headers.get('x-next-cursor')).toBeNull();
  });

  it('pages through the collected history by cursor, newest taken in first, each garment once', async () => {
    const seen: string[] = [];
    let path = '/api/garments?view=history&limit=2';
    const sizes: number[] = [];
    for (let page = 0; page < 5 && path; page++) {
      const r = await call('GET', path, { cookie: lead });
      expect(r.status).toBe(200);
      expect((r.body as Row[]).every((g) => g.status === 'collected')).toBe(true);
      sizes.push(r.body.length);
      seen.push(...(r.body as Row[]).map((g) => g.id));
      const next = r.headers.get('x-next-cursor');
      if (next) expect(r.headers.get('link')).toContain(`after=${next}`);
      path = next ? `/api/garments?view=history&limit=2&after=${next}` : '';
    }
    expect(sizes).toEqual([2, 2, 1]);
    expect(seen).toEqual([...collected].reverse());
  });

  it('refuses a cursor it never gave out and a page size out of range with 422', async () => {
    for (const q of ['view=history&after=bm90LWEtY3Vyc29y', 'view=history&limit=0', 'view=history&limit=201', 'view=everything']) {
      const r = await call('GET', `/api/garments?${q}`, { cookie: lead });
      expect(r.status, q).toBe(422);
      expect(typeof r.body.error, q).toBe('string');
    }
  });

  it('answers an unchanged list with 304 and a changed one with 200 and a new ETag', async () => {
    const first = await call('GET', '/api/garments', { cookie: lead });
    const etag = first.headers.get('etag')!;
    expect(etag).toMatch(/^"q-/);
    expect(first.headers.get('cache-control')).toContain('private');
    const again = await fetchWith('/api/garments', lead, etag);
    expect(again.status).toBe(304);
    expect(await again.text()).toBe('');

    // A step moved: the list changed.
    const moved = await call('POST', `/api/garments/${open[0]}/step`, { cookie: lead, body: { to: 'marked' } });
    expect(moved.status).toBe(200);
    const afterMove = await fetchWith('/api/garments', lead, etag);
    expect(afterMove.status).toBe(200);
    const etag2 = afterMove.headers.get('etag')!;
    expect(etag2).not.toBe(etag);

    // The customer renamed: only the customers table changed, and the rows show the name.
    const renamed = await call('PATCH', `/api/customers/${customerId}`, { cookie: lead, body: { name: 'Wilhelmina Queue-Worth' } });
    expect(renamed.status).toBe(200);
    const afterRename = await fetchWith('/api/garments', lead, etag2);
    expect(afterRename.status).toBe(200);
    expect(((await afterRename.json()) as Row[])[0]!.customerName).toBe('Wilhelmina Queue-Worth');
  });

  it('answers a history page unchanged with 304', async () => {
    const first = await call('GET', '/api/garments?view=history&limit=2', { cookie: lead });
    const again = await fetchWith('/api/garments?view=history&limit=2', lead, first.headers.get('etag')!);
    expect(again.status).toBe(304);
    const otherPage = await fetchWith('/api/garments?view=history&limit=3', lead, first.headers.get('etag')!);
    expect(otherPage.status).toBe(200);
  });

  it("never answers 304 to another shop's or another role's ETag", async () => {
    const leads = await call('GET', '/api/garments', { cookie: lead });
    const etag = leads.headers.get('etag')!;
    // The apprentice sees fewer rows (their own and unassigned): a different ETag, and the lead's gets 200.
    const theirs = await fetchWith('/api/garments', apprentice, etag);
    expect(theirs.status).toBe(200);
    expect(theirs.headers.get('etag')).not.toBe(etag);
    const rows = (await theirs.json()) as Row[];
    expect(rows.length).toBeGreaterThan(0);
    // Another shop's lead with the same (empty or not) list state never matches.
    const other = await fetchWith('/api/garments', otherLead, etag);
    expect(other.status).toBe(200);
    expect(await other.json()).toEqual([]);
    const otherEtag = other.headers.get('etag')!;
    expect((await fetchWith('/api/garments', lead, otherEtag)).status).toBe(200);
  });
});

describe('the session lookup kept per request', () => {
  it('refuses a signed-out session on the very next request', async () => {
    const email = freshEmail('signout');
    const inv = await call('POST', '/api/staff', { cookie: lead, body: { email, role: 'tailor' } });
    expect((await call('POST', `/api/invitations/${inv.body.id}/accept`, { body: { name: 'Queue Tailor', password: 'a-long-password' } })).status).toBe(200);
    const cookie = await signIn(email, 'a-long-password');
    expect((await call('GET', '/api/garments', { cookie })).status).toBe(200);
    expect((await call('GET', '/api/garments', { cookie })).status).toBe(200);
    const out = await call('POST', '/api/auth/sign-out', { cookie, body: {} });
    expect(out.status).toBe(200);
    expect((await call('GET', '/api/garments', { cookie })).status).toBe(401);
  });

  it('refuses a removed member on the very next request', async () => {
    expect((await call('GET', '/api/garments', { cookie: apprentice })).status).toBe(200);
    expect((await call('GET', '/api/garments', { cookie: apprentice })).status).toBe(200);
    const removed = await call('DELETE', `/api/staff/${apprenticeMemberId}`, { cookie: lead });
    expect(removed.status).toBe(200);
    expect([401, 403]).toContain((await call('GET', '/api/garments', { cookie: apprentice })).status);
    expect((await call('GET', `/api/tickets/${openTicket}`, { cookie: apprentice })).status).not.toBe(200);
  });
});

/** A GET sending If-None-Match, as a browser revalidating its copy does. */
function fetchWith(path: string, cookie: string, etag: string): Promise<Response> {
  return fetch(inject('baseURL') + path, { headers: { cookie, 'if-none-match': etag } });
}
