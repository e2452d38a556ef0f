// One member of the staff: change the role or remove (lead).
import { route } from '@/lib/server/route';
import { roleChangeInput } from '@/lib/shared/account-inputs';
import { changeRole, removeMember } from '@/services/staff';
import { roleChangedJson, memberRemovedJson } from '@/lib/server/answers/people';

/** Changes the member's role. */
export const PATCH = route(
  {
    summary: "Changes a member's role.",
    permission: ['staff', 'change-role'],
    body: roleChangeInput,
    examples: [{ summary: 'Now a tailor', body: { role: 'tailor' } }],
    responses: { 200: roleChangedJson },
  },
  ({ actor, params, body, request }) => changeRole(actor, request.headers, params.memberId!, body),
);

/** Removes the member from the shop. */
export const DELETE = route(
  { summary: 'Removes a member from the shop.', permission: ['staff', 'remove'], responses: { 200: memberRemovedJson } },
  ({ actor, params, request }) => removeMember(actor, request.headers, params.memberId!),
);
