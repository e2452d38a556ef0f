// The thresholds and defaults of the newer kinds of work, each with where its figure comes from.
// Every one is a default the shop may change: each plan takes an override in its input.
// Inch figures first; metric ones are our own round numbers near them (NIST: convert, then round sensibly).
import { Exact } from './exact';
import { formatExactQ } from './format-length';
import type { ShopDefault } from './notes';
import type { Len, Unit } from './types';
import { isMetric } from './units';

const inch = (n: number, d = 1): Exact => Exact.ratio(n * 127, d * 5);
const mm = (n: number, d = 1): Exact => Exact.ratio(n, d);

/** Source note for a figure that is the shop's usual practice and no published text we checked. */
export const NO_SOURCE = 'common practice (no source)';

/** A length default in both unit systems, with its source. */
interface LengthDefault {
  inch: Exact;
  metric: Exact;
  source: string;
}

/** The length thresholds and defaults, exact, in mm. */
export const KIND_LENGTHS = {
  /** a plain skirt hem when none is asked (straight skirt) */
  skirtHemDepth: { inch: inch(2), metric: mm(50), source: NO_SOURCE },
  /** turn-under of a skirt hem: as a trouser hem's (TRADE.md: turn-under ¼ in) */
  skirtTurnUnder: { inch: inch(1, 4), metric: mm(6), source: 'TRADE.md: powersewing.com; common sewing references (turn-under ¼ in)' },
  /** the narrowest hem still turned and stitched (turn-under and a stitch); narrower is rolled */
  narrowestTurnedHem: { inch: inch(1, 2), metric: mm(12), source: NO_SOURCE },
  /** a narrow rolled hem's finished width */
  rolledHemWidth: { inch: inch(1, 8), metric: mm(3), source: NO_SOURCE },
  /** a jacket or coat sleeve's hem depth when none is measured */
  sleeveHemDepth: { inch: inch(3, 2), metric: mm(40), source: NO_SOURCE },
  /** from the finished sleeve edge to the lowest button's centre, when not measured */
  bottomButtonAboveEdge: { inch: inch(5, 4), metric: mm(32), source: NO_SOURCE },
  /** sleeve buttons centre to centre, when not measured: about one button's width (buttons just touching) */
  buttonSpacing: { inch: inch(5, 8), metric: mm(16), source: NO_SOURCE },
  /** cloth kept between the top button's centre and the top of the vent */
  ventTopMargin: { inch: inch(1, 2), metric: mm(12), source: NO_SOURCE },
  /** how much a sleeve with working (cut) buttonholes may still be shortened at the cuff: none, by default */
  workingButtonholeSlack: { inch: inch(0), metric: mm(0), source: NO_SOURCE },
  /** the sleeve lining's folded edge above the finished sleeve edge */
  liningFoldAboveEdge: { inch: inch(1, 2), metric: mm(12), source: NO_SOURCE },
  /** the lining's ease pleat (jump pleat): extra lining folded over its stitching so it never pulls */
  liningEasePleat: { inch: inch(1, 2), metric: mm(12), source: NO_SOURCE },
  /** seam allowance on each side of the join when a factory jeans hem is sewn back on */
  jeansSeamAllowance: { inch: inch(3, 8), metric: mm(10), source: NO_SOURCE },
} as const satisfies Record<string, LengthDefault>;

/** The name of a length default. */
export type KindLengthName = keyof typeof KIND_LENGTHS;

/** A length default for a unit, exact. */
export function kindLength(name: KindLengthName, unit: Unit): Exact {
  const d = KIND_LENGTHS[name];
  return isMetric(unit) ? d.metric : d.inch;
}

/**
 * The most fullness a turned hem eases in and still lies flat, as a fraction of the round where the
 * turned-up edge lands (our own figure, chosen so a 1½–2 in hem on an ordinary A-line skirt and a
 * narrow hem on a knee-length circle skirt both pass).
 */
export const HEM_EASE_LIMIT: ShopDefault<Exact> = { value: Exact.ratio(3, 100), source: NO_SOURCE, shopMayChange: true };

/** The cloths with an expected length shrinkage when first washed (percent). */
export type ShrinkCloth = 'raw-denim' | 'preshrunk-denim' | 'unwashed-cotton' | 'prewashed';

/** Expected length shrinkage at the first wash, percent, per cloth, with its source. */
export const SHRINKAGE_PERCENT: Readonly<Record<ShrinkCloth, ShopDefault<Exact>>> = {
  'raw-denim': {
    value: Exact.int(10),
    source: 'from memory: raw ("shrink-to-fit", not pre-shrunk) denim is commonly said to shrink about 7–10% in length; the top of the range is kept',
    shopMayChange: true,
  },
  'preshrunk-denim': {
    value: Exact.int(1),
    source: 'from memory: compressive pre-shrinking at the mill is commonly said to leave under 1% residual shrinkage',
    shopMayChange: true,
  },
  'unwashed-cotton': {
    value: Exact.int(5),
    source: 'from memory: general sewing guides give about 3–5% for unwashed cotton; the top of the range is kept',
    shopMayChange: true,
  },
  prewashed: { value: Exact.int(0), source: NO_SOURCE, shopMayChange: true },
};

/** A shop default as shown in one unit. */
export interface ShownDefault {
  value: Len;
  source: string;
  shopMayChange: true;
}

function shownLengths(unit: Unit): Readonly<Record<KindLengthName, ShownDefault>> {
  const out = {} as Record<KindLengthName, ShownDefault>;
  for (const name of Object.keys(KIND_LENGTHS) as KindLengthName[]) {
    const v = kindLength(name, unit);
    out[name] = { value: { mm: v.valueOf(), text: formatExactQ(v, unit, 16) }, source: KIND_LENGTHS[name].source, shopMayChange: true };
  }
  return out;
}

/** Every default of the newer kinds, ready to show with its source and "shop may change" (lengths per unit; ratios as numbers). */
export const KIND_DEFAULTS = {
  lengths: { in: shownLengths('in'), cm: shownLengths('cm'), mm: shownLengths('mm') } as Readonly<Record<Unit, Readonly<Record<KindLengthName, ShownDefault>>>>,
  hemEaseLimit: { value: HEM_EASE_LIMIT.value.valueOf(), source: HEM_EASE_LIMIT.source, shopMayChange: true } as ShopDefault<number>,
  shrinkagePercent: Object.fromEntries(
    Object.entries(SHRINKAGE_PERCENT).map(([k, v]) => [k, { value: v.value.valueOf(), source: v.source, shopMayChange: true }]),
  ) as Readonly<Record<ShrinkCloth, ShopDefault<number>>>,
} as const;
