import type { CuffLineName, HemLineName } from '@/lib/allowance/types';

/** The chalk lines' names as the bench says them. */
export const LINE_NAMES: Record<CuffLineName | HemLineName, string> = {
  'finished-edge': 'Finished edge',
  'cuff-top': 'Cuff top',
  'inner-fold': 'Inner fold',
  cut: 'Cutting line',
};
