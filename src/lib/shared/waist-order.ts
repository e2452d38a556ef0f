// The shop's order of work when a waist change waits on the same trousers: record the change at the
// fitting and move the pin mark by it, or have the waist done first and pin the length after.
// Plain data and pure checks, shared by the services, the islands and the schema.

/** How the shop handles a hem pinned while a waist change is still to do. */
export const WAIST_ORDERS = ['record', 'waist-first'] as const;
/** One of WAIST_ORDERS. */
export type WaistOrder = (typeof WAIST_ORDERS)[number];
/** The order a shop has until its lead chooses one. */
export const DEFAULT_WAIST_ORDER: WaistOrder = 'record';

/** How the lead's settings page names each order. */
export const WAIST_ORDER_LABELS: Record<WaistOrder, string> = {
  record: 'Pin now: record the waist change and move the pin mark by it',
  'waist-first': 'Waist first: alter the waist, then pin the length at a new fitting',
};

/** What the server answers on the pin when the shop does the waist first and a waist change is still to do. */
export function waistFirstRefusal(leg: 'left' | 'right'): string {
  return `The shop does the waist first: the ${leg} leg has a waist change still to do, so its length is pinned after the waist is altered. Leave the pin blank for now, or clear the waist change once it is done.`;
}
