// A skirt's or dress's sheet in words: the printed figures (printed-skirt.ts), the table of places
// round the hem, the engine's notes in the catalog's words, the bench steps and the 1:1 strip.
import type { MessageKey, Translate } from '../../i18n/catalog';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { Note } from '@/lib/allowance';
import type { SkirtSheetData } from '../../../shared/cut-sheet-types';
import { noteValues } from '../../../shared/i18n/kind-notes';
import type { KindSheetContent } from './kind-sheet';
import { printedSkirt, type PrintedSkirt } from './printed-skirt';

/** One row of the table of places round the hem, as printed. */
export interface SkirtPointRow {
  place: string;
  pin: string;
  newLine: string;
  cut: string;
  cloth: string;
  spare: string;
  short: boolean;
}

/** A skirt's block in words. */
export interface SkirtBlockWords {
  printed: PrintedSkirt;
  title: string;
  /** figure lines, each a whole sentence with its sum written out */
  figures: string[];
  /** the figure a tailor cuts by, set apart */
  keep: string;
  level: string | null;
  points: SkirtPointRow[];
  notes: string[];
}

// The fullness and the line below the pins are printed as figures that add up (to the sheet's
// step, rounded the safe way); the engine's notes saying them again to the nearest step would differ.
const PRINTED_AS_FIGURES = new Set(['ease-fullness', 'chalk-from-pins']);

const notesIn = (t: Translate, prefix: 'skirtNote' | 'levelNote', notes: readonly Note[]) =>
  notes.filter((n) => !PRINTED_AS_FIGURES.has(n.code)).map((n) => t(`${prefix}.${n.code}` as MessageKey, noteValues(t, n.values)));

/** The words and figures of a skirt's sheet, in the sheet's unit and language. */
export function skirtSheetContent(data: SkirtSheetData, t: Translate, unit: Unit, precision: Precision): KindSheetContent {
  const plan = data.plan;
  const f = plan.flared;
  const p = printedSkirt(plan, unit, precision);
  const figures: string[] = [
    t('skirtSheet.round', { round: p.hemRound.text, flare: t(`skirt.flareIs.${f.shape}`), degrees: Math.round(Math.abs(f.flareDegrees)) }),
  ];
  if (p.fullness && p.landing) {
    figures.push(t('skirtSheet.fullness', { depth: p.depth.text, fullness: p.fullness.text, round: p.hemRound.text, landing: p.landing.text }));
  }
  if (p.liesFlatTo) figures.push(t('skirtSheet.liesFlat', { depth: p.liesFlatTo.text }));
  figures.push(t(`skirt.finish.${f.finish}`, { depth: p.depth.text, asked: f.hemDepth.text }));
  const keep =
    p.turnUnder.mm > 0
      ? t('skirtSheet.keep', { depth: p.depth.text, turnUnder: p.turnUnder.text, keep: p.keep.text })
      : t('skirtSheet.keepRolled', { keep: p.keep.text });
  const level = p.level
    ? t('skirtSheet.level', { below: p.level.belowPins.text, shoes: p.level.shoeRise.mm === 0 ? 'same' : 'differ', rise: p.level.shoeRise.text })
    : null;
  const dash = '—';
  const points: SkirtPointRow[] = (p.level?.points ?? []).map((pt) => ({
    place: t(`skirt.place.${pt.at}`),
    pin: pt.pinAboveEdge.text,
    newLine: pt.newLineAboveEdge.text,
    cut: pt.cutAboveEdge.text,
    cloth: pt.cloth?.text ?? dash,
    spare: pt.spare?.text ?? dash,
    short: pt.spare !== null && pt.spare.mm < 0,
  }));
  const block: SkirtBlockWords = {
    printed: p,
    title: t('skirtSheet.title'),
    figures,
    keep,
    level,
    points,
    notes: [...notesIn(t, 'skirtNote', f.notes), ...notesIn(t, 'levelNote', plan.level?.notes ?? [])],
  };
  const steps = [
    t('skirtSheet.step.letDown'),
    p.level ? t('skirtSheet.step.chalkPoints') : t('skirtSheet.step.chalkPinned'),
    t('skirtSheet.step.cut', { keep: p.keep.text }),
    t(`skirtSheet.step.finish.${f.finish}`, { depth: p.depth.text, turnUnder: p.turnUnder.text }),
    t('skirtSheet.step.press'),
  ];
  const lines = [
    ...(p.turnUnder.mm > 0 ? [{ n: 1, name: t('skirtSheet.line.hemTop'), short: t('skirtSheet.line.hemTopShort'), cut: false, belowMark: p.depth }] : []),
    { n: p.turnUnder.mm > 0 ? 2 : 1, name: t('skirtSheet.line.cut'), short: t('skirtSheet.line.cutShort'), cut: true, belowMark: p.keep },
  ];
  return {
    kind: 'skirt',
    block,
    steps,
    guide: [{ label: t('skirtSheet.strip'), stripLabel: t('skirtSheet.strip'), slopeNote: null, lines, top: t('skirtSheet.guide.top') }],
    lay: t('skirtSheet.guide.lay'),
    kickerNote: t('skirtSheet.kickerNote', { unitNote: t('sheet.unitNote', { unit: t(`sheet.unit.${unit}`), unitKind: unit, precision }) }),
  };
}
