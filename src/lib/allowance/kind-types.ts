// The public shapes of the newer kinds of work (issue 17): skirt and dress hems, hems levelled from
// the floor, jacket sleeves shortened at the cuff, jeans keeping the factory hem, a pending waist
// change, and shrinkage. Warnings and advice are codes with values (the words live in the catalog).
import type { CautionCode, Note } from './notes';
import type { LengthInput, Len, Precision, Unit } from './types';

/** How the skirt flares: straight, a fraction of a circle, the flat pattern's angle, or two rounds measured. */
export type SkirtFlare =
  | { kind: 'straight' }
  /** 1 a full circle skirt, 1/2 a half circle, 1/4 a quarter circle (up to 4 for layered circles) */
  | { kind: 'circle'; fraction: number | string }
  /** the flat pattern's whole angle round the body, degrees (360 a full circle) */
  | { kind: 'angle'; degrees: number | string }
  /** A-line and gored skirts: the round higher up and its height above the finished edge, along the skirt */
  | { kind: 'measured'; upperCircumference: LengthInput; heightAbove: LengthInput };

/** What a skirt or dress hem plan takes. */
export interface FlaredHemInput {
  unit: Unit;
  precision?: Precision;
  flare: SkirtFlare;
  /** round of the skirt at its finished edge (for a circle or an angle: this, or waist and skirt length) */
  hemCircumference?: LengthInput;
  /** round at the waist seam (circle or angle, with skirtLength, when the hem's round is not measured) */
  waistCircumference?: LengthInput;
  /** waist seam to finished edge, along the skirt */
  skirtLength?: LengthInput;
  /** the hem depth asked; default 2 in (50 mm) */
  hemDepth?: LengthInput;
  turnUnder?: LengthInput;
  /** shop may change: the most fullness eased in, percent of the round where the hem lands; default 3 */
  easeLimitPercent?: number | string;
  /** shop may change: narrower than this a hem is rolled, not turned; default 1/2 in (12 mm) */
  narrowestTurnedHem?: LengthInput;
  /** shop may change: a narrow rolled hem's width; default 1/8 in (3 mm) */
  rolledHemWidth?: LengthInput;
}

/** How to finish a skirt hem. */
export type SkirtHemFinish = 'turned' | 'turned-narrower' | 'rolled' | 'faced';

/** The notes a skirt hem plan can carry. */
export type FlaredHemNoteCode =
  | 'ease-fullness'
  | 'depth-reduced'
  | 'face-to-keep-depth'
  | 'rolled-hem'
  | 'faced-hem'
  | 'let-out-hem-seams'
  | 'turn-under-too-large';

/** A skirt or dress hem: the fullness a turned hem must ease in, the deepest hem that lies flat, and how to finish. */
export interface FlaredHemPlan {
  kind: 'flared-hem';
  unit: Unit;
  precision: Precision;
  /** 'flared' wider at the hem, 'tapered' narrower at the hem (a pegged skirt), 'straight' neither */
  shape: 'straight' | 'flared' | 'tapered';
  hemDepth: Len;
  turnUnder: Len;
  hemCircumference: Len;
  /** the flat pattern's radius to the hem (the cone's slant height), null when straight or tapered */
  slantRadius: Len | null;
  /** the flat pattern's whole angle, degrees (360 a full circle; negative tapered) */
  flareDegrees: number;
  /** round fullness per unit of hem depth (2π for a full circle skirt) */
  fullnessPerDepth: number;
  /** how much longer the turned-up edge is than the round it lands on (negative: shorter) */
  fullness: Len;
  /** the round where the turned-up edge lands, one hem depth above the finished edge */
  landingCircumference: Len;
  /** fullness as a percent of the landing round */
  easePercent: number;
  /** the deepest hem whose fullness still eases in, to the display step (null: any depth, no fullness) */
  liesFlatTo: Len | null;
  finish: SkirtHemFinish;
  /** the depth to turn or roll (null for a facing) */
  finishDepth: Len | null;
  notes: Note<FlaredHemNoteCode>[];
  cautions: CautionCode[];
  /** where each rule and figure comes from */
  sources: Readonly<Record<string, string>>;
}

/** A place round the hem where the marker's line is measured (the sheet names it). */
export type HemPoint = 'centre-front' | 'left-front' | 'left-side' | 'left-back' | 'centre-back' | 'right-back' | 'right-side' | 'right-front';

/** One place round the hem, measured at the fitting. */
export interface LevelPointInput {
  at: HemPoint;
  /** the marker's pin or chalk line above the garment's present finished edge there */
  pinAboveEdge: LengthInput;
  /** cloth below the present edge once the old hem is let down (optional: checks the cloth) */
  cloth?: LengthInput;
}

/** What levelling a hem from the floor takes. */
export interface LevelHemInput {
  unit: Unit;
  precision?: Precision;
  /** the hem marker's line above the floor, as set at the fitting */
  markerHeight: LengthInput;
  /** the finished hem's height above the floor wanted, in the shoes to be worn */
  hemFromFloor: LengthInput;
  /** how far the shoes worn at the marking raise the wearer (about the heel less the sole under the ball); default 0 */
  shoesAtMarking?: LengthInput;
  /** the same for the shoes the garment will be worn with; default: the marking's */
  shoesToWear?: LengthInput;
  /** hem depth below the new hem line; default 2 in (50 mm) */
  hemDepth?: LengthInput;
  points: readonly LevelPointInput[];
}

/** The new hem line at one place round the hem. */
export interface LevelPoint {
  at: HemPoint;
  pinAboveEdge: Len;
  /** the new hem line above the present edge: + shorten by this, − let down by this */
  newLineAboveEdge: Len;
  /** the cutting line (one hem depth below the new line) above the present edge; negative: inside the let-down hem */
  cutAboveEdge: Len;
  /** cloth left below the cutting line (null when the cloth there is not given) */
  spare: Len | null;
  enough: boolean | null;
}

/** The notes a levelled hem can carry. */
export type LevelHemNoteCode = 'chalk-from-pins' | 'shoes-differ' | 'not-enough-cloth' | 'old-hem-line-shows' | 'uneven-hem';

/** A hem levelled from the floor: where the new line runs at each place measured. */
export interface LevelHemPlan {
  kind: 'level-hem';
  unit: Unit;
  precision: Precision;
  /** how far below the marker's line the new hem line runs, all round (negative: above it) */
  newLineBelowPins: Len;
  /** how much higher the wearer stands in the shoes to be worn than at the marking */
  shoeRise: Len;
  hemDepth: Len;
  points: LevelPoint[];
  /** the largest less the smallest change round the hem: how uneven the present hem hangs */
  unevenBy: Len;
  notes: Note<LevelHemNoteCode>[];
  cautions: CautionCode[];
  sources: Readonly<Record<string, string>>;
}

/** The sleeve's buttonholes: none (buttons sewn on a closed vent), decorative (stitched, not cut) or working (cut open). */
export type SleeveButtonholes = 'none' | 'decorative' | 'working';

/** What shortening a jacket or coat sleeve takes. */
export interface SleeveInput {
  unit: Unit;
  precision?: Precision;
  /** how much shorter the sleeve is to be */
  shortenBy: LengthInput;
  buttonholes: SleeveButtonholes;
  /** buttons on the vent; default 4 */
  buttons?: number | string;
  /** finished edge to the lowest button's centre, now; default 1 1/4 in (32 mm) */
  bottomButtonAboveEdge?: LengthInput;
  /** buttons centre to centre; default 5/8 in (16 mm) */
  buttonSpacing?: LengthInput;
  /** the vent's top above the present finished edge (optional: checks the buttons still fit) */
  ventLength?: LengthInput;
  /** the sleeve's hem depth; default 1 1/2 in (40 mm) */
  hemDepth?: LengthInput;
  /** the lining's fold above the present edge, as it is now (optional; default: as wanted) */
  liningFoldNow?: LengthInput;
  /** the lining's ease pleat as it is now (optional; default: as wanted) */
  liningPleatNow?: LengthInput;
  /** shop may change: the lining's fold above the finished edge; default 1/2 in (12 mm) */
  liningFoldAboveEdge?: LengthInput;
  /** shop may change: the lining's ease pleat; default 1/2 in (12 mm) */
  liningEasePleat?: LengthInput;
  /** shop may change: cloth between the top button's centre and the vent's top; default 1/2 in (12 mm) */
  ventTopMargin?: LengthInput;
  /** shop may change: how much a sleeve with working buttonholes may still be shortened at the cuff; default 0 */
  workingButtonholeSlack?: LengthInput;
}

/** One button on the vent after the work, lowest first. */
export interface SleeveButton {
  n: number;
  /** its centre above the new finished edge */
  aboveNewEdge: Len;
  /** how far it is moved up the sleeve (0: left where it is) */
  moveUp: Len;
}

/** The notes a sleeve plan can carry. */
export type SleeveNoteCode =
  | 'move-buttons'
  | 'restitch-buttonholes'
  | 'remake-vent-corners'
  | 'buttonholes-closer-to-edge'
  | 'working-buttonholes-shorten-at-shoulder'
  | 'vent-cut-away-shorten-at-shoulder'
  | 'recut-sleeve-head'
  | 'vent-too-short-for-buttons';

/** A sleeve shortened at the cuff (keeping the vent and buttons) or, when it must be, from the shoulder. */
export interface SleevePlan {
  kind: 'sleeve';
  unit: Unit;
  precision: Precision;
  method: 'cuff' | 'shoulder';
  shortenBy: Len;
  hemDepth: Len;
  /** at the cuff: the new finished edge above the present one (null from the shoulder) */
  newEdgeAboveEdge: Len | null;
  /** at the cuff: the cutting line above the present edge (negative: inside the unfolded hem; null from the shoulder) */
  cutAboveEdge: Len | null;
  buttons: SleeveButton[];
  /** buttonholes moved up this far (decorative ones restitched), 0 when they stay */
  buttonholesMoveUp: Len;
  /** the vent after the work, from the new edge to its top (null when the vent's length is not given) */
  ventAfter: Len | null;
  /** room between the top button and the vent's top after the work, less the margin (negative: they do not fit) */
  ventRoom: Len | null;
  lining: {
    /** how much shorter the lining is made (at the cuff, or at the sleeve head from the shoulder) */
    shortenBy: Len;
    foldAboveEdge: Len;
    easePleat: Len;
  };
  notes: Note<SleeveNoteCode>[];
  cautions: CautionCode[];
  sources: Readonly<Record<string, string>>;
}

/** What shortening jeans while keeping the factory hem takes. */
export interface OriginalHemInput {
  unit: Unit;
  precision?: Precision;
  /** how much shorter the leg is to be */
  shortenBy: LengthInput;
  /** the factory hem's depth: from the present edge to the top of its stitching */
  factoryHem: LengthInput;
  /** shop may change: seam allowance on each side of the join; default 3/8 in (10 mm) */
  seamAllowance?: LengthInput;
  /** the inseam now, crotch to the present edge (optional: gives the two pieces' lengths) */
  inseamNow?: LengthInput;
  /** taper check (optional, all three): leg width flat at the present edge … */
  widthAtEdge?: LengthInput;
  /** … and higher up … */
  widthAbove?: LengthInput;
  /** … this far above the present edge */
  heightAbove?: LengthInput;
  /** flat difference at the join that needs no work; default 1/8 in (3 mm) */
  tolerance?: LengthInput;
}

/** A chalk line of the original-hem method, top to bottom. */
export type OriginalHemLineName = 'join' | 'leg-cut' | 'fold' | 'band-cut' | 'band-top' | 'present-edge';

/** The notes an original-hem plan can carry. */
export type OriginalHemNoteCode = 'fold-only' | 'take-in-leg-above-join' | 'take-in-band' | 'chalk-on-both-legs';

/** Jeans shortened keeping the factory hem: where to chalk, the seam allowance taken twice, the taper at the new height. */
export interface OriginalHemPlan {
  kind: 'original-hem';
  unit: Unit;
  precision: Precision;
  shortenBy: Len;
  factoryHem: Len;
  seamAllowance: Len;
  /** 'cut-and-join': the band cut off and sewn back; 'fold-only': too little to cut away, the tuck stays inside */
  method: 'cut-and-join' | 'fold-only';
  /** below the pin mark (the new finished edge) on the leg as it hangs; negative above it */
  lines: { name: OriginalHemLineName; belowMark: Len }[];
  /** cloth cut away between the two cutting lines: shortenBy − 2 × seam allowance */
  removed: Len;
  /** length the join takes: 2 × seam allowance */
  seamTakes: Len;
  /** the two pieces before joining, crotch to leg cut and band cut to edge; with the inseam now */
  pieces: { leg: Len | null; band: Len; total: Len | null; newInseam: Len | null };
  /** flat widths at the join: the leg's there less the band top's (+ leg wider), null without widths */
  taper: { mismatch: Len; perSeam: Len; perSide: Len; withinTolerance: boolean } | null;
  notes: Note<OriginalHemNoteCode>[];
  cautions: CautionCode[];
  sources: Readonly<Record<string, string>>;
}

/** How a pending waist change is taken at the fitting: the pin mark moved for it, or the waist done first. */
export type WaistPolicy = 'record' | 'waist-first';

/** The rule that says how far the trousers move: from the wearer's girths, or the shop's own ratio. */
export type WaistMoveRule = 'girth-slope' | 'shop-ratio';

/** What the pin mark's move for a pending waist or seat change takes. */
export interface WaistMoveInput {
  unit: Unit;
  precision?: Precision;
  /** the shop's choice; default 'record' */
  policy?: WaistPolicy;
  /** the pending change round the waistband: negative taken in, positive let out */
  waistChange: LengthInput;
  /** the pending change round the seat: negative taken in, positive let out; default 0 */
  seatChange?: LengthInput;
  rule: WaistMoveRule;
  /** girth-slope: the wearer's waist girth where the band sits … */
  waistGirth?: LengthInput;
  /** … the seat girth … */
  seatGirth?: LengthInput;
  /** … and the depth between them, down the body */
  waistToSeat?: LengthInput;
  /** shop-ratio: the trousers' rise per unit taken in at the waist (the shop's own figure) */
  waistRatio?: number | string;
  /** shop-ratio: the same per unit taken in at the seat; default 0 */
  seatRatio?: number | string;
  /** optional: the most the trousers can rise (to the natural waist, say) */
  mostRise?: LengthInput;
}

/** The notes a waist move can carry. */
export type WaistMoveNoteCode = 'waist-first' | 'pin-mark-moves' | 'seat-change-not-counted' | 'rise-capped' | 'check-at-next-fitting';

/** How far the pin mark moves for a pending waist change, with the rule and its source. */
export interface WaistMovePlan {
  kind: 'waist-move';
  unit: Unit;
  precision: Precision;
  policy: WaistPolicy;
  /** how much higher the trousers will sit once the change is made (negative: lower); null when the waist is done first */
  rise: Len | null;
  /** how far the pin mark moves down the leg to keep the finished length where it was pinned (negative: up); null when the waist is done first */
  pinMarkMoves: Len | null;
  direction: 'down' | 'up' | 'none' | null;
  rule: { code: WaistMoveRule; waistRatio: number; seatRatio: number; source: string };
  notes: Note<WaistMoveNoteCode>[];
  sources: Readonly<Record<string, string>>;
}

/** What a shrink allowance on a plain hem takes. */
export interface ShrinkInput {
  unit: Unit;
  precision?: Precision;
  /** the cloth: a preset with its expected shrinkage, or 'other' with shrinkPercent */
  cloth: 'raw-denim' | 'preshrunk-denim' | 'unwashed-cotton' | 'prewashed' | 'other';
  /** shop may change: expected length shrinkage at the first wash, percent (needed for 'other') */
  shrinkPercent?: number | string;
  /** the length that shrinks down to the pin mark: the inseam from the crotch, or the length from the waist */
  lengthToMark: LengthInput;
  /** the hem allowance wanted after washing; default 1 1/2 in (40 mm) */
  hemAllowance?: LengthInput;
}

/** The notes a shrink allowance can carry. */
export type ShrinkNoteCode = 'shrink-allowance' | 'wash-first-advised' | 'no-shrinkage';

/** A plain hem made long enough to shrink to the pinned length. */
export interface ShrinkPlan {
  kind: 'shrink';
  unit: Unit;
  precision: Precision;
  percent: number;
  /** where the percent comes from (the preset's source, or the shop's own figure) */
  percentSource: string;
  /** the finished edge chalked this far below the pin mark (unwashed) */
  finishedEdgeBelowMark: Len;
  /** the hem allowance cut before washing, so it shrinks to the one wanted */
  hemAllowanceUnwashed: Len;
  /** the cutting line below the pin mark */
  cutBelowMark: Len;
  /** a check: the finished length after washing (equal to the length pinned) */
  lengthAfterWash: Len;
  notes: Note<ShrinkNoteCode>[];
  cautions: CautionCode[];
  sources: Readonly<Record<string, string>>;
}
