// Issue 13: the ready notice and the pay link in the shop's language, money as that language
// writes it (fr-FR: "12,50 €"); an English shop's words are as they were.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async () => undefined) }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const settings = await import('@/services/shop-settings');
const notice = await import('@/services/notices');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let fr: Shop;
let en: Shop;

async function readyTicket(shop: Shop, number: number) {
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Odile Varenne', email: 'odile.varenne@example.com' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number, customerId: c!.id, status: 'ready' }).returning();
  return t!;
}

beforeAll(async () => {
  fr = await makeShop('Atelier Ourlet');
  en = await makeShop('Turnup Rooms');
  for (const s of [fr, en]) {
    await prices.savePriceList(s.lead, { currency: 'EUR', hours: 'Mer–Sam 10:00–16:00', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
  }
  await settings.saveBenchSettings(fr.lead, { scale: 'in8', stepLabels: {}, language: 'fr' } as never);
});
afterAll(() => handle.close());

describe('notices in the shop language', () => {
  it('writes the ready notice of a French shop in French', async () => {
    const t = await readyTicket(fr, 8101);
    const m = await notice.readyMessage(fr.shopId, t.id);
    expect(m.subject).toMatch(/^Prêt à retirer : ticket /);
    expect(m.body.split('\n')[0]).toBe('Bonjour Odile Varenne,');
    expect(m.body).toContain('est prêt à être retiré.');
    expect(m.body).toContain('Horaires : Mer–Sam 10:00–16:00');
    expect(m.body).not.toMatch(/Hello|ready to collect|Opening hours/);
    expect(m.text).toContain('Atelier Ourlet : votre pantalon du ticket');
  });

  it('keeps the English shop’s ready notice word for word', async () => {
    const t = await readyTicket(en, 8102);
    const m = await notice.readyMessage(en.shopId, t.id);
    expect(m.subject).toMatch(/^Ready to collect: ticket /);
    expect(m.body.split('\n')[0]).toBe('Hello Odile Varenne,');
    expect(m.body).toContain('are ready to collect.');
    expect(m.body).toContain('Nothing is left to pay: the ticket is paid in full.');
  });

  it('writes the password reset in the language of the person’s shop (English for a shop that chose none)', async () => {
    const { userLanguage, shopLanguage } = await import('@/lib/server/i18n/shop-language');
    const { translator } = await import('@/lib/server/i18n/catalog');
    expect(await shopLanguage(fr.shopId)).toBe('fr');
    expect(await userLanguage(fr.lead.userId)).toBe('fr');
    expect(await userLanguage(en.lead.userId)).toBe('en');
    expect(await userLanguage('no-such-user')).toBe('en');
    expect(translator('en')('reset.body', { name: 'Odile', url: 'http://x/r' })).toBe(
      'Hello Odile,\n\nTo choose a new password, open this link within the hour:\n\nhttp://x/r\n\nIf you did not ask for this, ignore this message.',
    );
    expect(translator('fr')('reset.subject')).toBe('Réinitialiser votre mot de passe Cuffwright');
  });

  it('writes money as the shop language does (the Intl locale of the language, not en-GB)', async () => {
    const { formatMoney } = await import('@/lib/pricing/money');
    const { intlLocale } = await import('@/lib/shared/i18n/languages');
    const { translator } = await import('@/lib/server/i18n/catalog');
    const amount = formatMoney(1250, 'EUR', intlLocale('fr'));
    // Intl writes French amounts with a decimal comma and the sign after (narrow no-break space before it).
    expect(amount).toMatch(/^12,50\s€$/u);
    expect(translator('fr')('notice.ready.due', { amount })).toBe(`Reste à payer au retrait : ${amount}.`);
    expect(translator('en')('notice.ready.due', { amount: formatMoney(1250, 'EUR') })).toBe('Balance due at pickup: €12.50.');
  });
});
