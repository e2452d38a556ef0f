// Who is signed in: person, shop, role and what the role may do.
import { route } from '@/lib/server/route';
import { meJson } from '@/lib/server/answers/site';

/** The signed-in member (any role). */
export const GET = route(
  { summary: 'Who is signed in: name, e-mail, role and shop.', permission: ['tickets', 'read'], responses: { 200: meJson } },
  ({ actor }) => ({
    name: actor.userName,
    email: actor.email,
    role: actor.role,
    shop: { id: actor.shopId, name: actor.shopName },
  }),
);
