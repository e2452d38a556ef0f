// What a cut sheet is made from: plain data, no database. A saved garment and the public
// calculator both build one of these and hand it to renderCutSheet.
import type { Language } from './i18n/languages';
import type { CreaseLanding, CuffInput, CuffPlan, HemInput, HemPlan, HemTaperInput, Precision, TaperInput, TaperPlan, Unit } from '@/lib/allowance/types';
import type { OriginalHemInput, OriginalHemPlan } from '@/lib/allowance/kind-types';
import type { ExistingFinish } from '@/lib/shared/existing-finish';
import type { SkirtPlan } from './fitting/skirt-fitting';
import type { SleeveFitting } from './fitting/sleeve-fitting';

/** The paper a sheet is printed on. */
export type PageSize = 'LETTER' | 'A4';

/** Which leg of the trouser. */
export type Side = 'left' | 'right';

/** A pending waist change's effect on the pin mark, as printed (lengths already written in the sheet's unit; `mark` = pin + `by` down, in whole steps). */
export interface WaistNote {
  code: 'moves' | 'movesBy' | 'none' | 'needs' | 'first';
  change: string;
  by: string;
  direction: 'down' | 'up' | 'none';
  /** the pin as printed ('' when none was pinned) */
  pin: string;
  /** the moved mark: pin + by down (or − by up), in whole steps */
  mark: string;
  rule: string;
  source: string;
}

/**
 * A hem left long for unwashed cloth (shrinkAllowance), as printed: every length in whole display
 * steps, each rounded to the safe side (down the leg, never short), and each sum made of the printed
 * figures (`edge` = `pin` + `allowance`, `cut` = `edge` + `hem`; without a pin, below the pin mark).
 */
export interface ShrinkNote {
  /** the cloth chosen (the registry's option value) */
  cloth: string;
  /** the expected shrinkage in length, percent, as printed ("10") */
  percent: string;
  /** where the percent comes from (the preset's source, or the shop's own figure) */
  source: string;
  /** the length that shrinks to the mark, as printed */
  length: string;
  /** the shrink allowance: how far below the pin mark the finished edge is chalked */
  allowance: string;
  /** the hem allowance cut before washing */
  hem: string;
  /** the pin as printed and the edge and cut as lengths from the same start ('' when no pin: `edge`/`cut` are below the mark) */
  pin: string;
  edge: string;
  cut: string;
  /** the cut below the pin mark: allowance + hem, in whole steps */
  cutBelow: string;
  /** 'none': no shrinkage expected (prewashed, or 0 %): the plan's lines stand */
  code: 'shrink' | 'none';
}

/** A length the fitting recorded for the bench that the engine does not plan with (a label and the text as typed). */
export interface RecordedLength {
  label: string;
  text: string;
}

/** One leg finished with a cuff: the engine's input, its plan and, on a tapered leg, the taper check. */
export interface CuffLeg {
  side: Side;
  finish: 'cuff';
  input: CuffInput;
  plan: CuffPlan;
  taper?: { input: TaperInput; plan: TaperPlan };
  /** where an old hem crease lands; defaults to plan.creaseLands */
  crease?: CreaseLanding;
  /** the finished length pinned at the back, as typed ("31 3/4 + 1/8"), in the plan's unit unless it names one */
  finished?: string;
  /** lengths recorded at the fitting that no plan uses, printed as typed (the registry's 'listed' fields) */
  recorded?: RecordedLength[];
  /** the pending waist change and where it moves the pin mark */
  waist?: WaistNote;
}

/** One leg finished with a plain hem. */
export interface HemLeg {
  side: Side;
  finish: 'hem';
  input: HemInput;
  plan: HemPlan;
  /** on a tapered leg: the hem turned up must lie flat too */
  taper?: { input: HemTaperInput; plan: TaperPlan };
  /** where an old hem crease lands, if the shop noted it */
  crease?: CreaseLanding;
  /** the finished length pinned at the back, as typed, in the plan's unit unless it names one */
  finished?: string;
  /** lengths recorded at the fitting that no plan uses, printed as typed (the registry's 'listed' fields) */
  recorded?: RecordedLength[];
  /** the pending waist change and where it moves the pin mark */
  waist?: WaistNote;
  /** unwashed cloth: the hem left long to shrink to the pin */
  shrink?: ShrinkNote;
}

/** One leg of jeans shortened keeping the factory hem: cut off above its stitching and sewn back on (its taper check inside the plan). */
export interface OriginalHemLeg {
  side: Side;
  finish: 'original';
  input: OriginalHemInput;
  plan: OriginalHemPlan;
  /** the finished length pinned at the back, as typed, in the plan's unit unless it names one */
  finished?: string;
  /** lengths recorded at the fitting that no plan uses, printed as typed (the registry's 'listed' fields) */
  recorded?: RecordedLength[];
  /** the pending waist change and where it moves the pin mark */
  waist?: WaistNote;
  taper?: undefined;
  crease?: undefined;
}

/** One leg of the garment. */
export type LegSheet = CuffLeg | HemLeg | OriginalHemLeg;

/** A skirt's or dress's sheet: the engine's plans (flared hem, and the levelling when taken), in the sheet's unit. */
export interface SkirtSheetData {
  kind: 'skirt';
  plan: SkirtPlan;
}

/** The sheet of a garment fitted once, not per leg, by its kind (cut-sheet/kinds/ draws each). */
/** Jacket or coat sleeves' sheet: the engine's input as typed (the sheet prints from both) and its plan, in the sheet's unit. */
export interface SleeveSheetData {
  kind: 'sleeves';
  plan: SleeveFitting;
}

export type KindSheetData = SkirtSheetData | SleeveSheetData;

/** Everything one cut sheet shows: one garment, one page. */
export interface CutSheetData {
  /** shop name; null on an unsaved calculator plan */
  shop: string | null;
  /** ticket number as the shop writes it ("1042", "A-17"); null when unsaved */
  ticket: string | null;
  /** garment description ("Navy wool flannel trousers") */
  garment: string | null;
  /** due date, ISO yyyy-mm-dd */
  due: string | null;
  /** who does the work */
  assignee: string | null;
  unit: Unit;
  precision: Precision;
  /** one or two legs, left before right; a single leg stands for both (none on a kind's sheet) */
  legs: LegSheet[];
  /** a garment fitted once (a skirt): its kind's plan, drawn in place of the legs */
  kindSheet?: KindSheetData;
  /** the garment's page in the app, for the QR code; absent on an unsaved plan */
  link?: string;
  /** default LETTER */
  pageSize?: PageSize;
  /** the language of the sheet's words (the shop's, or the calculator visitor's); default English */
  language?: Language;
  /** how the bottoms came in, from the garment's intake; absent on a calculator plan, which has no garment */
  existingFinish?: ExistingFinish;
}
