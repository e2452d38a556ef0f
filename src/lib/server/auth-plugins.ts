// better-auth's organization plugin as Cuffwright uses it: a shop is an organisation, its members
// hold one of the four roles. Kept free of env and database so the schema generator can load it.
import { organization } from 'better-auth/plugins';
import { createAccessControl } from 'better-auth/plugins/access';
import { grants, statements } from '../shared/roles';

const ac = createAccessControl(statements);
/** better-auth's role objects, built from the one definition in roles.ts. */
export const shopRoles = {
  lead: ac.newRole(grants.lead),
  tailor: ac.newRole(grants.tailor),
  apprentice: ac.newRole(grants.apprentice),
  counter: ac.newRole(grants.counter),
};

/** What the plugin needs from the app: how to send an invitation. */
export interface ShopPluginDeps {
  sendInvitation: (invite: { id: string; email: string; role: string; shopId: string; shopName: string; inviterName: string }) => Promise<void>;
}

/** The organization plugin configured with the shop roles. */
export function shopPlugin(deps: ShopPluginDeps) {
  return organization({
    ac,
    roles: shopRoles,
    creatorRole: 'lead',
    // Shops are created through /api/shops (sign-up), never by a signed-in member.
    allowUserToCreateOrganization: false,
    invitationExpiresIn: 7 * 24 * 3600,
    cancelPendingInvitationsOnReInvite: true,
    sendInvitationEmail: async (data) =>
      deps.sendInvitation({
        id: data.id,
        email: data.email,
        role: data.role,
        shopId: data.organization.id,
        shopName: data.organization.name,
        inviterName: data.inviter.user.name,
      }),
  });
}
