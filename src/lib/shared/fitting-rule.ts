// The shop's rule for a garment that would pass Chalk-marked with no fitting saved: the bench is
// warned (a confirm), or the move is refused (by the server). Plain data and pure checks, shared by
// the services, the islands and the schema (so no imports beyond the step list).
import { GARMENT_STEPS, type GarmentStep } from './garment-steps';

/** What happens when a garment with no fitting would pass Chalk-marked. */
export const FITTING_RULES = ['warn', 'refuse'] as const;
/** One of FITTING_RULES. */
export type FittingRule = (typeof FITTING_RULES)[number];
/** The rule a shop has until its lead chooses one. */
export const DEFAULT_FITTING_RULE: FittingRule = 'warn';

/** How the lead's settings page names each rule. */
export const FITTING_RULE_LABELS: Record<FittingRule, string> = {
  warn: 'Warn, and let the person go on after confirming',
  refuse: 'Refuse the move until a fitting is saved',
};

const MARKED = GARMENT_STEPS.indexOf('marked');

/** True when a move from `from` to `to` takes the garment past Chalk-marked (the first move that cuts cloth). */
export function passesMarked(from: GarmentStep, to: GarmentStep): boolean {
  return GARMENT_STEPS.indexOf(from) <= MARKED && GARMENT_STEPS.indexOf(to) > MARKED;
}

/** What the server answers when the shop's rule refuses the move (`what`: the garment, or how many). */
export function noFittingRefusal(what: string, step: string): string {
  return `No fitting to cut by is saved for ${what} (both legs, each with its plan), and the shop’s rule is to save the fitting before a garment is marked ${step}: save the fitting first.`;
}
