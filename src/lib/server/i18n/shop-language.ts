// A shop's language for words sent from the server outside any page (e-mails from better-auth's
// hooks), read from shop_settings; the default when the shop chose none.
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { shopSettings } from '@/db/schema';
import { DEFAULT_LANGUAGE, type Language } from '../../shared/i18n/languages';

/** The shop's language (shop_settings.language), or the default. */
export async function shopLanguage(shopId: string): Promise<Language> {
  const [row] = await db.select({ language: shopSettings.language }).from(shopSettings).where(eq(shopSettings.shopId, shopId));
  return row?.language ?? DEFAULT_LANGUAGE;
}
