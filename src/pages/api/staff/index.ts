// The shop's staff: list (lead) and invitations by e-mail (lead).
import { route } from '@/lib/server/route';
import { inviteInput } from '@/lib/shared/account-inputs';
import { invite, listStaff } from '@/services/staff';
import { staffListJson, pendingInviteJson } from '@/lib/server/answers/people';

/** Members and pending invitations. */
export const GET = route(
  { summary: "The shop's members and pending invitations.", permission: ['staff', 'read'], responses: { 200: staffListJson } },
  ({ actor }) => listStaff(actor),
);

/** Invites a person with a role; the invitation goes out by e-mail. */
export const POST = route(
  {
    summary: 'Invites a person with a role; the invitation goes out by e-mail.',
    permission: ['staff', 'invite'],
    body: inviteInput,
    status: 201,
    examples: [{ summary: 'A new counter hand', body: { email: 'jo@example-hems.test', role: 'counter' } }],
    responses: { 201: pendingInviteJson },
  },
  ({ actor, body, request }) => invite(actor, request.headers, body),
);
