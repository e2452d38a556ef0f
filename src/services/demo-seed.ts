// Demo data for a first start on an empty database: an invented shop, one person in each role,
// a few customers and tickets at different steps (demo-bench-seed.ts, and a skirt and an overcoat:
// demo-kinds-seed.ts). Every name here is made up.
// The seeders and auth are loaded only when the database is empty: every later start on existing
// data asks one count and goes on, without their modules.
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { db } from '@/db';
import { customers, member, organization, user } from '@/db/schema';
import type { Role } from '@/lib/shared/roles';

/** The demo shop's name. */
export const DEMO_SHOP = 'Pinmark & Hem';
/** The password of every demo account (listed in the README). */
export const DEMO_PASSWORD = 'cuffwright-demo';
/** The demo accounts, one per role. */
export const DEMO_PEOPLE: { role: Role; name: string; email: string }[] = [
  { role: 'lead', name: 'Ada Penhallow', email: 'lead@pinmark.test' },
  { role: 'tailor', name: 'Teodor Vasko', email: 'tailor@pinmark.test' },
  { role: 'apprentice', name: 'Mina Okoro', email: 'apprentice@pinmark.test' },
  { role: 'counter', name: 'Rosa Quill', email: 'counter@pinmark.test' },
];

const DEMO_CUSTOMERS = [
  { name: 'Bertil Ashgrove', phone: '555-0142', notes: 'Prefers a 1¾ in cuff on wool trousers.' },
  { name: 'Calla Dunmore', phone: '555-0178', email: 'calla@example.com' },
  { name: 'Oskar Fenwright', phone: '555-0115' },
  { name: 'Ines Morrow', email: 'ines.morrow@example.org', notes: 'Tall; always check there is enough cloth.' },
];

/** True when the database has no people yet. */
async function isEmpty(): Promise<boolean> {
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(user);
  return (row?.n ?? 0) === 0;
}

/** Seeds the demo shop when the database is empty; returns whether it did. */
export async function seedDemoIfEmpty(): Promise<boolean> {
  if (!(await isEmpty())) return false;
  const [{ auth }, { seedHousePresets }, { seedBenchDemo }, { seedKindsDemo }, { seedCounterDemo }, { seedOverviewDemo }] = await Promise.all([
    import('@/lib/server/auth'),
    import('./presets'),
    import('./demo-bench-seed'),
    import('./demo-kinds-seed'),
    import('./demo-counter-seed'),
    import('./demo-overview-seed'),
  ]);
  const shopId = randomUUID();
  await db.insert(organization).values({ id: shopId, name: DEMO_SHOP, slug: 'pinmark-hem', createdAt: new Date() });
  const ids: Partial<Record<Role, string>> = {};
  for (const p of DEMO_PEOPLE) {
    const { user: u } = await auth.api.signUpEmail({ body: { name: p.name, email: p.email, password: DEMO_PASSWORD } });
    ids[p.role] = u.id;
    await db.insert(member).values({ id: randomUUID(), organizationId: shopId, userId: u.id, role: p.role, createdAt: new Date() });
  }
  const people = await db
    .insert(customers)
    .values(DEMO_CUSTOMERS.map((c) => ({ ...c, shopId })))
    .returning({ id: customers.id });
  await seedBenchDemo(
    shopId,
    people.map((p) => p.id),
    ids,
  );
  await seedKindsDemo(shopId, ids);
  await seedHousePresets(shopId);
  await seedCounterDemo(shopId);
  await seedOverviewDemo(shopId, ids);
  return true;
}
