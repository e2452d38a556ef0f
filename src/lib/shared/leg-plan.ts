// Turns one leg's fitting measurements into requests for POST /api/plan: the cuff or plain hem,
// and the taper check when the leg widths are given. Which lengths go where is the registry's
// (fitting/plan-lengths.ts); this adds the kind and the scale. Shared by the garment page and its tests.
import type { HemTaperInput, Precision, Unit } from '@/lib/allowance/types';
import type { OriginalHemInput } from '@/lib/allowance/kind-types';
import { originalHemLengths, planLengths, planScale, plansOf } from './fitting/plan-lengths';
import type { LegValues } from './measurement-request';
import type { PlanRequestInput } from './plan-request';
import { withShrink } from './fitting/shrink-note';

/** How the garment came in, as far as a leg's plan cares. */
export interface LegPlanOptions {
  /** an old hem or cuff is let down first (letDownFirst): the width measured at the cutting line is used */
  letDown?: boolean;
  /** the precision the hem plan's lines are shown in, when the taper check is asked finer: unwashed cloth's edge and hem are those lines */
  planPrecision?: Precision;
}

/** The main plan for a leg, or null while a cuff has no depth yet (a cuff is hemmed level: the front pin is recorded, never turned into a slope; unwashed cloth lowers a hem's lines). */
export function legMainRequest(leg: LegValues, unit: Unit, precision: Precision = 8): PlanRequestInput | null {
  if (leg.finish === 'original') return null;
  const kind = plansOf(leg.finish).main as 'cuff' | 'hem';
  const lengths = planLengths(kind, leg.finish, leg);
  if (!lengths) return null;
  const planned = kind === 'hem' ? withShrink(lengths, leg, leg.finish, unit, precision) : lengths;
  return { kind, ...planScale(unit, precision), ...planned } as PlanRequestInput;
}

/** The taper check for a cuffed leg, or null until the depth and all three widths are given. */
export function legTaperRequest(leg: LegValues, unit: Unit, precision: Precision = 8, opts: LegPlanOptions = {}): PlanRequestInput | null {
  if (leg.finish !== 'cuff') return null;
  const lengths = planLengths('taper', leg.finish, leg, opts.letDown);
  return lengths && ({ kind: 'taper', ...planScale(unit, precision), ...lengths } as PlanRequestInput);
}

/** The note a leg's plan carries when a front pin was taken on a cuffed leg. */
export function frontPinNote(leg: LegValues): string | null {
  if (leg.frontPin.trim() === '') return null;
  return leg.finish === 'cuff' ? 'Front pin recorded; a cuff is hemmed level, so the cut follows the back pin all round.' : 'Front pin recorded.';
}

/** The taper check for a plain-hemmed leg (the hem turned up must lie flat on the leg too), or null until all three widths are given. */
export function legHemTaperRequest(leg: LegValues, unit: Unit, precision: Precision = 8, opts: LegPlanOptions = {}): HemTaperInput | null {
  if (leg.finish === 'cuff' || leg.finish === 'original') return null;
  const lengths = planLengths('hemTaper', leg.finish, leg, opts.letDown);
  // At the hem plan's own edge and allowance (unwashed cloth), in the plan's precision.
  return lengths && ({ ...planScale(unit, precision), ...withShrink(lengths, leg, leg.finish, unit, opts.planPrecision ?? precision) } as HemTaperInput);
}

/** Jeans kept on their factory hem: planOriginalHem's input (its taper check inside), or null on another finish or while the shortening or hem depth is blank. */
export function legOriginalHemInput(leg: LegValues, unit: Unit, precision: Precision = 8): OriginalHemInput | null {
  if (leg.finish !== 'original') return null;
  const lengths = originalHemLengths(leg);
  return lengths && ({ ...planScale(unit, precision), ...lengths } as unknown as OriginalHemInput);
}
