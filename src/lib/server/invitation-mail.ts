// The invitation e-mail's words, in the inviting shop's language (the catalog's invite.* and role.*).
import { isRole } from '../shared/roles';
import type { Translate } from './i18n/catalog';

/** The invitation's subject and text; `base` is the site's address the link starts with. */
export function invitationMail(
  t: Translate,
  base: string,
  i: { id: string; role: string; shopName: string; inviterName: string },
): { subject: string; text: string } {
  const role = isRole(i.role) ? t(`role.${i.role}`) : i.role;
  return {
    subject: t('invite.subject', { inviter: i.inviterName, shop: i.shopName }),
    text: t('invite.body', { inviter: i.inviterName, shop: i.shopName, role, url: `${base}/invite/${i.id}` }),
  };
}
