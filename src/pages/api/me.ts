// Who is signed in: person, shop, role and what the role may do.
import { route } from '@/lib/server/route';

/** The signed-in member (any role). */
export const GET = route({ summary: 'Who is signed in: name, e-mail, role and shop.', permission: ['tickets', 'read'] }, ({ actor }) => ({
  name: actor.userName,
  email: actor.email,
  role: actor.role,
  shop: { id: actor.shopId, name: actor.shopName },
}));
