// Accepting an invitation: as the signed-in invitee, or by creating the invitee's account.
import { json, readBody } from '@/lib/server/api';
import { acceptInviteInput } from '@/lib/shared/account-inputs';
import { route } from '@/lib/server/route';
import { acceptInvitation, type Acceptor } from '@/services/invitations';
import { invitationAcceptedJson } from '@/lib/server/answers/site';

/** Public by design: the invitation id from the e-mail is the proof. */
export const POST = route(
  {
    summary: "Accepts an invitation: signed in as the invitee with no body, or signed out with the new account's name and password.",
    description: 'Public: the invitation id from the e-mail is the proof. Answers the shop name and signs the new member in.',
    permission: 'public',
    rawBody: { type: 'application/json', schema: acceptInviteInput },
    examples: [{ summary: 'A new account for the invitee (signed out)', body: { name: 'Sam Example', password: 'a-long-password' } }],
    responses: { 200: invitationAcceptedJson },
  },
  async ({ context, params, request }) => {
    const { user } = context.locals;
    let who: Acceptor;
    if (user) who = { signedInUserId: user.id, signedInEmail: user.email };
    else {
      // Signed out only: a signed-in invitee sends nothing.
      const input = await readBody(request, acceptInviteInput);
      if (input instanceof Response) return input;
      who = { newAccount: input };
    }
    const { shopName, headers } = await acceptInvitation(params.id!, who);
    return json({ shopName }, 200, headers);
  },
);
