// Invitation links: what the invitee sees, and accepting (creating the account when needed).
import { randomUUID } from 'node:crypto';
import { and, eq, gt } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { invitation, member, organization, user } from '@/db/schema';
import { auth } from '@/lib/server/auth';
import type { acceptInviteInput } from '@/lib/shared/account-inputs';
import { isRecordId } from '@/lib/shared/ids';
import { isRole, type Role } from '@/lib/shared/roles';
import { ServiceError } from './errors';
import { audit } from './audit';
import { orUndoAccount } from './new-account';

/** What an invitation link shows before it is accepted. */
export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  shopName: string;
  hasAccount: boolean;
}

/** The pending, unexpired invitation with this id, or a 404. */
export async function viewInvitation(id: string): Promise<InvitationView> {
  if (!isRecordId(id)) throw new ServiceError(404, 'This invitation is not valid any more: ask the lead for a new one.');
  const [row] = await db
    .select({ id: invitation.id, email: invitation.email, role: invitation.role, shopName: organization.name })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .where(and(eq(invitation.id, id), eq(invitation.status, 'pending'), gt(invitation.expiresAt, new Date())));
  if (!row || !isRole(row.role)) throw new ServiceError(404, 'This invitation is not valid any more: ask the lead for a new one.');
  const [account] = await db.select({ id: user.id }).from(user).where(eq(user.email, row.email.toLowerCase()));
  return { ...row, role: row.role, hasAccount: Boolean(account) };
}

/** Who is accepting: the signed-in person, or a new account from the form. */
export type Acceptor = { signedInUserId: string; signedInEmail: string } | { newAccount: z.infer<typeof acceptInviteInput> };

/** Accepts the invitation; returns the headers that sign a newly created account in. */
export async function acceptInvitation(id: string, who: Acceptor): Promise<{ shopName: string; headers: Headers }> {
  const inv = await viewInvitation(id);
  let userId: string;
  let headers = new Headers();
  let created = false;
  if ('signedInUserId' in who) {
    if (who.signedInEmail.toLowerCase() !== inv.email.toLowerCase()) {
      throw new ServiceError(409, `This invitation is for ${inv.email}: sign out and open the link again.`);
    }
    userId = who.signedInUserId;
  } else {
    if (inv.hasAccount) throw new ServiceError(409, `${inv.email} already has an account: sign in first, then open the link again.`);
    const made = await auth.api.signUpEmail({
      body: { name: who.newAccount.name, email: inv.email.toLowerCase(), password: who.newAccount.password },
      returnHeaders: true,
    });
    userId = made.response.user.id;
    headers = made.headers;
    created = true;
  }
  const join = async () => {
    const [row] = await db.select().from(invitation).where(eq(invitation.id, id));
    await db.transaction(async (tx) => {
      const done = await tx
        .update(invitation)
        .set({ status: 'accepted' })
        .where(and(eq(invitation.id, id), eq(invitation.status, 'pending')))
        .returning({ id: invitation.id });
      if (!done.length) throw new ServiceError(409, 'This invitation was already used.');
      await tx.insert(member).values({ id: randomUUID(), organizationId: row!.organizationId, userId, role: inv.role, createdAt: new Date() });
      // Opening the mailed link proves the address.
      await tx.update(user).set({ emailVerified: true }).where(eq(user.id, userId));
      await audit(tx, row!.organizationId, userId, 'staff.joined', id, { role: inv.role });
    });
    return row!.organizationId;
  };
  // A signed-in person's account is theirs to keep; one made just now goes if joining fails.
  await (created ? orUndoAccount(userId, join) : join());
  return { shopName: inv.shopName, headers };
}
