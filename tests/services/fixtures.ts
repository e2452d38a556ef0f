// Shared fixtures for service tests: shops, people and actors made straight in the database.
import { randomUUID } from 'node:crypto';
import { db } from '@/db';
import { member, organization, user } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { Role } from '@/lib/shared/roles';

/** A new shop with one member per given role; returns an actor for each. */
export async function makeShop(name: string, roles: Role[] = ['lead', 'tailor', 'apprentice', 'counter']) {
  const shopId = randomUUID();
  await db.insert(organization).values({ id: shopId, name, slug: `${name.toLowerCase().replace(/\W+/g, '-')}-${shopId.slice(0, 6)}`, createdAt: new Date() });
  const actors = {} as Record<Role, Actor>;
  for (const role of roles) {
    const userId = randomUUID();
    const email = `${role}-${shopId.slice(0, 8)}@example.com`;
    await db.insert(user).values({ id: userId, name: `${role} of ${name}`, email, emailVerified: false, createdAt: new Date(), updatedAt: new Date() });
    const memberId = randomUUID();
    await db.insert(member).values({ id: memberId, organizationId: shopId, userId, role, createdAt: new Date() });
    actors[role] = { userId, userName: `${role} of ${name}`, email, memberId, role, shopId, shopName: name };
  }
  return { shopId, ...actors };
}

/** A shop made by makeShop, with an actor per role. */
export type Shop = Awaited<ReturnType<typeof makeShop>>;

/** An invented price list (amounts in cents) for counter tests. */
export const TEST_PRICES = [
  { key: 'plain-hem', label: 'Plain hem', amountMinor: 1800 },
  { key: 'cuff-from-hem', label: 'Cuff from a plain hem', amountMinor: 2600 },
  { key: 'cuff-remake', label: 'Cuff let down and re-made', amountMinor: 3200 },
  { key: 'original-hem', label: 'Jeans, original hem kept', amountMinor: 2300 },
  { key: 'skirt-hem', label: 'Skirt or dress hem', amountMinor: 2700 },
  { key: 'sleeves-shorten', label: 'Jacket or coat sleeves shortened', amountMinor: 3300 },
  { key: 'taper-let-out', label: 'Taper let-out', amountMinor: 1200 },
  { key: 'rush', label: 'Rush', amountMinor: 1000 },
] as const;
