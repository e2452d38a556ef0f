// Accepting an invitation: as the signed-in invitee, or by creating the invitee's account.
import type { APIRoute } from 'astro';
import { json, readBody, refusal } from '@/lib/api';
import { acceptInviteInput } from '@/lib/account-inputs';
import { acceptInvitation, type Acceptor } from '@/services/invitations';

/** Public by design: the invitation id from the e-mail is the proof. */
export const POST: APIRoute = async ({ params, request, locals }) => {
  let who: Acceptor;
  if (locals.user) who = { signedInUserId: locals.user.id, signedInEmail: locals.user.email };
  else {
    const input = await readBody(request, acceptInviteInput);
    if (input instanceof Response) return input;
    who = { newAccount: input };
  }
  try {
    const { shopName, headers } = await acceptInvitation(params.id ?? '', who);
    return json({ shopName }, 200, headers);
  } catch (e) {
    return refusal(e);
  }
};
