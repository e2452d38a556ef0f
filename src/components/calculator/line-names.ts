import type { CuffLineName, HemLineName } from '@/lib/allowance/types';
import type { Translate } from '@/lib/shared/i18n/format';

/** The chalk lines' names as the bench says them. */
export const LINE_NAMES: Record<CuffLineName | HemLineName, string> = {
  'finished-edge': 'Finished edge',
  'cuff-top': 'Cuff top',
  'inner-fold': 'Inner fold',
  cut: 'Cutting line',
};

/** A chalk line's name in the catalog's language. */
export function lineName(t: Translate, name: CuffLineName | HemLineName): string {
  return t(`line.${name}`);
}
