// The demo shop's counter: an invented town, euro prices, opening hours. Every figure is made up.
import { db } from '@/db';
import { counterSettings, priceItems, priceKinds } from '@/db/schema';
import type { PriceKey } from '@/lib/pricing/price-keys';
import { DEFAULT_PRICE_LABELS } from '@/lib/pricing/price-keys';

// Invented amounts in euro cents: no real shop's price list.
const DEMO_PRICES: Record<PriceKey, number> = {
  'plain-hem': 1650,
  'cuff-from-hem': 2400,
  'cuff-remake': 2950,
  'original-hem': 2200,
  'skirt-hem': 2600,
  'sleeves-shorten': 3200,
  'taper-let-out': 1100,
  rush: 900,
};

// Invented kinds of work beside the list's lines (flat euro cents); pressing alone is never rushed.
const DEMO_KINDS = [
  { name: 'Take in waist', amountMinor: 1800, rushApplies: true },
  { name: 'Replace zip', amountMinor: 1400, rushApplies: true },
  { name: 'Press only', amountMinor: 600, rushApplies: false },
];

/** Gives the demo shop its price list (with a few kinds of work) and counter settings (ready notices sent by the counter). */
export async function seedCounterDemo(shopId: string): Promise<void> {
  await db.insert(counterSettings).values({
    shopId,
    currency: 'EUR',
    hours: 'Tue–Fri 9:00–18:00, Sat 9:00–13:00',
    location: '7 Bobbin Row, Wickhollow',
    autoReadyNotice: false,
  });
  await db
    .insert(priceItems)
    .values((Object.keys(DEMO_PRICES) as PriceKey[]).map((key) => ({ shopId, key, label: DEFAULT_PRICE_LABELS[key], amountMinor: DEMO_PRICES[key] })));
  // A millisecond apart: the list shows kinds in the order added.
  const at = Date.now();
  await db.insert(priceKinds).values(DEMO_KINDS.map((k, i) => ({ shopId, ...k, createdAt: new Date(at + i) })));
}
