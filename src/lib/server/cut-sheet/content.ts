// The words and figures of a cut sheet, worked out once from the data. The PDF lays them out;
// keeping them here lets the tests and any other rendering read the same sheet. Every word comes
// from the message catalog (src/lib/server/i18n) in the sheet's language; figures come in already written.
import type { CreaseLanding, CuffLineName, Len, PlanWarning, TaperLine, TaperPlan, Unit, WarningCode } from '@/lib/allowance/types';
import type { ExistingFinish } from '@/lib/shared/existing-finish';
import { translator, type MessageKey, type Translate } from '../i18n/catalog';
import { creaseText, warningText } from '../../shared/i18n/engine-messages';
import { DEFAULT_LANGUAGE, intlLocale, type Language } from '../../shared/i18n/languages';
import { checkRuler, type GuideGroup } from './chalk-guide';
import { cautionsIn, stitchLengths } from './sheet-words';
import { KIND_SHEETS } from './kinds';
import type { KindSheetContent } from './kinds/kind-sheet';

export { stitchLengths };
import { finishedLine, recordedText } from './finished-length';
import { printedPlan, type PrintedPlan, type PrintedSeamWork } from './printed';
import { printedOriginal, type PrintedOriginal } from './printed-original';
import type { CutSheetData, LegSheet, OriginalHemLeg, ShrinkNote } from '../../shared/cut-sheet-types';
import type { OriginalHemNoteCode } from '@/lib/allowance/kind-types';

/** One chalk line as printed: number, name, distances. */
export interface SheetLine {
  n: number;
  name: string;
  /** the name on the chalk guide's strip */
  short: string;
  cut: boolean;
  belowMark: Len;
  aboveRawEdge: Len | null;
}

/** One row of the taper table. */
export interface SheetTaperRow {
  n: number;
  name: string;
  width: string;
  work: string;
}

/** A block of the sheet for one leg, or for both when they are alike. */
export interface SheetLegGroup {
  label: string;
  /** the chalk guide strip's heading ("Left", "Both legs, at the back") */
  stripLabel: string;
  finish: 'cuff' | 'hem' | 'original';
  title: string;
  /** turn of cloth and third section, when the title's depth alone does not add up to the lines */
  sections: string | null;
  lines: SheetLine[];
  cloth: { ok: boolean | null; text: string; options: string[] };
  slopeNote: string | null;
  /** summary, then the seam work line by line in one sentence (null when none is needed) */
  taper: { summary: string; work: string | null; rows: SheetTaperRow[] } | null;
  crease: string | null;
  /** what the fitting recorded for the bench beyond the plan ("Recorded at the fitting: ..."), or null */
  recorded: string | null;
  /** the pending waist change and where it moves the pin mark, or null */
  waist: string | null;
  /** unwashed cloth: the shrink lines (the cloth and source, edge, cut, the wash caution), or null */
  shrink: string[] | null;
  warnings: string[];
  leg: LegSheet;
  /** every figure the block prints, in whole display steps (a cuff's or plain hem's; null on a kept factory hem) */
  printed: PrintedPlan | null;
  /** a kept factory hem's figures and sentences (its lines are in `lines`, above the pin mark negative) */
  original: { printed: PrintedOriginal; sum: string; taper: string; strip: GuideGroup['lines'] } | null;
}

/** The whole sheet in words. */
export interface SheetContent {
  unsaved: boolean;
  title: string;
  meta: string[];
  unitNote: string;
  groups: SheetLegGroup[];
  /** a garment fitted once (a skirt): its kind's block, steps and strip, in place of the legs (groups empty) */
  kind: KindSheetContent | null;
  steps: { heading: string | null; items: string[] }[];
  cautions: string[];
  guideNote: string[];
  /** the sheet's fixed words (headings, captions) in its language */
  t: Translate;
  language: Language;
}

// English, for the exports other modules and tests compare against.
const EN = translator('en');

/** Header shown instead of shop and ticket when the plan was never saved. */
export const UNSAVED_TITLE = EN('sheet.unsavedTitle');

/** Stitch lengths printed on the sheet, in mm (TRADE.md, common practice). */
export const STITCH = stitchLengths('mm');

/** The cautions every sheet carries (TRADE.md, "Cautions to show"), in English. */
export const CAUTIONS = cautionsIn(EN);

/** The first bench step on a pair that came in with cuffs: old folds left in would throw the chalk lines out. */
export const LET_DOWN_OLD_CUFF = EN('sheet.letDownOldCuff');

/** The heading of the let-down step when each leg has its own steps after it. */
export const LET_DOWN_HEADING = EN('sheet.letDownHeading');

/** Drops a leading minus sign: the sheet says "take in" rather than "-1/8 in". */
function unsigned(len: Len): string {
  return len.text.replace(/^[-−]\s*/, '');
}

function belowOrAbove(t: Translate, len: Len): string {
  return len.mm < 0 ? t('sheet.above', { length: unsigned(len) }) : t('sheet.below', { length: len.text });
}

// toLocaleDateString builds a new formatter on every call (about 1 % of a sheet): one per language.
const DUE_FORMATS = new Map<Language, Intl.DateTimeFormat>();

function formatDue(iso: string, language: Language): string {
  const d = new Date(`${iso}T12:00:00Z`);
  if (Number.isNaN(d.getTime())) return iso;
  let f = DUE_FORMATS.get(language);
  if (!f)
    DUE_FORMATS.set(
      language,
      (f = new Intl.DateTimeFormat(intlLocale(language), { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' })),
    );
  return f.format(d);
}

function sameWork(a: LegSheet, b: LegSheet): boolean {
  const key = (l: LegSheet) =>
    JSON.stringify([l.finish, l.plan, l.taper?.plan ?? null, creaseOf(l), l.recorded ?? null, l.waist ?? null, l.finish === 'hem' ? (l.shrink ?? null) : null]);
  return key(a) === key(b);
}

function creaseOf(leg: LegSheet): CreaseLanding | undefined {
  return leg.crease ?? (leg.finish === 'cuff' ? leg.plan.creaseLands : undefined);
}

// The engine advises pressing a showing crease out "before finishing"; on a pair that came with
// cuffs the let-down step has already pressed it, before any chalk, so the note says that instead
// (the old fold was a cuff's, not a hem's): the catalog has those verdicts whole, by place.
const LET_DOWN_PLACES: ReadonlySet<CreaseLanding['place']> = new Set(['leg-visible', 'at-cuff-top', 'cuff-face']);
// Verdicts that start "The old hem crease" get the sheet's "Old crease:" before them.
const HEM_CREASE_PLACES: ReadonlySet<CreaseLanding['place']> = new Set(['leg-visible', 'at-cuff-top']);

function creaseNote(t: Translate, crease: CreaseLanding | undefined, existing: ExistingFinish | undefined): string | null {
  if (!crease) return null;
  if (existing === 'cuff' && LET_DOWN_PLACES.has(crease.place)) return t(`sheet.letDownCrease.${crease.place}` as MessageKey, crease.values);
  const text = creaseText(t, crease);
  return HEM_CREASE_PLACES.has(crease.place) ? t('sheet.oldCrease', { text }) : text;
}

function clothCheck(t: Translate, pp: PrintedPlan): SheetLegGroup['cloth'] {
  const c = pp.cloth;
  if (c.enough === null || c.has === null) {
    return { ok: null, text: t('sheet.cloth.unmeasured', { needs: c.needs.text }), options: [] };
  }
  if (c.enough) {
    return { ok: true, text: t('sheet.cloth.ok', { needs: c.needs.text, has: c.has.text, spare: c.spare!.text }), options: [] };
  }
  const options: string[] = [];
  const alt = pp.alternatives;
  if (alt) {
    if (alt.shorterSection) options.push(t('sheet.alt.shorter', { length: alt.shorterSection.text }));
    if (alt.deepestCuff) options.push(t('sheet.alt.deepest', { length: alt.deepestCuff.text }));
    options.push(t('sheet.alt.plain', { length: alt.plainHem.required.text, fits: alt.plainHem.fits ? 'yes' : 'no' }));
    options.push(t('sheet.alt.faced', { length: alt.facedCuff.required.text, fits: alt.facedCuff.fits ? 'yes' : 'no' }));
  }
  return { ok: false, text: t('sheet.cloth.short', { needs: c.needs.text, has: c.has.text, shortBy: c.shortBy!.text }), options };
}

// On a let-down pair the width at the cut was measured there, not followed down from the taper: say so.
function measuredNote(t: Translate, tp: TaperPlan): string {
  const cut = tp.lines[tp.lines.length - 1];
  return cut?.measured ? t('sheet.measuredNote', { width: cut.width.text }) : '';
}

function rowWidth(t: Translate, l: TaperLine): string {
  return l.measured ? t('sheet.measuredWidth', { width: l.width.text }) : l.width.text;
}

function lineName(t: Translate, name: CuffLineName): string {
  return t(`line.${name}`);
}

function taperOf(t: Translate, leg: LegSheet, pp: PrintedPlan): SheetLegGroup['taper'] {
  if (!leg.taper) return null;
  if (leg.finish === 'hem') return hemTaperOf(t, leg);
  if (!pp.taper) return null;
  const tp = leg.taper.plan;
  const work = (l: PrintedSeamWork) => t('sheet.work', { way: l.sign > 0 ? 'out' : 'in', perSeam: l.perSeam.text, perSide: l.perSide.text });
  const rows = tp.lines.map((l, k) => {
    const printed = pp.taper!.lines[k]!;
    return { n: l.n, name: lineName(t, l.name), width: rowWidth(t, l), work: !pp.taper!.work || printed.sign === 0 ? t('sheet.asItIs') : work(printed) };
  });
  const target = pp.taper.target.text;
  // Named by its height above the finished edge: the chalked "Cuff top" line is one depth below the mark.
  const above = pp.depth.text;
  // No line with work to print (within tolerance, or under half a step everywhere): nothing to let out.
  const measured = measuredNote(t, tp);
  if (!pp.taper.work) return { summary: t('sheet.taper.within', { target, above, measured }), work: null, rows };
  const moving = pp.taper.lines.filter((l) => l.sign !== 0);
  const moves = moving.map((l) => t('sheet.taper.move', { way: l.sign > 0 ? 'out' : 'in', perSeam: l.perSeam.text, n: l.n }));
  // Each side's share in the same order, its unit said once at the end: "1/8, 1/4 in each side".
  const sides = moving.map((l, i) => (i === moving.length - 1 ? l.perSide.text : l.perSide.text.replace(/ (in|cm|mm)$/, '')));
  const list = t('sheet.list');
  return {
    summary: t('sheet.taper.summary', { above, target, measured }),
    work: t('sheet.taper.work', { moves: moves.join(list), sides: sides.join(list) }),
    rows,
  };
}

// Under half a step the engine's figure prints as 0: never "let out 0 in" on a line.
function printsZero(len: Len): boolean {
  return /^0(\s|$)/.test(unsigned(len));
}

// A plain hem on a tapered leg: turned up, the hem must match the leg it lands on.
function hemTaperOf(t: Translate, leg: LegSheet & { finish: 'hem' }): SheetLegGroup['taper'] {
  const tp = leg.taper!.plan;
  const rows = tp.lines.map((l) => ({
    n: l.n,
    name: lineName(t, l.name),
    width: rowWidth(t, l),
    work:
      l.change.mm === 0 || printsZero(l.perSeam)
        ? t('sheet.asItIs')
        : t('sheet.work', { way: l.change.mm > 0 ? 'out' : 'in', perSeam: unsigned(l.perSeam), perSide: unsigned(l.perSide) }),
  }));
  const above = leg.plan.hemAllowance.text;
  const cut = tp.lines[tp.lines.length - 1]!;
  const flat = tp.withinTolerance || cut.change.mm === 0 || printsZero(cut.perSeam);
  // A let-down hem may have flared past the leg it lands on: then the seams come in, not out.
  const way = cut.change.mm > 0 ? 'out' : 'in';
  const summary = (flat ? t('sheet.hemTaper.within') : t('sheet.hemTaper.summary', { above, target: tp.targetWidth.text, way })) + measuredNote(t, tp);
  const work = flat ? null : t('sheet.hemTaper.work', { way, perSeam: unsigned(cut.perSeam) });
  return { summary, work, rows };
}

function slopeNote(t: Translate, leg: LegSheet, pp: PrintedPlan): string | null {
  if (leg.finish !== 'hem' || !pp.slope || pp.slope.mm === 0) return null;
  const [edge, cut] = pp.lines;
  if (!edge?.frontBelowMark || !cut?.frontBelowMark) return null;
  return t('sheet.slope', { slope: pp.slope.text, edge: belowOrAbove(t, edge.frontBelowMark), cut: belowOrAbove(t, cut.frontBelowMark) });
}

// The cloth check and the taper note already say these in the sheet's own layout.
const SAID_ELSEWHERE: ReadonlySet<WarningCode> = new Set(['not-enough-cloth', 'taper-beyond-tolerance', 'let-out-exceeds-seam-allowance']);

// The sections a reader adds up to check the lines, when the title's depth alone does not say them.
function sectionsNote(t: Translate, pp: PrintedPlan): string | null {
  const parts: string[] = [];
  if (pp.turnOfCloth) parts.push(t('sheet.sections.turn', { length: pp.turnOfCloth.text }));
  if (pp.thirdSection && pp.thirdSection.text !== pp.depth.text) parts.push(t('sheet.sections.third', { length: pp.thirdSection.text }));
  return parts.length > 0 ? parts.join(t('sheet.list')) : null;
}

// Each recorded length as typed, with its reading when typed in another unit than the sheet's.
/** A hem left long for unwashed cloth, in the sheet's words: every figure as printed, so each sum adds up on the page. */
export function shrinkLines(t: Translate, n: ShrinkNote): string[] {
  const cloth = t(`shrink.cloth.${n.cloth}` as MessageKey);
  if (n.code === 'none') return [t('shrink.sheet.none', { cloth })];
  return [
    t('shrink.sheet.cloth', { cloth, percent: n.percent, source: n.source, length: n.length }),
    n.pin ? t('shrink.sheet.edge', { ...n }) : t('shrink.sheet.edgeBelow', { ...n }),
    n.pin ? t('shrink.sheet.cut', { ...n }) : t('shrink.sheet.cutBelow', { ...n }),
    t('shrink.sheet.caution'),
  ];
}

function recordedNote(t: Translate, leg: LegSheet): string | null {
  if (!leg.recorded?.length) return null;
  const list = leg.recorded.map((r) => `${r.label} ${recordedText(r.text, leg.plan.unit, leg.plan.precision)}`).join(t('warning.not-enough-cloth.separator'));
  return t('sheet.recorded', { list });
}

// A kept factory hem's notes, said with the figures the sheet prints (the engine rounds its own).
function originalNote(t: Translate, code: OriginalHemLeg['plan']['notes'][number]['code'], pp: PrintedOriginal): string {
  if (code === 'fold-only') return t('originalNote.fold-only', { least: pp.seamTakes.text, tuck: pp.tuck?.text ?? '' });
  if (code === 'chalk-on-both-legs') return t('originalNote.chalk-on-both-legs');
  return t(`originalNote.${code}`, { perSeam: pp.taper?.perSeam.text ?? '', perSide: pp.taper?.perSide.text ?? '' });
}

function originalGroupOf(t: Translate, leg: OriginalHemLeg, label: string, stripName: string): SheetLegGroup {
  const pp = printedOriginal(leg.plan);
  const lines: SheetLine[] = pp.lines.map((l) => ({
    n: l.n,
    name: t(`original.line.${l.name}`),
    short: t(`sheet.guide.short.${l.name}`),
    cut: l.cut,
    belowMark: l.belowMark,
    aboveRawEdge: l.abovePresentEdge,
  }));
  const sum =
    pp.method === 'cut-and-join'
      ? t('original.sum', { shortenBy: pp.shortenBy.text, removed: pp.removed.text, seamAllowance: pp.seamAllowance.text, seamTakes: pp.seamTakes.text })
      : t('original.foldSum', { shortenBy: pp.shortenBy.text, seamAllowance: pp.seamAllowance.text, seamTakes: pp.seamTakes.text });
  const taper = !pp.taper
    ? t('original.taper.none')
    : pp.taper.withinTolerance
      ? t('original.taper.within', { mismatch: pp.taper.mismatch.text })
      : t('original.taper.work', { mismatch: pp.taper.mismatch.text });
  // The 1:1 strip starts at the highest line, the join, so every line is below its 0; the pin mark is a tick too.
  const strip = [
    ...pp.lines.map((l, i) => ({ n: l.n, name: lines[i]!.name, short: lines[i]!.short, cut: l.cut, belowMark: pp.fromJoin[i]! })),
    { n: 0, name: t('original.line.pin-mark'), short: t('sheet.guide.short.pin-mark'), cut: false, belowMark: pp.factoryHem },
  ].sort((x, y) => x.belowMark.mm - y.belowMark.mm);
  // The fold-only note follows the printed method (rounding can decide it), the taper's the engine's.
  const codes: OriginalHemNoteCode[] = leg.plan.notes.map((n) => n.code).filter((c) => c !== 'fold-only');
  if (pp.method === 'fold-only') codes.push('fold-only');
  return {
    label,
    stripLabel: t('sheet.original.strip', { label: stripName, height: pp.factoryHem.text }),
    finish: 'original',
    title: t('sheet.originalTitle', { depth: pp.factoryHem.text }),
    sections: null,
    lines,
    cloth: { ok: null, text: sum, options: [] },
    slopeNote: null,
    taper: null,
    crease: null,
    recorded: recordedNote(t, leg),
    waist: leg.waist ? t(`waist.${leg.waist.code}` as MessageKey, { ...leg.waist }) : null,
    shrink: null,
    warnings: codes.map((c) => originalNote(t, c, pp)),
    leg,
    printed: null,
    original: { printed: pp, sum, taper, strip },
  };
}

function groupOf(t: Translate, leg: LegSheet, label: string, strip: string, existing: ExistingFinish | undefined): SheetLegGroup {
  if (leg.finish === 'original') return originalGroupOf(t, leg, label, strip);
  const p = leg.plan;
  const pp = printedPlan(leg);
  const lines: SheetLine[] = pp.lines.map((l) => ({
    n: l.n,
    name: lineName(t, l.name),
    short: t(`sheet.guide.short.${l.name}`),
    cut: l.name === 'cut',
    belowMark: l.belowMark,
    aboveRawEdge: l.aboveRawEdge,
  }));
  const title = p.kind === 'cuff' ? t('sheet.cuffTitle', { depth: pp.depth.text }) : t('sheet.hemTitle', { depth: pp.depth.text });
  const crease = creaseOf(leg);
  const warnings: PlanWarning[] = [...p.warnings, ...(leg.taper ? leg.taper.plan.warnings : [])];
  const beyond = pp.taper?.beyondSeamAllowance;
  // The engine's let-out warning has its own rounding; the sheet says it with the figures it prints,
  // and not at all beside "no seam work needed".
  const letOut = beyond
    ? [
        beyond.perSide.mm > beyond.seamAllowance.mm
          ? t('sheet.letOut.over', { perSide: beyond.perSide.text, seamAllowance: beyond.seamAllowance.text })
          : t('sheet.letOut.little', { seamAllowance: beyond.seamAllowance.text }),
      ]
    : [];
  const slope = slopeNote(t, leg, pp);
  return {
    label,
    // A sloped hem's lines are planned at the back, where the pin is.
    stripLabel: slope ? t('sheet.guide.atBack', { label: strip }) : strip,
    finish: leg.finish,
    title,
    sections: sectionsNote(t, pp),
    lines,
    cloth: clothCheck(t, pp),
    slopeNote: slope,
    taper: taperOf(t, leg, pp),
    crease: creaseNote(t, crease, existing),
    recorded: recordedNote(t, leg),
    waist: leg.waist ? t(`waist.${leg.waist.code}` as MessageKey, { ...leg.waist }) : null,
    shrink: leg.finish === 'hem' && leg.shrink ? shrinkLines(t, leg.shrink) : null,
    warnings: [
      ...new Set([
        ...warnings.filter((w) => !SAID_ELSEWHERE.has(w.code) && !(crease && w.code === 'old-crease-visible')).map((w) => warningText(t, w)),
        ...letOut,
        ...(crease && existing === 'unfinished' ? [t('sheet.creaseOnNew')] : []),
      ]),
    ],
    leg,
    printed: pp,
    original: null,
  };
}

/** Bench steps for a cuff, in the order they are done; taperStep is the seam work, if any. */
export function cuffSteps(unit: Unit, turnUnder: string, taperStep: string | null, t: Translate = EN): string[] {
  const stitch = stitchLengths(unit, t);
  return [
    t('sheet.cuff.1'),
    ...(taperStep ? [taperStep] : []),
    t('sheet.cuff.2'),
    t('sheet.cuff.3'),
    t('sheet.cuff.4', { turnUnder, stitch: stitch.long }),
    t('sheet.cuff.5'),
    t('sheet.press'),
    t('sheet.cuff.tack', { below: t('sheet.tack.below', { unit }), wide: t('sheet.tack.wide', { unit }), stitch: stitch.short }),
  ];
}

/** Bench steps for a plain hem, in the order they are done (stitch lengths per inch on inch sheets); taperStep is the seam work, if any. */
export function hemSteps(turnUnder: string, sloped: boolean, unit: Unit = 'mm', taperStep: string | null = null, t: Translate = EN): string[] {
  const stitch = stitchLengths(unit, t);
  return [
    t('sheet.hem.1', { sloped: sloped ? 'yes' : 'no' }),
    ...(taperStep ? [taperStep] : []),
    t('sheet.hem.2'),
    t('sheet.hem.3', { turnUnder, stitch: stitch.standard }),
    t('sheet.hem.4'),
    t('sheet.hem.5'),
    t('sheet.press'),
    t('sheet.hem.tack', { stitch: stitch.short }),
  ];
}

/** Bench steps for jeans kept on their factory hem: cut and join, or (too little to cut) fold and stitch. */
function originalSteps(t: Translate, groups: SheetLegGroup[]): string[] {
  const stitch = stitchLengths(groups[0]!.leg.plan.unit, t).standard;
  const folded = groups.every((g) => g.original?.printed.method === 'fold-only');
  if (folded) return [t('sheet.original.1'), t('sheet.original.fold.2'), t('sheet.original.fold.3', { stitch }), t('sheet.press')];
  const seamAllowance = perLeg(t, groups, (g) => g.original!.printed.seamAllowance.text);
  return [t('sheet.original.1'), t('sheet.original.2'), t('sheet.original.3', { seamAllowance, stitch }), t('sheet.original.4'), t('sheet.press')];
}

// One figure for both legs, or each leg's own when they differ.
function perLeg(t: Translate, groups: SheetLegGroup[], text: (g: SheetLegGroup) => string): string {
  const all = groups.map(text);
  if (new Set(all).size === 1) return all[0]!;
  return groups
    .map((g, i) => t('sheet.perLeg', { text: all[i]!, leg: g.leg.side === 'left' ? t('sheet.legs.leftShort') : t('sheet.legs.rightShort') }))
    .join(t('sheet.list'));
}

// A step for some legs only: "Left leg: before cutting, …" (the step's first letter lowered).
function forSome(t: Translate, tapered: SheetLegGroup[], step: string): string {
  return t('sheet.someLegs', { legs: tapered.map((g) => g.label).join(t('sheet.list')), step: `${step[0]!.toLowerCase()}${step.slice(1)}` });
}

function stepsOf(t: Translate, groups: SheetLegGroup[]): SheetContent['steps'] {
  const finishes = new Set(groups.map((g) => g.finish));
  if (finishes.size > 1) {
    return groups.map((g) => ({ heading: g.label, items: stepsOf(t, [g])[0]!.items }));
  }
  const first = groups[0]!.leg;
  if (first.finish === 'original') return [{ heading: null, items: originalSteps(t, groups) }];
  const turnUnder = perLeg(t, groups, (g) => g.printed!.turnUnder.text);
  const tapered = groups.filter((g) => g.taper?.work);
  if (first.finish === 'hem') {
    const outward = tapered.every((g) => (g.leg.taper?.plan.lines.at(-1)?.change.mm ?? 0) > 0);
    const hemWork = t('sheet.hemWork', { outward: outward ? 'yes' : 'no' });
    const step = tapered.length === 0 ? null : tapered.length === groups.length ? hemWork : forSome(t, tapered, hemWork);
    return [
      {
        heading: null,
        items: hemSteps(
          turnUnder,
          groups.some((g) => g.slopeNote !== null),
          first.plan.unit,
          step,
          t,
        ),
      },
    ];
  }
  const from = perLeg(t, tapered.length ? tapered : groups, (g) => g.printed!.depth.text);
  // Re-chalking alone leaves the old stitching: the seam is unpicked, sewn on the new line and pressed
  // open before the bottom is cut and folded, or the cuff is folded over the old, tapered seam.
  const seamWork = t('sheet.seamWork', { from });
  const taperStep = tapered.length === 0 ? null : tapered.length === groups.length ? seamWork : forSome(t, tapered, seamWork);
  return [{ heading: null, items: cuffSteps(first.plan.unit, turnUnder, taperStep, t) }];
}

// Old cuffs come down before anything else; with a block per leg the step stands in its own block first.
function withLetDown(t: Translate, steps: SheetContent['steps'], existing: ExistingFinish | undefined): SheetContent['steps'] {
  if (existing !== 'cuff') return steps;
  const [only, ...rest] = steps;
  const letDown = t('sheet.letDownOldCuff');
  if (only && rest.length === 0 && only.heading === null) return [{ heading: null, items: [letDown, ...only.items] }];
  return [{ heading: t('sheet.letDownHeading'), items: [letDown] }, ...steps];
}

/** Works out every word and figure of one sheet, in its language (English when the data names none). */
export function sheetContent(data: CutSheetData): SheetContent {
  const language = data.language ?? DEFAULT_LANGUAGE;
  const t = translator(language);
  const unsaved = !data.link;
  if (data.kindSheet) return kindContent(data, t, language);
  const [first, second] = data.legs;
  if (!first) throw new Error('A cut sheet needs at least one leg.');
  const groups =
    !second || sameWork(first, second)
      ? [groupOf(t, first, t('sheet.legs.both'), t('sheet.legs.both'), data.existingFinish)]
      : data.legs.map((l) =>
          l.side === 'left'
            ? groupOf(t, l, t('sheet.legs.left'), t('sheet.guide.leg.left'), data.existingFinish)
            : groupOf(t, l, t('sheet.legs.right'), t('sheet.guide.leg.right'), data.existingFinish),
        );

  const meta: string[] = [];
  if (data.ticket) meta.push(t('sheet.meta.ticket', { ticket: data.ticket }));
  if (data.garment) meta.push(data.garment);
  if (data.due) meta.push(t('sheet.meta.due', { date: formatDue(data.due, language) }));
  if (data.assignee) meta.push(t('sheet.meta.for', { who: data.assignee }));
  const finished = finishedLine(data.legs, t);
  if (finished) meta.push(finished);

  return {
    unsaved,
    title: unsaved ? t('sheet.unsavedTitle') : (data.shop ?? t('sheet.title')),
    meta,
    unitNote: t('sheet.unitNote', { unit: t(`sheet.unit.${data.unit}`), unitKind: data.unit, precision: data.precision }),
    groups,
    kind: null,
    steps: withLetDown(t, stepsOf(t, groups), data.existingFinish),
    cautions: cautionsIn(
      t,
      data.legs.some((l) => l.finish === 'original'),
    ),
    guideNote: [
      t('sheet.guide.check', { says: checkRuler(data.unit).says }),
      t('sheet.guide.scaled'),
      // A kept factory hem's strip starts at the join, above the pin mark.
      groups.every((g) => g.original) ? t('sheet.guide.layJoin') : t('sheet.guide.lay'),
    ],
    t,
    language,
  };
}

function headerMeta(data: CutSheetData, t: Translate, language: Language): string[] {
  const meta: string[] = [];
  if (data.ticket) meta.push(t('sheet.meta.ticket', { ticket: data.ticket }));
  if (data.garment) meta.push(data.garment);
  if (data.due) meta.push(t('sheet.meta.due', { date: formatDue(data.due, language) }));
  if (data.assignee) meta.push(t('sheet.meta.for', { who: data.assignee }));
  return meta;
}

// A garment fitted once: the same frame (header, steps, cautions, check ruler, strip), its kind's block.
function kindContent(data: CutSheetData, t: Translate, language: Language): SheetContent {
  const kind = KIND_SHEETS[data.kindSheet!.kind].content(data.kindSheet!, t, data.unit, data.precision);
  return {
    unsaved: !data.link,
    title: !data.link ? t('sheet.unsavedTitle') : (data.shop ?? t('sheet.title')),
    meta: headerMeta(data, t, language),
    unitNote: t('sheet.unitNote', { unit: t(`sheet.unit.${data.unit}`), unitKind: data.unit, precision: data.precision }),
    groups: [],
    kind,
    steps: [{ heading: null, items: kind.steps }],
    cautions: cautionsIn(t),
    guideNote: [t('sheet.guide.check', { says: checkRuler(data.unit).says }), t('sheet.guide.scaled'), kind.lay],
    t,
    language,
  };
}
