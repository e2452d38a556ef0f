// Which of a leg's warnings the summary bar shows when there is room for one: the one that would
// spoil the work soonest first. The cloth check is said by the bar itself, so it is never the one.
import type { PlanWarning, WarningCode } from '@/lib/allowance/types';

// Most serious first: work that cannot be done as planned, then a finish that will show a fault,
// then figures merely out of the usual.
const ORDER: WarningCode[] = [
  'let-out-exceeds-seam-allowance',
  'third-section-too-small',
  'stitching-above-cuff',
  'old-crease-visible',
  'taper-beyond-tolerance',
  'turn-under-too-large',
  'slope-on-cuff',
  'cuff-depth-unusual',
  'hem-allowance-unusual',
];

/** The warning to show first and how many others there are; a taper the engine refused outranks every warning. */
export function worstWarning(
  warnings: readonly PlanWarning[],
  taperProblem: string | null = null,
  say: { warning: (w: PlanWarning) => string; taper: (problem: string) => string } = { warning: (w) => w.message, taper: (p) => `Taper check: ${p}` },
): { message: string; others: number } | null {
  const rank = (w: PlanWarning) => {
    const i = ORDER.indexOf(w.code);
    return i === -1 ? ORDER.length : i;
  };
  const listed = warnings.filter((w) => w.code !== 'not-enough-cloth');
  // One message once: the cuff plan and its taper check can raise the same warning.
  const unique = [...new Map(listed.map((w) => [`${w.code}:${w.message}`, w])).values()].sort((x, y) => rank(x) - rank(y));
  const all = taperProblem ? [say.taper(taperProblem), ...unique.map(say.warning)] : unique.map(say.warning);
  return all.length ? { message: all[0]!, others: all.length - 1 } : null;
}
