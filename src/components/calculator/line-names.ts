import type { CuffLineName, HemLineName } from '@/lib/allowance/types';

/** The chalk lines' names as the bench says them. */
export const LINE_NAMES: Record<CuffLineName | HemLineName, string> = {
  'finished-edge': 'Finished edge',
  'cuff-top': 'Cuff top',
  'inner-fold': 'Inner fold',
  cut: 'Cutting line',
};

/** What a taper change asks of the seam: let out (+), take in (−) or leave it. */
export function seamWork(changeMm: number): string {
  if (changeMm > 0) return 'let out';
  if (changeMm < 0) return 'take in';
  return 'leave';
}
