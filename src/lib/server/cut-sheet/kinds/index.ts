// Each whole-garment kind's sheet, by kind: the one place a new kind's sheet is plugged in.
import type { KindSheetData, SkirtSheetData, SleeveSheetData } from '../../../shared/cut-sheet-types';
import type { KindSheet } from './kind-sheet';
import { SkirtBlock } from './SkirtBlock';
import { skirtSheetContent } from './skirt-sheet';
import { SleeveBlock } from './SleeveBlock';
import { sleeveSheetContent } from './sleeve-sheet';

/** The sheets by kind: words from the data (the dispatch gives each its own kind's data), and the block that draws them. */
export const KIND_SHEETS: Record<KindSheetData['kind'], KindSheet> = {
  skirt: { content: (data, t, unit, precision) => skirtSheetContent(data as SkirtSheetData, t, unit, precision), Block: SkirtBlock },
  sleeves: { content: (data, t, unit, precision) => sleeveSheetContent(data as SleeveSheetData, t, unit, precision), Block: SleeveBlock },
};
