// The lines a shop prices, in the order the price list shows them. Plain data: the server, the
// pricing function and the islands all read this one list.

/** Every priced piece of work; the lead sets an amount for each. */
export const PRICE_KEYS = ['plain-hem', 'cuff-from-hem', 'cuff-remake', 'original-hem', 'skirt-hem', 'sleeves-shorten', 'taper-let-out', 'rush'] as const;
/** One priced piece of work. */
export type PriceKey = (typeof PRICE_KEYS)[number];

/** What each line is called until the lead renames it. */
export const DEFAULT_PRICE_LABELS: Record<PriceKey, string> = {
  'plain-hem': 'Plain hem',
  'cuff-from-hem': 'Cuff from a plain hem',
  'cuff-remake': 'Cuff let down and re-made',
  'original-hem': 'Jeans, original hem kept',
  'skirt-hem': 'Skirt or dress hem',
  'sleeves-shorten': 'Jacket or coat sleeves shortened (the pair)',
  'taper-let-out': 'Taper let-out at the cuff (per pair)',
  rush: 'Rush surcharge (per ticket)',
};

/** True when the value names a priced piece of work. */
export function isPriceKey(value: unknown): value is PriceKey {
  return typeof value === 'string' && (PRICE_KEYS as readonly string[]).includes(value);
}
