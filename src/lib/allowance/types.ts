// The allowance engine's public contract. The API, the calculator, the bench screens and the cut
// sheets all read these shapes: keep them stable, add freely.

/** A unit a plan is entered and shown in. */
export type Unit = 'in' | 'cm' | 'mm';

/** How finely inches are shown: to the nearest 1/8, 1/16 or 1/32. */
export type Precision = 8 | 16 | 32;

/** A length as typed: a number in the plan's unit, or text ("1 1/2", "38 mm", "31 3/4 + 1/8"). */
export type LengthInput = number | string;

/** A length held exactly (mm) and shown in the plan's unit (text). */
export interface Len {
  /** exact value in millimetres, as a number */
  mm: number;
  /** display in the plan's unit: "1 9/16 in", "38.5 mm", "3.85 cm" */
  text: string;
}

/** A warning in words a tailor understands. */
export interface PlanWarning {
  code: WarningCode;
  /** the English sentence (the API's); screens and sheets render `code` and `values` through the catalog (src/lib/server/i18n) */
  message: string;
  /** the message's figures as shown ("1 1/2 in") and its variant, for rendering it in any language */
  values: Record<string, string>;
}

/** Every warning the engine can raise, once: the type, the API's answer schema and the tests read it. */
export const WARNING_CODES = [
  'not-enough-cloth',
  'third-section-too-small',
  'stitching-above-cuff',
  'cuff-depth-unusual',
  'slope-on-cuff',
  'old-crease-visible',
  'taper-beyond-tolerance',
  'let-out-exceeds-seam-allowance',
  'hem-allowance-unusual',
  'turn-under-too-large',
] as const;

/** One warning the engine can raise. */
export type WarningCode = (typeof WARNING_CODES)[number];

/** The name of a chalk line, top to bottom. */
export type CuffLineName = 'finished-edge' | 'cuff-top' | 'inner-fold' | 'cut';

/** One chalk line of a cuff plan. */
export interface CuffLine {
  n: 1 | 2 | 3 | 4;
  name: CuffLineName;
  /** distance below the pin mark */
  belowMark: Len;
  /** distance above the raw edge of the cloth (null when the cloth available is not known) */
  aboveRawEdge: Len | null;
}

/** What a cuff plan takes as input. */
export interface CuffInput {
  unit: Unit;
  precision?: Precision;
  /** finished height of the cuff; at least 3/4 in (20 mm metric), the shallowest workable */
  cuffDepth: LengthInput;
  /** third section, from the inner fold to the cut; default = cuffDepth */
  hemSection?: LengthInput;
  /** folded under at the raw edge; default 1/2 in (12 mm metric) */
  turnUnder?: LengthInput;
  /** cloth below the pin mark once any old hem is let down */
  available?: LengthInput;
  /** optional turn-of-cloth allowance for thick cloth, taken at each of the two folds */
  clothThickness?: LengthInput;
  /** optional: the old hem fold, distance below the mark (negative above) */
  oldCrease?: LengthInput;
  /** a slope is for plain hems only; a cuff asked to slope is planned level with a warning */
  slope?: LengthInput;
}

/**
 * Where an old crease ends up once the cuff is made ('cut-away': below the cutting line;
 * 'at-cuff-top': on the leg within the stated tolerance of the cuff top, where it may show).
 */
export type CreasePlace = 'leg-visible' | 'at-cuff-top' | 'behind-cuff' | 'cuff-face' | 'inside' | 'on-fold' | 'cut-away';

/** Where an old crease lands, in words and as a height above the finished edge. */
export interface CreaseLanding {
  place: CreasePlace;
  /** height above the finished edge once the cuff is turned up ('cut-away': where it would have lain inside) */
  heightAboveEdge: Len;
  /** true when it will or may show on the outside of the finished trouser */
  visible: boolean;
  message: string;
  /** the message's figures as shown and the fold it falls on, for rendering it in any language */
  values: Record<string, string>;
}

/** What can still be done when the cloth is short, in the order to offer them. */
export interface CuffAlternatives {
  /** the customer's cuff depth kept, on the longest third section that fits and still holds the turn-under and a safe stitch (null if none) */
  shorterSection: Len | null;
  /** deepest cuff shallower than asked, to the display step, that fits with three equal sections (null under the shallowest workable cuff, 3/4 in / 20 mm) */
  deepestCuff: Len | null;
  /** a plain hem with the usual allowance */
  plainHem: { required: Len; fits: boolean };
  /** a faced cuff: own cloth for the two outer sections plus a seam, the third section a facing */
  facedCuff: { required: Len; fits: boolean };
}

/** A cuff plan: the four chalk lines, the cloth check and the warnings. */
export interface CuffPlan {
  kind: 'cuff';
  unit: Unit;
  precision: Precision;
  cuffDepth: Len;
  hemSection: Len;
  turnUnder: Len;
  lines: CuffLine[];
  /** cloth needed below the mark: 2 × cuff depth + third section (+ turn of cloth) */
  required: Len;
  /** null when the cloth available is not known */
  enough: boolean | null;
  shortBy: Len | null;
  spare: Len | null;
  /** present only when the cloth is short */
  alternatives: CuffAlternatives | null;
  /** present only when an old crease was given */
  creaseLands?: CreaseLanding;
  warnings: PlanWarning[];
}

/** The name of a chalk line of a plain hem. */
export type HemLineName = 'finished-edge' | 'cut';

/** One chalk line of a plain hem, at the back (where the pin is) and at the front. */
export interface HemLine {
  n: 1 | 2;
  name: HemLineName;
  /** at the back of the leg, below the pin mark */
  belowMark: Len;
  /** at the front of the leg, below the back pin mark (negative when above it) */
  frontBelowMark: Len;
  aboveRawEdge: Len | null;
}

/** What a plain hem plan takes as input. */
export interface HemInput {
  unit: Unit;
  precision?: Precision;
  /** cloth left below the finished edge, turn-under included; default 1 1/2 in (40 mm metric) */
  hemAllowance?: LengthInput;
  /** default 1/4 in (6 mm metric) */
  turnUnder?: LengthInput;
  available?: LengthInput;
  /** how much lower the hem sits at the back than at the front; default 0 */
  slope?: LengthInput;
  /** how far below the pin mark the finished edge is chalked (a shrink allowance for unwashed cloth); default 0, at the mark */
  edgeBelowMark?: LengthInput;
}

/** A plain hem plan. */
export interface HemPlan {
  kind: 'hem';
  unit: Unit;
  precision: Precision;
  hemAllowance: Len;
  turnUnder: Len;
  slope: Len;
  lines: HemLine[];
  required: Len;
  enough: boolean | null;
  shortBy: Len | null;
  spare: Len | null;
  warnings: PlanWarning[];
}

/** What a taper check takes as input. Widths are measured flat (half the round). */
export interface TaperInput {
  unit: Unit;
  precision?: Precision;
  cuffDepth: LengthInput;
  hemSection?: LengthInput;
  /** leg width measured flat at the finished edge */
  widthAtEdge: LengthInput;
  /** leg width measured flat higher up … */
  widthAbove: LengthInput;
  /** … this far above the finished edge */
  heightAbove: LengthInput;
  /** seam allowance left on each side of each leg seam */
  seamAllowance?: LengthInput;
  /** flat difference that needs no work; default 1/8 in (3 mm metric) */
  tolerance?: LengthInput;
  clothThickness?: LengthInput;
  /**
   * on a let-down leg: the width measured flat at the cutting line, used there instead of the taper
   * followed down (the old hem's allowance often flares below the old fold)
   */
  widthAtCut?: LengthInput;
  /** with widthAtCut: the old hem fold below the mark; the taper holds down to it (without it, down to the finished edge) */
  oldCrease?: LengthInput;
}

/** What a taper check under a plain hem takes. Widths are measured flat (half the round). */
export interface HemTaperInput {
  unit: Unit;
  precision?: Precision;
  /** default 1 1/2 in (40 mm metric), as planHem */
  hemAllowance?: LengthInput;
  widthAtEdge: LengthInput;
  widthAbove: LengthInput;
  heightAbove: LengthInput;
  seamAllowance?: LengthInput;
  /** default 1/8 in (3 mm metric) */
  tolerance?: LengthInput;
  /** on a let-down leg: the width measured flat at the cutting line, used instead of the taper followed down */
  widthAtCut?: LengthInput;
  /** the finished edge this far below the pin mark (where widthAtEdge was measured), as planHem: the taper followed down to it; default 0 */
  edgeBelowMark?: LengthInput;
}

/** The work at one chalk line to keep the cuff-top width straight down. */
export interface TaperLine {
  n: 1 | 2 | 3 | 4;
  name: CuffLineName;
  belowMark: Len;
  /** the leg's flat width there now (the taper followed down) */
  width: Len;
  /** flat change to reach the target: + let out, − take in */
  change: Len;
  /** added round the leg at each of the two leg seams (= change) */
  perSeam: Len;
  /** moved on each side of each seam (= change / 2) */
  perSide: Len;
  /** true on the cutting line when its width was measured there (widthAtCut), not followed down from the taper */
  measured?: boolean;
}

/** A taper check: how to keep the leg straight under the cuff. */
export interface TaperPlan {
  kind: 'taper';
  /** 'hem': checked under a plain hem (lines 1 and 2, the allowance flared to mirror the taper); absent: under a cuff */
  finish?: 'hem';
  unit: Unit;
  precision: Precision;
  /** flat width where the cuff top sits (one cuff depth above the finished edge); under a hem, one hem allowance above it */
  targetWidth: Len;
  lines: TaperLine[];
  withinTolerance: boolean;
  /** null without a seam allowance */
  feasible: boolean | null;
  warnings: PlanWarning[];
}
