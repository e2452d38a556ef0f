// Each whole-garment kind's sheet, by kind: the one place a new kind's sheet is plugged in.
import type { KindSheetData } from '../../../shared/cut-sheet-types';
import type { KindSheet } from './kind-sheet';
import { SkirtBlock } from './SkirtBlock';
import { skirtSheetContent } from './skirt-sheet';

/** The sheets by kind: words from the data, and the block that draws them. */
export const KIND_SHEETS: Record<KindSheetData['kind'], KindSheet> = {
  skirt: { content: (data, t, unit, precision) => skirtSheetContent(data, t, unit, precision), Block: SkirtBlock },
};
