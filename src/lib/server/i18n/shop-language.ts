// A shop's language for words sent from the server outside any page (e-mails from better-auth's
// hooks), read from shop_settings; the default when the shop chose none.
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { member, shopSettings } from '@/db/schema';
import { DEFAULT_LANGUAGE, type Language } from '../../shared/i18n/languages';

/** The shop's language (shop_settings.language), or the default. */
export async function shopLanguage(shopId: string): Promise<Language> {
  const [row] = await db.select({ language: shopSettings.language }).from(shopSettings).where(eq(shopSettings.shopId, shopId));
  return row?.language ?? DEFAULT_LANGUAGE;
}

/** A person's language for mail outside any shop's page (a password reset): their one shop's, or
 * the default when they belong to none or to shops of different languages. */
export async function userLanguage(userId: string): Promise<Language> {
  const rows = await db
    .selectDistinct({ language: shopSettings.language })
    .from(member)
    .innerJoin(shopSettings, eq(shopSettings.shopId, member.organizationId))
    .where(eq(member.userId, userId));
  return rows.length === 1 ? rows[0]!.language : DEFAULT_LANGUAGE;
}
