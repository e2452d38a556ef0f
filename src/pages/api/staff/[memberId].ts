// One member of the staff: change the role or remove (lead).
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { roleChangeInput } from '@/lib/account-inputs';
import { changeRole, removeMember } from '@/services/staff';

/** Changes the member's role. */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['staff', 'change-role']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, roleChangeInput);
  if (input instanceof Response) return input;
  return run(() => changeRole(actor, request.headers, params.memberId ?? '', input));
};

/** Removes the member from the shop. */
export const DELETE: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['staff', 'remove']);
  if (actor instanceof Response) return actor;
  return run(() => removeMember(actor, request.headers, params.memberId ?? ''));
};
