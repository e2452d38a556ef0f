// Jacket or coat sleeves on the cut sheet, in words and figures: the block's chalk lines from the
// present edge, the sums, the buttons, vent and lining, the engine's notes in the catalog's words, the
// bench steps and the 1:1 strip. Every figure comes from printed-sleeve.ts (whole steps, so the sums
// hold as printed); the page frame (header, cautions, check ruler, strip) is the sheet's own.
import type { SleeveNoteCode, SleevePlan } from '@/lib/allowance/kind-types';
import type { Len, Precision, Unit } from '@/lib/allowance/types';
import type { SleeveSheetData } from '../../../shared/cut-sheet-types';
import type { Translate } from '../../i18n/catalog';
import { stitchLengths } from '../sheet-words';
import type { KindSheetContent } from './kind-sheet';
import { printedSleeve, type PrintedSleeve } from './printed-sleeve';

/** A line of the sleeve's chalk table: where it is from the present edge. */
export interface SleeveSheetLine {
  n: number;
  name: string;
  cut: boolean;
  fromEdge: string;
}

/** A sleeve's block in words and figures (the page draws it with SleeveBlock). */
export interface SleeveBlockWords {
  label: string;
  heading: string;
  printed: PrintedSleeve;
  /** the chalk lines from the highest, numbered as on the strip (0: the line it is laid on); the buttons are in their own table */
  lines: SleeveSheetLine[];
  /** the chalk table's column heading: from the present edge, or (from the shoulder) the present seam line */
  fromHeading: string;
  sum: string;
  buttons: {
    heading: string;
    sum: string;
    rows: { n: number; line: number | null; name: string; now: string; move: string; newCentre: string; after: string }[];
  } | null;
  vent: string[];
  lining: string;
  /** the engine's checks in the catalog's words, with the printed figures (its advice is among the steps) */
  notes: string[];
}

const unsigned = (len: Len) => len.text.replace(/^[-−]\s*/, '');

function fromEdge(t: Translate, len: Len): string {
  if (len.mm === 0) return t('sleeve.onEdge');
  return len.mm > 0 ? t('sheet.above', { length: len.text }) : t('sheet.below', { length: unsigned(len) });
}

// The engine's notes said with the printed figures (the engine rounds its own; the sheet's must add up).
function noteText(t: Translate, code: SleeveNoteCode, pp: PrintedSleeve): string {
  const s = pp.shortenBy.text;
  switch (code) {
    case 'move-buttons':
      return t('sleeveNote.move-buttons', { buttons: pp.buttons.length, moveUp: s });
    case 'restitch-buttonholes':
      return t('sleeveNote.restitch-buttonholes', { moveUp: pp.buttonholesMoveUp.text });
    case 'buttonholes-closer-to-edge':
      return t('sleeveNote.buttonholes-closer-to-edge', { by: s });
    case 'vent-too-short-for-buttons': {
      const v = pp.vent!;
      return t('sleeveNote.vent-too-short-for-buttons', {
        shortBy: v.shortBy?.text ?? '',
        buttonsThatFit: v.buttonsThatFit,
        spacing: v.spacingThatFits?.text ?? 'none',
      });
    }
    default:
      return t(`sleeveNote.${code}`, { shortenBy: s });
  }
}

// The notes that change or stop the usual work are checks beside the figures; the rest say how the
// work is done, so they stand among the bench steps, in their place.
const STEPS: ReadonlySet<SleeveNoteCode> = new Set(['remake-vent-corners', 'move-buttons', 'restitch-buttonholes']);

// Whether the buttons fit the shortened vent follows the printed figures (rounding can decide it), the rest the engine.
function notesOf(plan: SleevePlan, pp: PrintedSleeve): SleeveNoteCode[] {
  const codes: SleeveNoteCode[] = plan.notes.map((n) => n.code).filter((c) => c !== 'vent-too-short-for-buttons');
  if (pp.vent && !pp.vent.fits) codes.push('vent-too-short-for-buttons');
  return codes;
}

function stepsOf(t: Translate, unit: Unit, pp: PrintedSleeve, codes: SleeveNoteCode[], lining: string): string[] {
  if (pp.method === 'shoulder') {
    return [
      t('sleeve.shoulder.1'),
      t('sleeve.shoulder.2', { shortenBy: pp.shortenBy.text }),
      t('sleeve.shoulder.3', { lining }),
      t('sleeve.shoulder.4'),
      t('sheet.press'),
    ];
  }
  const stitch = stitchLengths(unit, t).standard;
  const note = (code: SleeveNoteCode) => (codes.includes(code) ? [noteText(t, code, pp)] : []);
  return [
    t('sleeve.cuff.1'),
    t('sleeve.cuff.2', { newEdge: pp.shortenBy.text, hemDepth: pp.hemDepth.text }),
    ...note('remake-vent-corners'),
    t('sleeve.cuff.4', { stitch }),
    ...note('move-buttons'),
    ...note('restitch-buttonholes'),
    ...(pp.buttons.length > 0 && !codes.includes('move-buttons') ? [t('sleeve.cuff.buttons')] : []),
    t('sleeve.cuff.lining', { lining, fold: pp.lining.fold.text, pleat: pp.lining.pleat.text }),
    t('sheet.press'),
  ];
}

function liningText(t: Translate, pp: PrintedSleeve): string {
  const l = pp.lining;
  const values = {
    same: l.foldChange.mm === 0 && l.pleatChange.mm === 0 ? 'yes' : 'no',
    way: l.shortenBy.mm >= 0 ? 'shorten' : 'down',
    liningAbs: unsigned(l.shortenBy),
    lining: l.shortenBy.text,
    shortenBy: pp.shortenBy.text,
    fold: l.fold.text,
    foldNow: l.foldNow.text,
    pleat: l.pleat.text,
    pleatNow: l.pleatNow.text,
  };
  return t(pp.method === 'cuff' ? 'sleeve.lining' : 'sleeve.liningAtHead', values);
}

function ventText(t: Translate, pp: PrintedSleeve): string[] {
  const v = pp.vent;
  if (!v) return pp.method === 'cuff' && pp.buttons.length > 0 ? [t('sleeve.vent.unmeasured')] : [];
  const out = [t('sleeve.vent', { method: pp.method, before: v.before.text, shortenBy: pp.shortenBy.text, after: v.after.text })];
  if (v.topButton)
    out.push(
      t('sleeve.vent.room', {
        fits: v.fits ? 'yes' : 'no',
        after: v.after.text,
        top: v.topButton.text,
        margin: v.margin.text,
        room: v.room.text,
      }),
    );
  return out;
}

/** The words and figures of a sleeve's sheet, in the sheet's unit and language (the plan was made in that unit by the adapter). */
export function sleeveSheetContent(data: SleeveSheetData, t: Translate, unit: Unit, precision: Precision): KindSheetContent {
  const { input, plan } = data.plan;
  const pp = printedSleeve(plan, input);
  const cuff = pp.method === 'cuff';
  // The strip's lines, in its order and with its numbers: where each is from the present edge (or seam line).
  const lines: SleeveSheetLine[] = pp.strip
    .filter((l) => l.name !== 'button')
    .map((l) => ({
      n: l.n,
      name: t(`sleeve.line.${l.name as Exclude<typeof l.name, 'button'>}`),
      cut: l.cut,
      fromEdge: l.n === 0 ? '0' : cuff ? fromEdge(t, l.fromPresent) : t('sheet.below', { length: l.fromPresent.text }),
    }));
  const cutAt = pp.cut?.abovePresentEdge;
  const sum = cutAt
    ? t('sleeve.cutSum', {
        where: cutAt.mm > 0 ? 'above' : cutAt.mm < 0 ? 'below' : 'on',
        newEdge: pp.shortenBy.text,
        hemDepth: pp.hemDepth.text,
        cut: unsigned(cutAt),
      })
    : t('sleeve.shoulderSum', { shortenBy: pp.shortenBy.text });
  const buttons =
    cuff && pp.buttons.length > 0 && pp.spacing
      ? {
          heading: t('sleeve.buttons.heading', { count: pp.buttons.length, spacing: pp.spacing.text }),
          sum: t('sleeve.buttons.sum', { shortenBy: pp.shortenBy.text }),
          rows: pp.buttons.map((b) => ({
            n: b.n,
            line: b.line,
            name: t('sleeve.buttons.name', { n: b.n }),
            now: b.now.text,
            move: b.moveUp.text,
            newCentre: b.newCentre.text,
            after: b.aboveNewEdge.text,
          })),
        }
      : null;
  const top = pp.strip[0]!;
  const codes = notesOf(plan, pp);
  const block: SleeveBlockWords = {
    label: t('sleeve.label'),
    heading: t('sleeve.title', { method: pp.method, shortenBy: pp.shortenBy.text, hemDepth: pp.hemDepth.text }),
    printed: pp,
    lines,
    fromHeading: t('sleeve.col.fromEdge', { method: pp.method }),
    sum,
    buttons,
    vent: ventText(t, pp),
    lining: liningText(t, pp),
    notes: codes.filter((c) => !STEPS.has(c)).map((code) => noteText(t, code, pp)),
  };
  return {
    kind: 'sleeves',
    block,
    steps: stepsOf(t, unit, pp, codes, unsigned(pp.lining.shortenBy)),
    guide: [
      {
        label: t('sleeve.label'),
        stripLabel: t('sleeve.label'),
        slopeNote: null,
        top: t('sleeve.guide.top', { at: top.name === 'button' ? 'button' : top.name === 'new-edge' ? 'new_edge' : 'seam' }),
        lines: pp.strip.map((l) => ({
          n: l.n,
          name: l.name === 'button' ? t('sleeve.line.button', { n: l.button! }) : t(`sleeve.line.${l.name}`),
          short: l.name === 'button' ? t('sleeve.short.button', { n: l.button! }) : t(`sleeve.short.${l.name}`),
          cut: l.cut,
          belowMark: l.belowTop,
        })),
      },
    ],
    lay: t('sleeve.guide.lay', { method: pp.method }),
    kickerNote: t('sleeve.kickerNote', { unitNote: t('sheet.unitNote', { unit: t(`sheet.unit.${unit}`), unitKind: unit, precision }) }),
  };
}
