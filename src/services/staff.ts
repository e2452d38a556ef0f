// The lead's staff page: members, pending invitations, inviting, role changes and removal.
// Writes go through better-auth's organization API, which checks the role once more.
import { and, asc, eq, gt } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { invitation, member, user } from '@/db/schema';
import { auth } from '@/lib/server/auth';
import type { Actor } from '@/lib/server/api';
import type { inviteInput, roleChangeInput } from '@/lib/shared/account-inputs';
import type { Role } from '@/lib/shared/roles';
import type { PendingInvite, StaffMember } from '@/lib/shared/staff-views';
import { ServiceError } from './errors';
import { audit } from './audit';
import { memberInShop } from './members';

// The shapes live in lib (the staff screen reads them too); exported here for the services' importers.
export type { PendingInvite, StaffMember };

/** The shop's members and its pending invitations. */
export async function listStaff(actor: Actor): Promise<{ members: StaffMember[]; invitations: PendingInvite[] }> {
  const members = await db
    .select({ id: member.id, userId: user.id, name: user.name, email: user.email, role: member.role, since: member.createdAt })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, actor.shopId))
    .orderBy(asc(member.createdAt));
  const invitations = await db
    .select({ id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt })
    .from(invitation)
    .where(and(eq(invitation.organizationId, actor.shopId), eq(invitation.status, 'pending'), gt(invitation.expiresAt, new Date())))
    .orderBy(asc(invitation.createdAt));
  return {
    members: members.map((m) => ({ ...m, role: m.role as Role, since: m.since.toISOString() })),
    invitations: invitations.map((i) => ({ ...i, role: i.role as Role, expiresAt: i.expiresAt.toISOString() })),
  };
}

/** Invites a person by e-mail; better-auth stores the invitation and sends the mail. */
export async function invite(actor: Actor, headers: Headers, input: z.infer<typeof inviteInput>): Promise<PendingInvite> {
  const email = input.email.toLowerCase();
  const [already] = await db
    .select({ id: member.id })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.organizationId, actor.shopId), eq(user.email, email)));
  if (already) throw new ServiceError(409, `${email} is already on the staff.`);
  // No `resend`: it would mail the pending invitation unchanged, old role and all. Without it the
  // plugin cancels the pending one (cancelPendingInvitationsOnReInvite) and stores and mails a new
  // one with this role, so the role sent, stored and answered is one and the same.
  const created = await auth.api.createInvitation({
    headers,
    body: { email, role: input.role, organizationId: actor.shopId },
  });
  const role = created.role as Role;
  await audit(db, actor.shopId, actor.userId, 'staff.invited', created.id, { email, role });
  return { id: created.id, email, role, expiresAt: new Date(created.expiresAt).toISOString() };
}

async function leadsLeft(shopId: string, without: string): Promise<number> {
  const leads = await db
    .select({ id: member.id })
    .from(member)
    .where(and(eq(member.organizationId, shopId), eq(member.role, 'lead')));
  return leads.filter((l) => l.id !== without).length;
}

/** Changes a member's role; the shop always keeps at least one lead. */
export async function changeRole(actor: Actor, headers: Headers, memberId: string, input: z.infer<typeof roleChangeInput>) {
  const target = await memberInShop(actor.shopId, memberId);
  if (!target) throw new ServiceError(404, 'No such member in this shop.');
  if (target.role === 'lead' && input.role !== 'lead' && (await leadsLeft(actor.shopId, memberId)) === 0) {
    throw new ServiceError(422, 'The shop needs at least one lead: make someone else lead first.');
  }
  // better-auth writes the change through its own adapter, outside any transaction of ours: the
  // entry follows it (its detail is only checked roles and addresses, nothing PostgreSQL refuses).
  await auth.api.updateMemberRole({ headers, body: { memberId, role: input.role, organizationId: actor.shopId } });
  await audit(db, actor.shopId, actor.userId, 'staff.role-changed', memberId, { from: target.role, to: input.role });
  return { id: memberId, role: input.role };
}

/** Removes a member from the shop; the last lead cannot be removed. */
export async function removeMember(actor: Actor, headers: Headers, memberId: string) {
  const target = await memberInShop(actor.shopId, memberId);
  if (!target) throw new ServiceError(404, 'No such member in this shop.');
  if (target.role === 'lead' && (await leadsLeft(actor.shopId, memberId)) === 0) {
    throw new ServiceError(422, 'The shop needs at least one lead: make someone else lead first.');
  }
  await auth.api.removeMember({ headers, body: { memberIdOrEmail: memberId, organizationId: actor.shopId } });
  await audit(db, actor.shopId, actor.userId, 'staff.removed', memberId);
  return { id: memberId, removed: true };
}
