// What the bottoms of the trousers are like when they come in, noted at intake: it decides whether
// the price list's "cuff let down and re-made" applies. Plain data: the schema, services and islands read it.

/** The finishes a pair can arrive with. */
export const EXISTING_FINISHES = ['plain-hem', 'cuff', 'unfinished'] as const;
/** How a pair arrived. */
export type ExistingFinish = (typeof EXISTING_FINISHES)[number];

/** Most pairs brought in to be shortened are ready-made with a plain hem: the intake's default. */
export const DEFAULT_EXISTING_FINISH: ExistingFinish = 'plain-hem';

/** Each finish on screen. */
export const EXISTING_FINISH_LABELS: Record<ExistingFinish, string> = {
  'plain-hem': 'Plain hem',
  cuff: 'Cuff',
  unfinished: 'Unfinished (new trousers)',
};

/**
 * Whether an old hem or cuff is let down before the new finish is made (every pair but new,
 * unfinished ones). Its old allowance often flares below the old fold, so the bench asks for the
 * width measured at the cutting line there instead of following the taper down.
 */
export function letDownFirst(finish: ExistingFinish): boolean {
  return finish !== 'unfinished';
}
