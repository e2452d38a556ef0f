// Accounts better-auth makes outside our transactions (sign-up, accepting an invitation), taken
// back when the rest of the step fails, so nobody is left signed up without a shop.
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { user } from '@/db/schema';

/** Runs the rest of a step that has just made this account; when it fails, deletes the account
 * (its sessions, password and memberships go with it) so the address can try again, and rethrows. */
export async function orUndoAccount<T>(userId: string, rest: () => Promise<T>): Promise<T> {
  try {
    return await rest();
  } catch (e) {
    try {
      await db.delete(user).where(eq(user.id, userId));
    } catch (undo) {
      console.error(`Could not take back account ${userId} after a failed sign-up`, undo);
    }
    throw e;
  }
}
