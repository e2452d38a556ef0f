// Pure price computation: garments (finish, taper, old cuff) and the shop's list in, lines out.
// No database, no dates, no rounding: amounts are integer minor units and are only added.
import type { Part } from '../shared/fitting/kinds';
import type { PriceKey } from './price-keys';

/** What the pricing needs to know about one garment, read from its measurements and plan. */
export interface GarmentFacts {
  garmentId: string;
  /** shown beside its lines, e.g. "Grey flannel trousers" */
  label: string;
  /** null while the fitting has not decided the finish; 'original' the factory hem kept (jeans) */
  finish: Part | 'original' | null;
  /** the taper check says the leg must be let out to keep the cuff-top width down to the cut */
  taperLetOut: boolean;
  /** the trousers came in with a cuff that is let down and made again */
  oldCuff: boolean;
  /** a garment fitted once, not per leg (a skirt): its kind's line, from its adapter (fitting/kind-adapters.ts) */
  workKey?: PriceKey | null;
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

/** The garment's line: its kind's own (a skirt's hem), else a plain hem, a cuff made from a plain hem, an old cuff re-made, or jeans kept on their factory hem. */
export function finishKey(g: GarmentFacts): PriceKey | null {
  // Another kind of garment than trousers has its own line; the leg's finishes are not asked of it.
  if (g.workKey) return g.workKey;
  if (g.finish === 'original') return 'original-hem';
  if (g.finish === 'hem') return 'plain-hem';
  if (g.finish === 'cuff') return g.oldCuff ? 'cuff-remake' : 'cuff-from-hem';
  return null;
}

/** Prices a ticket's garments from the list; rush adds one surcharge line for the ticket when it
 * has work priced on it: these garments' lines, or `otherWork` (lines added by hand). See `RUSH_RULE`. */
export function priceTicket(garments: readonly GarmentFacts[], list: PriceList, opts: { rush: boolean; otherWork?: boolean }): PricedTicket {
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
    if (g.taperLetOut && g.finish === 'cuff' && !g.workKey) lines.push(line(g.garmentId, 'taper-let-out', of));
  }
  if (opts.rush && (lines.length > 0 || opts.otherWork)) lines.push(line(null, 'rush'));
  return { lines, unpriced };
}

/** The sum of some amounts in minor units. */
export function sumMinor(items: readonly { amountMinor: number }[]): number {
  return items.reduce((total, i) => total + i.amountMinor, 0);
}

/** The one rush rule, for every way a line is added: rush is one surcharge per ticket, on a ticket
 * with work priced on it (a line other than rush, an adjustment or "no charge"), whether the work
 * was priced from the garments or added from the list by hand. */
export const RUSH_RULE = 'Rush is one surcharge per ticket with work on it, however its lines were added.';

/** True when a line is work that rush may be charged on (see `RUSH_RULE`): a worked-out line or
 * one from the list, or a kind of work the lead said rush applies to (as it stood when added). */
export function isRushableWork(line: {
  key: string | null;
  kindId?: string | null;
  rushApplies?: boolean | null;
  source: string;
  voidedAt?: Date | string | null;
}): boolean {
  if (line.voidedAt || (line.source !== 'auto' && line.source !== 'list')) return false;
  if (line.kindId) return line.rushApplies === true;
  return line.key !== null && line.key !== 'rush';
}

/** The share of the ticket's total a reduction may take off without the lead: 50 %. */
export const LEAD_REDUCTION_SHARE = 0.5;

/** True when an adjustment takes off more than `LEAD_REDUCTION_SHARE` of the total it is made on. */
export function reductionNeedsLead(amountMinor: number, totalBefore: number): boolean {
  return amountMinor < 0 && -amountMinor > totalBefore * LEAD_REDUCTION_SHARE;
}

/** A ticket's money: the total of its live lines, what was paid and given back, and either what is
 * still due or the credit owed to the customer (never both). Failed refunds give nothing back. */
export interface Balance {
  total: number;
  paid: number;
  refunded: number;
  due: number;
  credit: number;
}

/** The balance of live (not voided) lines against payments and refunds, in minor units. */
export function balanceOf(
  lines: readonly { amountMinor: number; voidedAt?: Date | string | null }[],
  payments: readonly { amountMinor: number }[],
  refunds: readonly { amountMinor: number; status: string }[] = [],
): Balance {
  const total = sumMinor(lines.filter((l) => !l.voidedAt));
  const paid = sumMinor(payments);
  const refunded = sumMinor(refunds.filter((r) => r.status !== 'failed'));
  const net = paid - refunded;
  return { total, paid, refunded, due: Math.max(0, total - net), credit: Math.max(0, net - total) };
}
