// Every e-mail address that belongs to a shop: staff, invitees and customers.
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { customers, invitation, member, user } from '@/db/schema';

/** The shop's addresses, for filtering captured mail to what this shop may see. */
export async function shopAddresses(shopId: string): Promise<string[]> {
  const staff = await db.select({ e: user.email }).from(member).innerJoin(user, eq(user.id, member.userId)).where(eq(member.organizationId, shopId));
  const invited = await db.select({ e: invitation.email }).from(invitation).where(eq(invitation.organizationId, shopId));
  const people = await db.select({ e: customers.email }).from(customers).where(eq(customers.shopId, shopId));
  return [...staff, ...invited, ...people].map((r) => r.e).filter((e): e is string => Boolean(e));
}
