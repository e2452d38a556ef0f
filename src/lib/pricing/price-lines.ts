// Pure price computation: garments (finish, taper, old cuff) and the shop's list in, lines out.
// No database, no dates, no rounding: amounts are integer minor units and are only added.
import type { PriceKey } from './price-keys';

/** What the pricing needs to know about one garment, read from its measurements and plan. */
export interface GarmentFacts {
  garmentId: string;
  /** shown beside its lines, e.g. "Grey flannel trousers" */
  label: string;
  /** null while the fitting has not decided the finish */
  finish: 'cuff' | 'hem' | null;
  /** the taper check says the leg must be let out to keep the cuff-top width down to the cut */
  taperLetOut: boolean;
  /** the trousers came in with a cuff that is let down and made again */
  oldCuff: boolean;
}

/** One entry of the shop's price list. */
export interface PriceEntry {
  label: string;
  amountMinor: number;
}

/** The shop's price list: an entry for every key. */
export type PriceList = Record<PriceKey, PriceEntry>;

/** A computed line: for one garment, or for the whole ticket (garmentId null). */
export interface ComputedLine {
  garmentId: string | null;
  key: PriceKey;
  label: string;
  amountMinor: number;
}

/** The lines and the garments that could not be priced yet. */
export interface PricedTicket {
  lines: ComputedLine[];
  /** garments without a finish: they get no line until the fitting decides */
  unpriced: string[];
}

/** The finish's line: a plain hem, a cuff made from a plain hem, or an old cuff re-made. */
export function finishKey(g: GarmentFacts): PriceKey | null {
  if (g.finish === 'hem') return 'plain-hem';
  if (g.finish === 'cuff') return g.oldCuff ? 'cuff-remake' : 'cuff-from-hem';
  return null;
}

/** Prices a ticket's garments from the list; rush adds one surcharge line for the ticket. */
export function priceTicket(garments: readonly GarmentFacts[], list: PriceList, opts: { rush: boolean }): PricedTicket {
  const lines: ComputedLine[] = [];
  const unpriced: string[] = [];
  const line = (garmentId: string | null, key: PriceKey, suffix = ''): ComputedLine => ({
    garmentId,
    key,
    label: list[key].label + suffix,
    amountMinor: list[key].amountMinor,
  });
  for (const g of garments) {
    const key = finishKey(g);
    if (!key) {
      unpriced.push(g.garmentId);
      continue;
    }
    const of = g.label ? ` — ${g.label}` : '';
    lines.push(line(g.garmentId, key, of));
    // A let-out only matters under a cuff: a plain hem has no cuff top to keep straight.
    if (g.taperLetOut && g.finish === 'cuff') lines.push(line(g.garmentId, 'taper-let-out', of));
  }
  if (opts.rush && lines.length > 0) lines.push(line(null, 'rush'));
  return { lines, unpriced };
}

/** The sum of some amounts in minor units. */
export function sumMinor(items: readonly { amountMinor: number }[]): number {
  return items.reduce((total, i) => total + i.amountMinor, 0);
}

/** Total, what has been paid and what is still due; never below zero due. */
export function balanceOf(lines: readonly { amountMinor: number }[], payments: readonly { amountMinor: number }[]) {
  const total = sumMinor(lines);
  const paid = sumMinor(payments);
  return { total, paid, due: Math.max(0, total - paid) };
}
