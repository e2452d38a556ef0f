// Who a signed-in person is in a shop: their membership, role and the shop's name.
import { and, asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { member, organization } from '@/db/schema';
import { isRole, type Role } from '@/lib/shared/roles';
import { isRecordId } from '@/lib/shared/ids';

/** A membership resolved for the session. */
export interface Membership {
  id: string;
  role: Role;
  shopId: string;
  shopName: string;
}

/** The member row for the session's active shop, else the person's oldest membership. */
export async function activeMembership(userId: string, activeShopId?: string | null): Promise<Membership | null> {
  const rows = await db
    .select({ id: member.id, role: member.role, shopId: member.organizationId, shopName: organization.name })
    .from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .where(eq(member.userId, userId))
    .orderBy(asc(member.createdAt));
  const row = rows.find((r) => r.shopId === activeShopId) ?? rows[0];
  if (!row || !isRole(row.role)) return null;
  return { ...row, role: row.role };
}

/** The member row of a shop by id, or null when it belongs to another shop. */
export async function memberInShop(shopId: string, memberId: string) {
  if (!isRecordId(memberId)) return null;
  const [row] = await db
    .select()
    .from(member)
    .where(and(eq(member.id, memberId), eq(member.organizationId, shopId)));
  return row ?? null;
}
