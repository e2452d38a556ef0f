// Words every sheet shares, whatever the garment: the stitch lengths and the cautions. Kept apart
// from content.ts so a kind's sheet (kinds/) uses them without an import cycle.
import { translator, type Translate } from '../i18n/catalog';
import type { Unit } from '@/lib/allowance/types';

const EN = translator('en');

/**
 * The stitch lengths as a sheet in this unit prints them: per inch (with mm) on inch sheets, mm on
 * metric ones. Inch shops set stitches per inch: 25.4/4 ≈ 6, 25.4/2 ≈ 13, 8–10 per inch (TRADE.md).
 */
export function stitchLengths(unit: Unit, t: Translate = EN): { long: string; short: string; standard: string } {
  return { long: t('sheet.stitch.long', { unit }), short: t('sheet.stitch.short', { unit }), standard: t('sheet.stitch.standard', { unit }) };
}

/** The cautions, short for the sheet (lib/shared/bench-safety.ts has the screen's longer ones): iron and steam, blades, needles, then the shop's own practice. */
export function cautionsIn(t: Translate, heavySeams = false): string[] {
  return [t('safety.sheet.1'), t('safety.sheet.2'), t('safety.sheet.3'), ...(heavySeams ? [t('safety.sheet.heavySeams')] : []), t('safety.sheet.defer')];
}
