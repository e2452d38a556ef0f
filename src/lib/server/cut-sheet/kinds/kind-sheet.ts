// What a kind's sheet (a garment fitted once: a skirt, later sleeves) gives the page: its block's
// words and figures, its bench steps, and the chalk guide's strip. The page frame (header, steps,
// cautions, check ruler, 1:1 strip) is the trouser sheet's own, shared.
import type { ReactElement } from 'react';
import type { Translate } from '../../i18n/catalog';
import type { GuideGroup } from '../chalk-guide';
import type { KindSheetData } from '../../../shared/cut-sheet-types';
import type { Precision, Unit } from '@/lib/allowance/types';

/** A kind's sheet in words: the block the page draws, the steps, and the strip. */
export interface KindSheetContent {
  kind: KindSheetData['kind'];
  /** the kind's own content, read only by its Block */
  block: unknown;
  steps: string[];
  /** the 1:1 strip(s), laid with their top where `top` says */
  guide: GuideGroup[];
  /** the guide column's third note: where to lay the strip */
  lay: string;
  /** the header's note beside the unit: what the distances are measured from */
  kickerNote: string;
}

/** A kind's sheet: its words from the data, and the block that draws them. */
export interface KindSheet {
  content(data: KindSheetData, t: Translate, unit: Unit, precision: Precision): KindSheetContent;
  Block(props: { content: KindSheetContent; width: number; t: Translate }): ReactElement;
}
