// Turns one leg's fitting measurements into requests for POST /api/plan: the cuff or plain hem,
// and the taper check when the leg widths are given. Shared by the garment page and its tests.
import type { HemTaperInput, Precision, Unit } from '@/lib/allowance/types';
import type { LegLength, LegValues } from './measurement-request';
import type { PlanRequestInput } from './plan-request';

function given(leg: LegValues, fields: readonly LegLength[]): Partial<Record<LegLength, string>> {
  const out: Partial<Record<LegLength, string>> = {};
  for (const f of fields) if (leg[f].trim() !== '') out[f] = leg[f].trim();
  return out;
}

/** How the garment came in, as far as a leg's plan cares. */
export interface LegPlanOptions {
  /** an old hem or cuff is let down first (letDownFirst): the width measured at the cutting line is used */
  letDown?: boolean;
}

// On a let-down pair the width measured at the cut replaces the taper followed down there; a cuff's
// old fold says where the taper stops holding. Saved values may predate the field (drafts too).
function letDownWidths(leg: LegValues, opts: LegPlanOptions, fields: readonly LegLength[]): Partial<Record<LegLength, string>> {
  if (!opts.letDown || !(leg.widthAtCut ?? '').trim()) return {};
  return given({ ...leg, widthAtCut: leg.widthAtCut ?? '' }, fields);
}

function scale(unit: Unit, precision: Precision) {
  return unit === 'in' ? { unit, precision } : { unit };
}

/** The main plan for a leg, or null while a cuff has no depth yet. */
export function legMainRequest(leg: LegValues, unit: Unit, precision: Precision = 8): PlanRequestInput | null {
  if (leg.finish === 'cuff') {
    if (leg.cuffDepth.trim() === '') return null;
    // A cuff is hemmed level: the front pin is recorded, never turned into a slope.
    return { kind: 'cuff', ...scale(unit, precision), cuffDepth: leg.cuffDepth.trim(), ...given(leg, ['hemSection', 'turnUnder', 'available', 'oldCrease']) };
  }
  const slope = leg.finish === 'slope' ? given(leg, ['slope']) : {};
  return { kind: 'hem', ...scale(unit, precision), ...given(leg, ['hemAllowance', 'turnUnder', 'available']), ...slope };
}

/** The taper check for a cuffed leg, or null until the depth and all three widths are given. */
export function legTaperRequest(leg: LegValues, unit: Unit, precision: Precision = 8, opts: LegPlanOptions = {}): PlanRequestInput | null {
  const needed: LegLength[] = ['cuffDepth', 'widthAtEdge', 'widthAbove', 'heightAbove'];
  if (leg.finish !== 'cuff' || needed.some((f) => leg[f].trim() === '')) return null;
  return {
    kind: 'taper',
    ...scale(unit, precision),
    cuffDepth: leg.cuffDepth.trim(),
    widthAtEdge: leg.widthAtEdge.trim(),
    widthAbove: leg.widthAbove.trim(),
    heightAbove: leg.heightAbove.trim(),
    ...given(leg, ['hemSection', 'seamAllowance']),
    ...letDownWidths(leg, opts, ['widthAtCut', 'oldCrease']),
  };
}

/** The note a leg's plan carries when a front pin was taken on a cuffed leg. */
export function frontPinNote(leg: LegValues): string | null {
  if (leg.frontPin.trim() === '') return null;
  return leg.finish === 'cuff' ? 'Front pin recorded; a cuff is hemmed level, so the cut follows the back pin all round.' : 'Front pin recorded.';
}

/** The taper check for a plain-hemmed leg (the hem turned up must lie flat too), or null until all three widths are given. */
export function legHemTaperRequest(leg: LegValues, unit: Unit, precision: Precision = 8, opts: LegPlanOptions = {}): HemTaperInput | null {
  const needed: LegLength[] = ['widthAtEdge', 'widthAbove', 'heightAbove'];
  if (leg.finish === 'cuff' || needed.some((f) => leg[f].trim() === '')) return null;
  return {
    ...scale(unit, precision),
    widthAtEdge: leg.widthAtEdge.trim(),
    widthAbove: leg.widthAbove.trim(),
    heightAbove: leg.heightAbove.trim(),
    ...given(leg, ['hemAllowance', 'seamAllowance']),
    ...letDownWidths(leg, opts, ['widthAtCut']),
  };
}
