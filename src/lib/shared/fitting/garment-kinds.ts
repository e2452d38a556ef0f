// The one list of garment kinds, shared by the server (zod, services, sheet, prices) and the islands.
// Trousers are fitted per leg (measurements, kinds.ts); every other kind keeps one fitting per
// garment (kind_fittings) and plugs in through its adapter (kind-adapters.ts). Plain data: islands
// read it without the engine.
import type { PriceKey } from '../../pricing/price-keys';

/** Every garment kind the app knows, in the order the counter is offered them. */
export const GARMENT_KINDS = ['trousers', 'skirt', 'sleeves'] as const;

/** A garment kind (garments.kind). */
export type GarmentKindId = (typeof GARMENT_KINDS)[number];

/** The kinds intake offers. */
export const OFFERED_KINDS = ['trousers', 'skirt', 'sleeves'] as const satisfies readonly GarmentKindId[];

/** A kind the counter may choose. */
export type OfferedKind = (typeof OFFERED_KINDS)[number];

/** A kind fitted once per garment (not per leg): its fitting lives in kind_fittings. */
export type WholeGarmentKind = Exclude<GarmentKindId, 'trousers'>;

/** What each kind is called on screen until the catalog takes it over (the catalog key is `kind.<id>`). */
export const GARMENT_KIND_LABELS: Record<GarmentKindId, string> = {
  trousers: 'Trousers',
  skirt: 'Skirt or dress',
  sleeves: 'Jacket or coat sleeves',
};

/** True when the value names a known garment kind. */
export function isGarmentKind(value: unknown): value is GarmentKindId {
  return typeof value === 'string' && (GARMENT_KINDS as readonly string[]).includes(value);
}

/** The stored kind read safely: anything unknown is trousers (the column's default). */
export function kindOf(stored: string | null | undefined): GarmentKindId {
  return isGarmentKind(stored) ? stored : 'trousers';
}

/** True when a kind is fitted per leg (trousers); every other kind has one fitting per garment. */
export function isLegKind(kind: GarmentKindId): kind is 'trousers' {
  return kind === 'trousers';
}

/** The price list's line for each whole-garment kind's work (null: not built yet); trousers are priced by their finish. */
export const KIND_PRICE_KEYS: Record<WholeGarmentKind, PriceKey | null> = {
  skirt: 'skirt-hem',
  sleeves: 'sleeves-shorten',
};

/** The price line of a garment kind fitted once (a skirt's hem), or null for trousers and kinds not built yet. */
export function workKeyOf(kind: string | null | undefined): PriceKey | null {
  return isGarmentKind(kind) && kind !== 'trousers' ? KIND_PRICE_KEYS[kind] : null;
}
