// The forms about people and shops, one zod schema each, shared by the islands and the API.
// Plain zod rather than drizzle-zod: these are sign-in forms, not table rows, and the islands
// must not carry the database schema into the browser.
import { z } from 'zod';
import { text } from './text';
import { ROLES } from './roles';

const email = z.email('Enter an e-mail address like name@example.com').max(200);
const person = z.object({
  name: text().trim().min(1, 'Enter your name').max(80, 'Keep the name under 80 characters'),
  email,
});

/** A new password: long enough to resist guessing. */
export const newPassword = text().min(10, 'Use at least 10 characters').max(128, 'Keep the password under 128 characters');

/** Sign-in form. */
export const signInInput = person.pick({ email: true }).extend({
  password: text().min(1, 'Enter your password'),
});

/** Sign-up form: a new shop and its first lead. */
export const shopSignUpInput = person.extend({
  shopName: text().trim().min(2, 'Name the shop').max(80, 'Keep the name under 80 characters'),
  password: newPassword,
});

/** Invitation form on the staff page. */
export const inviteInput = z.object({ email, role: z.enum(ROLES, 'Choose a role') });

/** Role change on the staff page. */
export const roleChangeInput = inviteInput.pick({ role: true });

/** Accepting an invitation: the invitee's name and password (the e-mail is the invitation's). */
export const acceptInviteInput = person.pick({ name: true }).extend({ password: newPassword });

/** Asking for a password reset. */
export const forgotInput = person.pick({ email: true });

/** Choosing the new password from the reset link. */
export const resetInput = z
  .object({ password: newPassword, confirm: text() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ' });
