// Cut sheets built with the real engine, for the renderer's tests.
import { buildCutSheet, type LegOrder, type SheetHeader } from '@/lib/server/cut-sheet/build';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { isLanguage } from '@/lib/shared/i18n/languages';

// SHEET_LANGUAGE=fr runs the layout suites (no touching runs, 9 pt, strip reach, overflow) on French
// sheets; the suites that read English words are for English only.
const language = isLanguage(process.env.SHEET_LANGUAGE) ? { language: process.env.SHEET_LANGUAGE } : {};

/** A saved garment's header. */
export const SHOP: SheetHeader = {
  shop: 'Hartley & Sons Alterations',
  ticket: '1042',
  garment: 'Navy wool flannel trousers',
  due: '2025-03-14',
  assignee: 'Sam Ortiz',
  link: 'https://cuffwright.example/garments/1042',
  ...language,
};

/** An unsaved calculator plan's header. */
export const UNSAVED: SheetHeader = { shop: null, ticket: null, garment: null, due: null, assignee: null, ...language };

/** 1 1/2 in cuff with 5 in of cloth below the mark, both legs alike. */
export const cuffInch: LegOrder = { side: 'left', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: '1 1/2', available: 5 } };

/** 40 mm metric cuff with 150 mm of cloth. */
export const cuffMetric: LegOrder = { side: 'left', finish: 'cuff', input: { unit: 'mm', cuffDepth: 40, available: 150 } };

/** The fullest page: a tapered left leg, a right leg short of cloth with an old crease. */
export const busyLegs: LegOrder[] = [
  {
    side: 'left',
    finish: 'cuff',
    input: { unit: 'in', precision: 8, cuffDepth: 1.5, available: 5 },
    taper: { widthAtEdge: 7.5, widthAbove: 8.5, heightAbove: 6, seamAllowance: 1 },
  },
  { side: 'right', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: 1.75, available: 4.75, oldCrease: 2.5 } },
];

/** A sloped plain hem. */
export const hemSloped: LegOrder = { side: 'left', finish: 'hem', input: { unit: 'in', precision: 8, slope: 0.5, available: 3 } };

/** A saved garment's sheet from leg orders. */
export function sheet(legs: LegOrder[], over: Partial<SheetHeader> = {}): CutSheetData {
  return buildCutSheet({ ...SHOP, ...over }, legs);
}
