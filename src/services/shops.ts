// Creating a shop: a new account that becomes the shop's first lead.
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { member, organization, user } from '@/db/schema';
import { auth } from '@/lib/server/auth';
import type { shopSignUpInput } from '@/lib/shared/account-inputs';
import { ServiceError } from './errors';
import { audit } from './audit';
import { orUndoAccount } from './new-account';

function slugify(name: string): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 40) || 'shop';
  return `${base}-${randomUUID().slice(0, 6)}`;
}

/** Creates the shop and its lead; returns the session cookie headers of the new lead. */
export async function createShop(input: z.infer<typeof shopSignUpInput>): Promise<{ shopId: string; headers: Headers }> {
  const email = input.email.toLowerCase();
  const [taken] = await db.select({ id: user.id }).from(user).where(eq(user.email, email));
  if (taken) throw new ServiceError(409, 'An account with this e-mail already exists: sign in instead.');
  const { headers, response } = await auth.api.signUpEmail({
    body: { name: input.name, email, password: input.password },
    returnHeaders: true,
  });
  const shopId = randomUUID();
  await orUndoAccount(response.user.id, () =>
    db.transaction(async (tx) => {
      await tx.insert(organization).values({ id: shopId, name: input.shopName, slug: slugify(input.shopName), createdAt: new Date() });
      await tx.insert(member).values({ id: randomUUID(), organizationId: shopId, userId: response.user.id, role: 'lead', createdAt: new Date() });
      await audit(tx, shopId, response.user.id, 'shop.created', shopId);
    }),
  );
  return { shopId, headers };
}
