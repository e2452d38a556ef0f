// Sign-up and accepting an invitation as wholes: when the shop or the membership cannot be written,
// the account better-auth has just made is taken back, so the address can try again and nobody is
// left signed up without a shop.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { randomUUID } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async () => {}) }));

const { db, handle } = await import('@/db');
const { account, invitation, member, organization, session, user } = await import('@/db/schema');
const { createShop } = await import('@/services/shops');
const { acceptInvitation, viewInvitation } = await import('@/services/invitations');
const { activeMembership } = await import('@/services/members');
const { makeShop } = await import('./fixtures');

/** From now on the database refuses shops of this name and new members of shops of this name. */
const refuseShop = (name: string) => db.execute(sql`insert into test_refused_shop (name) values (${name})`);
const allowShop = (name: string) => db.execute(sql`delete from test_refused_shop where name = ${name}`);

async function traces(email: string) {
  const users = await db.select({ id: user.id }).from(user).where(eq(user.email, email));
  const ids = users.map((u) => u.id);
  const count = async (table: typeof session | typeof account | typeof member) =>
    ids.length ? (await db.select().from(table).where(sql`${table.userId} in ${ids}`)).length : 0;
  return { users: users.length, sessions: await count(session), accounts: await count(account), members: await count(member) };
}
/** The database's refusal from the test trigger, as Drizzle wraps it. */
const refused = { cause: expect.objectContaining({ message: expect.stringMatching(/test: this (shop|membership) is refused/) }) };
const none = { users: 0, sessions: 0, accounts: 0, members: 0 };

beforeAll(async () => {
  await db.execute(sql`create table test_refused_shop (name text primary key)`);
  await db.execute(sql`create function test_refuse_shop() returns trigger language plpgsql as $$
    begin
      if exists (select 1 from test_refused_shop r where r.name = new.name) then raise exception 'test: this shop is refused'; end if;
      return new;
    end $$`);
  await db.execute(sql`create function test_refuse_member() returns trigger language plpgsql as $$
    begin
      if exists (select 1 from organization o join test_refused_shop r on r.name = o.name where o.id = new.organization_id) then
        raise exception 'test: this membership is refused';
      end if;
      return new;
    end $$`);
  await db.execute(sql`create trigger test_refuse_shop before insert on organization for each row execute function test_refuse_shop()`);
  await db.execute(sql`create trigger test_refuse_member before insert on member for each row execute function test_refuse_member()`);
});
afterAll(() => handle.close());

describe('sign-up', () => {
  it('leaves no account behind when the shop cannot be written, and works once it can', async () => {
    const form = { shopName: 'Brackwater Hems', name: 'Tamsin Reed', email: 'tamsin@example.com', password: 'a-long-password' };
    await refuseShop(form.shopName);
    await expect(createShop(form)).rejects.toMatchObject(refused);
    expect(await traces(form.email)).toEqual(none);
    expect(await db.select().from(organization).where(eq(organization.name, form.shopName))).toEqual([]);

    await allowShop(form.shopName);
    const { shopId } = await createShop(form);
    const [u] = await db.select().from(user).where(eq(user.email, form.email));
    expect(await activeMembership(u!.id)).toMatchObject({ shopId, role: 'lead' });
  });
});

describe('accepting an invitation with a new account', () => {
  it('leaves no account behind and the invitation pending when the membership cannot be written', async () => {
    const shop = await makeShop('Saltmarsh Tailoring', ['lead']);
    const id = randomUUID();
    const email = 'new.tailor@example.com';
    await db.insert(invitation).values({
      id,
      organizationId: shop.shopId,
      email,
      role: 'tailor',
      status: 'pending',
      expiresAt: new Date(Date.now() + 3600_000),
      inviterId: shop.lead.userId,
    });
    await refuseShop('Saltmarsh Tailoring');
    await expect(acceptInvitation(id, { newAccount: { name: 'New Tailor', password: 'a-long-password' } })).rejects.toMatchObject(refused);
    expect(await traces(email)).toEqual(none);
    expect(await viewInvitation(id)).toMatchObject({ hasAccount: false, role: 'tailor' });

    await allowShop('Saltmarsh Tailoring');
    await acceptInvitation(id, { newAccount: { name: 'New Tailor', password: 'a-long-password' } });
    const [u] = await db.select().from(user).where(eq(user.email, email));
    expect(await activeMembership(u!.id)).toMatchObject({ shopId: shop.shopId, role: 'tailor' });
  });

  it('keeps a signed-in account (not made here) when the membership cannot be written', async () => {
    const shop = await makeShop('Reedbed Alterations', ['lead']);
    const other = await makeShop('Elsewhere Hems', ['tailor']);
    const id = randomUUID();
    await db.insert(invitation).values({
      id,
      organizationId: shop.shopId,
      email: other.tailor.email,
      role: 'tailor',
      status: 'pending',
      expiresAt: new Date(Date.now() + 3600_000),
      inviterId: shop.lead.userId,
    });
    await refuseShop('Reedbed Alterations');
    await expect(acceptInvitation(id, { signedInUserId: other.tailor.userId, signedInEmail: other.tailor.email })).rejects.toMatchObject(refused);
    expect((await traces(other.tailor.email)).users).toBe(1);
    expect(await viewInvitation(id)).toMatchObject({ hasAccount: true });
  });
});
