// Who is signed in: person, shop, role and what the role may do.
import type { APIRoute } from 'astro';
import { guard, json } from '@/lib/api';

/** The signed-in member (any role). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return json({ name: actor.userName, email: actor.email, role: actor.role, shop: { id: actor.shopId, name: actor.shopName } });
};
