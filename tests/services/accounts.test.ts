// Shops, memberships, invitations and the demo seed against a real database: sign-up makes a
// lead, an invitation makes a member with the invited role, once, and the shop keeps a lead.
import { afterAll, describe, expect, it, vi } from 'vitest';
import { randomUUID } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));
// Nothing leaves the test: invitations are written by the tests themselves.
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async () => {}) }));

const { db, handle } = await import('@/db');
const { customers, invitation, member, organization, tickets, user } = await import('@/db/schema');
const { createShop } = await import('@/services/shops');
const { activeMembership } = await import('@/services/members');
const { acceptInvitation, viewInvitation } = await import('@/services/invitations');
const { changeRole, removeMember } = await import('@/services/staff');
const { seedDemoIfEmpty, DEMO_PEOPLE } = await import('@/services/demo-seed');
const { listCustomers } = await import('@/services/customers');
const { makeShop } = await import('./fixtures');

afterAll(() => handle.close());

async function invite(shopId: string, inviterId: string, email: string, role: string, expiresAt = new Date(Date.now() + 3600_000)) {
  const id = randomUUID();
  await db.insert(invitation).values({ id, organizationId: shopId, email, role, status: 'pending', expiresAt, inviterId });
  return id;
}

describe('the database under test', () => {
  it('is the PostgreSQL server when TEST_DATABASE_URL is set, PGlite otherwise', async () => {
    expect(handle.kind).toBe(process.env.TEST_DATABASE_URL ? 'postgres' : 'pglite');
    const result = (await db.execute(sql`select version() as v`)) as unknown as { rows: { v: string }[] };
    const [row] = result.rows;
    expect(row!.v).toMatch(/PostgreSQL/);
  });
});

describe('demo seed', () => {
  it('fills an empty database once: one person per role, customers, tickets at several steps', async () => {
    expect(await seedDemoIfEmpty()).toBe(true);
    expect(await seedDemoIfEmpty()).toBe(false);
    const people = await db.select({ email: user.email, role: member.role }).from(member).innerJoin(user, eq(user.id, member.userId));
    expect(people.map((p) => p.role).sort()).toEqual(['apprentice', 'counter', 'lead', 'tailor']);
    expect(people.map((p) => p.email).sort()).toEqual(DEMO_PEOPLE.map((p) => p.email).sort());
    // As README's "Demo sign-ins" says: six customers and eight tickets.
    const [c] = await db.select({ n: sql<number>`count(*)::int` }).from(customers);
    expect(c!.n).toBe(6);
    const [t] = await db.select({ n: sql<number>`count(*)::int` }).from(tickets);
    expect(t!.n).toBe(8);
    const statuses = new Set((await db.select({ s: tickets.status }).from(tickets)).map((t) => t.s));
    expect(statuses.size).toBeGreaterThanOrEqual(4);
  });
});

describe('sign-up', () => {
  it('creates the shop with the new account as its lead', async () => {
    const { shopId, headers } = await createShop({ shopName: 'Fresh Hems', name: 'Fern Lead', email: 'Fern@Example.com', password: 'a-long-password' });
    expect(headers.getSetCookie().some((c) => c.startsWith('better-auth.session_token='))).toBe(true);
    const [u] = await db.select().from(user).where(eq(user.email, 'fern@example.com'));
    const m = await activeMembership(u!.id);
    expect(m).toMatchObject({ shopId, role: 'lead', shopName: 'Fresh Hems' });
  });

  it('refuses an e-mail that already has an account', async () => {
    await expect(createShop({ shopName: 'Again', name: 'Fern', email: 'fern@example.com', password: 'a-long-password' })).rejects.toMatchObject({
      status: 409,
    });
    const [n] = await db.select({ n: sql<number>`count(*)::int` }).from(organization).where(eq(organization.name, 'Again'));
    expect(n!.n).toBe(0);
  });
});

describe('invitations', () => {
  it('make a new account a member with the invited role, and work once', async () => {
    const shop = await makeShop('Invite Shop', ['lead']);
    const id = await invite(shop.shopId, shop.lead.userId, 'new.apprentice@example.com', 'apprentice');
    expect(await viewInvitation(id)).toMatchObject({ shopName: 'Invite Shop', role: 'apprentice', hasAccount: false });
    const { headers } = await acceptInvitation(id, { newAccount: { name: 'New Apprentice', password: 'a-long-password' } });
    expect(headers.getSetCookie().length).toBeGreaterThan(0);
    const [u] = await db.select().from(user).where(eq(user.email, 'new.apprentice@example.com'));
    expect(u!.emailVerified).toBe(true);
    expect(await activeMembership(u!.id)).toMatchObject({ shopId: shop.shopId, role: 'apprentice' });
    await expect(viewInvitation(id)).rejects.toMatchObject({ status: 404 });
    await expect(acceptInvitation(id, { newAccount: { name: 'Again', password: 'a-long-password' } })).rejects.toMatchObject({ status: 404 });
  });

  it('refuse a signed-in person whose e-mail is not the invited one', async () => {
    const shop = await makeShop('Mismatch Shop', ['lead', 'tailor']);
    const id = await invite(shop.shopId, shop.lead.userId, 'someone.else@example.com', 'counter');
    await expect(acceptInvitation(id, { signedInUserId: shop.tailor.userId, signedInEmail: shop.tailor.email })).rejects.toMatchObject({ status: 409 });
  });

  it('are refused once expired', async () => {
    const shop = await makeShop('Expired Shop', ['lead']);
    const id = await invite(shop.shopId, shop.lead.userId, 'late@example.com', 'tailor', new Date(Date.now() - 1000));
    await expect(viewInvitation(id)).rejects.toMatchObject({ status: 404 });
  });
});

describe('staff', () => {
  it('keeps at least one lead: the last one can be neither demoted nor removed', async () => {
    const shop = await makeShop('Lead Shop', ['lead', 'tailor']);
    const headers = new Headers();
    await expect(changeRole(shop.lead, headers, shop.lead.memberId, { role: 'tailor' })).rejects.toMatchObject({ status: 422 });
    await expect(removeMember(shop.lead, headers, shop.lead.memberId)).rejects.toMatchObject({ status: 422 });
  });

  it("answers 404 for another shop's member", async () => {
    const a = await makeShop('Staff A', ['lead']);
    const b = await makeShop('Staff B', ['lead', 'tailor']);
    await expect(changeRole(a.lead, new Headers(), b.tailor.memberId, { role: 'counter' })).rejects.toMatchObject({ status: 404 });
    await expect(removeMember(a.lead, new Headers(), b.tailor.memberId)).rejects.toMatchObject({ status: 404 });
    const [still] = await db.select().from(member).where(eq(member.id, b.tailor.memberId));
    expect(still!.role).toBe('tailor');
  });
});

describe('customers', () => {
  it("are listed only to their own shop's members", async () => {
    const a = await makeShop('Cust A', ['counter']);
    const b = await makeShop('Cust B', ['counter']);
    await db.insert(customers).values([
      { shopId: a.shopId, name: 'Only A' },
      { shopId: b.shopId, name: 'Only B' },
    ]);
    expect((await listCustomers(a.counter)).map((c) => c.name)).toEqual(['Only A']);
    expect((await listCustomers(b.counter)).map((c) => c.name)).toEqual(['Only B']);
  });
});
