// The shop's staff: list (lead) and invitations by e-mail (lead).
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { inviteInput } from '@/lib/account-inputs';
import { invite, listStaff } from '@/services/staff';

/** Members and pending invitations. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['staff', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listStaff(actor));
};

/** Invites a person with a role; the invitation goes out by e-mail. */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['staff', 'invite']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, inviteInput);
  if (input instanceof Response) return input;
  return run(() => invite(actor, request.headers, input), 201);
};
