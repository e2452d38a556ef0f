// What an invitation link offers (public: the id itself is the secret from the e-mail).
import { route } from '@/lib/server/route';
import { viewInvitation } from '@/services/invitations';
import { invitationJson } from '@/lib/server/answers/site';

/** The pending invitation's shop, role and e-mail. */
export const GET = route(
  {
    summary: "A pending invitation's shop, role and e-mail (public: the id from the e-mail is the secret).",
    permission: 'public',
    responses: { 200: invitationJson },
  },
  ({ params }) => viewInvitation(params.id!),
);
