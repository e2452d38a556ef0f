// Engine inputs → a cut sheet's data. The public calculator and a saved garment both come through
// here. Relative imports keep it runnable by plain vite-node in benchmarks/ (no @ alias there).
import {
  AllowanceError,
  checkHemTaper,
  checkTaper,
  isAllowanceError,
  planCuff,
  planHem,
  planOriginalHem,
  validateCuffInput,
  validateHemInput,
  validateOriginalHemInput,
  validateHemTaperInput,
  validateTaperInput,
} from '../../allowance/index';
import type { CuffInput, HemInput, HemTaperInput, TaperInput } from '../../allowance/types';
import type { OriginalHemInput } from '../../allowance/kind-types';
import type { CutSheetData, LegSheet, RecordedLength, ShrinkNote, Side, WaistNote } from '../../shared/cut-sheet-types';

/** Leg widths for a taper check (the hem taper check's width fields); the cuff's own depth, sections and unit are taken from the cuff. */
export type TaperWidths = Pick<HemTaperInput, 'widthAtEdge' | 'widthAbove' | 'heightAbove' | 'seamAllowance' | 'tolerance' | 'widthAtCut'>;

/** What one leg should become: a cuff (maybe on a tapered leg) or a plain hem. */
export type LegOrder =
  | { side: Side; finish: 'cuff'; input: CuffInput; taper?: TaperWidths; finished?: string; recorded?: RecordedLength[]; waist?: WaistNote }
  | { side: Side; finish: 'hem'; input: HemInput; taper?: TaperWidths; finished?: string; recorded?: RecordedLength[]; waist?: WaistNote; shrink?: ShrinkNote }
  | { side: Side; finish: 'original'; input: OriginalHemInput; taper?: undefined; finished?: string; recorded?: RecordedLength[]; waist?: WaistNote };

// A plain hem's taper check takes the hem's own unit, precision, allowance and edge (lowered for unwashed cloth).
function hemTaperInput(hem: HemInput, widths: TaperWidths) {
  const { unit, precision, hemAllowance, edgeBelowMark } = hem;
  return { unit, precision, hemAllowance, ...widths, ...(edgeBelowMark === undefined ? {} : { edgeBelowMark }) };
}

/** A cuff's taper check input: the cuff's depth, sections and unit with the leg's widths (spelled
 * out rather than spread: a tapered leg is planned for every sheet, and a spread cost a tenth of it). */
export function taperInput(cuff: CuffInput, widths: TaperWidths): TaperInput {
  const input: TaperInput = {
    unit: cuff.unit,
    precision: cuff.precision,
    cuffDepth: cuff.cuffDepth,
    hemSection: cuff.hemSection,
    clothThickness: cuff.clothThickness,
    widthAtEdge: widths.widthAtEdge,
    widthAbove: widths.widthAbove,
    heightAbove: widths.heightAbove,
    seamAllowance: widths.seamAllowance,
    tolerance: widths.tolerance,
  };
  // Measured at the cut, the old fold says where the taper stops holding.
  if (widths.widthAtCut !== undefined) {
    input.widthAtCut = widths.widthAtCut;
    input.oldCrease = cuff.oldCrease;
  }
  return input;
}

/** Every length the engine would refuse, keyed by field path as the request spells it ("right.taper.widthAbove"). */
export function refusedFields(legs: LegOrder[]): Record<string, string> {
  const fields: Record<string, string> = {};
  const add = (prefix: string, errors: { field?: string; message: string }[]) => {
    for (const e of errors) {
      const key = prefix + (e.field ?? '');
      if (!(key in fields)) fields[key] = e.message;
    }
  };
  for (const leg of legs) {
    const prefix = leg.side === 'right' ? 'right.' : '';
    if (leg.finish === 'original') {
      add(prefix, validateOriginalHemInput(leg.input));
      continue;
    }
    if (leg.finish === 'hem') {
      add(prefix, validateHemInput(leg.input));
      if (leg.taper) add(`${prefix}taper.`, validateHemTaperInput(hemTaperInput(leg.input, leg.taper)));
      continue;
    }
    add(prefix, validateCuffInput(leg.input));
    if (leg.taper) add(`${prefix}taper.`, validateTaperInput(taperInput(leg.input, leg.taper)));
  }
  return fields;
}

/** Plans one leg with the engine (throws the engine's AllowanceError on input it refuses). */
export function planLeg(order: LegOrder): LegSheet {
  if (order.finish === 'original') {
    const leg: LegSheet = { side: order.side, finish: 'original', input: order.input, plan: planOriginalHem(order.input) };
    const text = order.finished?.trim();
    if (text) leg.finished = text;
    if (order.recorded?.length) leg.recorded = order.recorded;
    if (order.waist) leg.waist = order.waist;
    return leg;
  }
  if (order.finish === 'hem') {
    const finished = order.finished?.trim() ? { finished: order.finished.trim() } : {};
    const hem: LegSheet = { side: order.side, finish: 'hem', input: order.input, plan: planHem(order.input), ...finished };
    if (order.recorded?.length) hem.recorded = order.recorded;
    if (order.waist) hem.waist = order.waist;
    if (order.shrink) hem.shrink = order.shrink;
    if (order.taper) {
      const input = hemTaperInput(order.input, order.taper);
      hem.taper = { input, plan: checkHemTaper(input) };
    }
    return hem;
  }
  const plan = planCuff(order.input);
  const leg: LegSheet = { side: order.side, finish: 'cuff', input: order.input, plan };
  const text = order.finished?.trim();
  if (text) leg.finished = text;
  if (order.recorded?.length) leg.recorded = order.recorded;
  if (order.waist) leg.waist = order.waist;
  if (order.taper) {
    const input = taperInput(order.input, order.taper);
    leg.taper = { input, plan: checkTaper(input) };
  }
  return leg;
}

/** Everything on a sheet but the legs: who, what, when, and where the QR code points. */
export type SheetHeader = Omit<CutSheetData, 'legs' | 'unit' | 'precision'>;

// The engine names the field it refused within one leg's input; the request spells it with the leg
// ("right.taper.widthAbove", as refusedFields does).
function planOrRefuse(order: LegOrder): LegSheet {
  try {
    return planLeg(order);
  } catch (e) {
    if (!isAllowanceError(e) || e.field === undefined) throw e;
    const part = order.finish === 'cuff' && order.taper && validateCuffInput(order.input).length === 0 ? 'taper.' : '';
    throw new AllowanceError(e.code, e.message, `${order.side === 'right' ? 'right.' : ''}${part}${e.field}`);
  }
}

/** Plans the legs and assembles the sheet; the first leg's unit and precision are the sheet's (throws AllowanceError, field as the request spells it, when the engine refuses a leg). */
export function buildCutSheet(header: SheetHeader, legs: LegOrder[]): CutSheetData {
  const planned = legs.map(planOrRefuse);
  const first = planned[0];
  if (!first) throw new Error('A cut sheet needs at least one leg.');
  return { ...header, unit: first.plan.unit, precision: first.plan.precision, legs: planned };
}
