// The words and figures of a cut sheet, worked out once from the data. The PDF lays them out;
// keeping them here lets the tests and any other rendering read the same sheet.
import type { CreaseLanding, CuffLineName, Len, PlanWarning, TaperLine, TaperPlan, Unit, WarningCode } from '@/lib/allowance/types';
import type { ExistingFinish } from '@/lib/existing-finish';
import { SAFETY_DEFER_SHEET, SAFETY_NOTES } from '../bench-safety';
import { checkRuler } from './chalk-guide';
import { finishedLine, recordedText } from './finished-length';
import { printedPlan, type PrintedPlan, type PrintedSeamWork } from './printed';
import type { CutSheetData, LegSheet } from './types';

/** One chalk line as printed: number, name, distances. */
export interface SheetLine {
  n: number;
  name: string;
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
  finish: 'cuff' | 'hem';
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
  warnings: string[];
  leg: LegSheet;
  /** every figure the block prints, in whole display steps */
  printed: PrintedPlan;
}

/** The whole sheet in words. */
export interface SheetContent {
  unsaved: boolean;
  title: string;
  meta: string[];
  unitNote: string;
  groups: SheetLegGroup[];
  steps: { heading: string | null; items: string[] }[];
  cautions: string[];
  guideNote: string[];
}

const LINE_NAMES: Record<CuffLineName, string> = {
  'finished-edge': 'Finished edge',
  'cuff-top': 'Cuff top',
  'inner-fold': 'Inner fold',
  cut: 'Cutting line',
};

/** Header shown instead of shop and ticket when the plan was never saved. */
export const UNSAVED_TITLE = 'Unsaved plan from the calculator';

/** Stitch lengths printed on the sheet, in mm (TRADE.md, common practice). */
export const STITCH = { long: 'about 4 mm', short: 'about 2 mm', standard: 'about 2.5–3 mm' } as const;

// Inch shops set stitches per inch: 25.4/4 ≈ 6, 25.4/2 ≈ 13, 8–10 per inch (TRADE.md); mm beside.
const STITCH_PER_INCH = { long: 'about 6 per inch, 4 mm', short: 'about 13 per inch, 2 mm', standard: '8–10 per inch, 2.5–3 mm' } as const;

/** The stitch lengths as a sheet in this unit prints them: per inch (with mm) on inch sheets, mm on metric ones. */
export function stitchLengths(unit: Unit): Record<keyof typeof STITCH, string> {
  return unit === 'in' ? STITCH_PER_INCH : STITCH;
}

// Tack placement (TRADE.md: about 1/8 to 3/16 in below the cuff top, about 1/8 in wide).
const TACK: Record<Unit, { below: string; wide: string }> = {
  in: { below: '1/8 to 3/16 in', wide: '1/8 in' },
  mm: { below: '3 to 5 mm', wide: '3 mm' },
  cm: { below: '0.3 to 0.5 cm', wide: '0.3 cm' },
};

/** The cautions every sheet carries (TRADE.md, "Cautions to show"). */
export const CAUTIONS = [...SAFETY_NOTES.map((n) => n.sheet), SAFETY_DEFER_SHEET] as const;

/** The first bench step on a pair that came in with cuffs: old folds left in would throw the chalk lines out. */
export const LET_DOWN_OLD_CUFF = 'Let down the old cuffs: unpick tacks and turn-under; press out old creases with a cloth.';

/** The heading of the let-down step when each leg has its own steps after it. */
export const LET_DOWN_HEADING = 'Both legs, first';

const UNIT_NOTE: Record<Unit, string> = { in: 'inches', cm: 'centimetres', mm: 'millimetres' };

/** Drops a leading minus sign: the sheet says "take in" rather than "-1/8 in". */
function unsigned(len: Len): string {
  return len.text.replace(/^[-−]\s*/, '');
}

function belowOrAbove(len: Len): string {
  return len.mm < 0 ? `${unsigned(len)} above` : `${len.text} below`;
}

// toLocaleDateString builds a new formatter on every call (about 1 % of a sheet): build it once.
const DUE_FORMAT = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

function formatDue(iso: string): string {
  const d = new Date(`${iso}T12:00:00Z`);
  if (Number.isNaN(d.getTime())) return iso;
  return DUE_FORMAT.format(d);
}

function sameWork(a: LegSheet, b: LegSheet): boolean {
  const key = (l: LegSheet) => JSON.stringify([l.finish, l.plan, l.taper?.plan ?? null, creaseOf(l), l.recorded ?? null]);
  return key(a) === key(b);
}

function creaseOf(leg: LegSheet): CreaseLanding | undefined {
  return leg.crease ?? (leg.finish === 'cuff' ? leg.plan.creaseLands : undefined);
}

// The engine advises pressing a showing crease out "before finishing"; on a pair that came with
// cuffs the let-down step has already pressed it, before any chalk, so the note says that instead.
const LET_DOWN_ADVICE: Partial<Record<CreaseLanding['place'], string>> = {
  'leg-visible': 'Press it out as the old cuffs come down; if it still shows, choose a cuff depth that covers it. Tell the customer it may not press out.',
  'at-cuff-top': 'Press it out as the old cuffs come down. Tell the customer it may not press out.',
  'cuff-face':
    'Press it out as the old cuffs come down; if it still shows, change the cuff depth so it falls on a fold. Tell the customer it may not press out.',
};

function creaseNote(crease: CreaseLanding | undefined, existing: ExistingFinish | undefined): string | null {
  if (!crease) return null;
  let message = crease.message;
  const advice = existing === 'cuff' ? LET_DOWN_ADVICE[crease.place] : undefined;
  if (advice) {
    // The old fold was a cuff's, not a hem's; the engine's first sentence says where it lands.
    const where = /^(.*?\.)\s+(?=[A-Z])/.exec(message)?.[1] ?? message;
    message = `${where.replace(/^the old hem crease/i, 'The old crease')} ${advice}`;
  }
  return /^the old crease/i.test(message) ? message : `Old crease: ${message}`;
}

// A new pair has no old fold: a crease noted on one means the intake or the fitting is wrong.
const CREASE_ON_NEW = 'The pair came in unfinished, yet an old crease is noted: check whether an old hem or cuff must be let down first.';

function clothCheck(pp: PrintedPlan): SheetLegGroup['cloth'] {
  const c = pp.cloth;
  if (c.enough === null || c.has === null) {
    return { ok: null, text: `Cloth not measured: this plan needs ${c.needs.text} below the pin mark. Measure before cutting.`, options: [] };
  }
  if (c.enough) {
    return { ok: true, text: `Cloth check: needs ${c.needs.text} below the pin mark, has ${c.has.text}, ${c.spare!.text} to spare.`, options: [] };
  }
  const options: string[] = [];
  const alt = pp.alternatives;
  if (alt) {
    if (alt.shorterSection) options.push(`Same cuff, third section ${alt.shorterSection.text}: fits.`);
    if (alt.deepestCuff) options.push(`A shallower cuff: ${alt.deepestCuff.text} deep fits.`);
    options.push(`A plain hem needs ${alt.plainHem.required.text}: ${alt.plainHem.fits ? 'fits' : 'does not fit'}.`);
    options.push(`A faced cuff needs ${alt.facedCuff.required.text}: ${alt.facedCuff.fits ? 'fits' : 'does not fit'}.`);
  }
  return {
    ok: false,
    text: `NOT ENOUGH CLOTH: do not cut. Needs ${c.needs.text} below the pin mark, has ${c.has.text}. Short by ${c.shortBy!.text}.`,
    options,
  };
}

// On a let-down pair the width at the cut was measured there, not followed down from the taper: say so.
function measuredNote(t: TaperPlan): string {
  const cut = t.lines[t.lines.length - 1];
  return cut?.measured ? ` Width at the cutting line measured on the let-down leg: ${cut.width.text} flat (not followed down from the taper).` : '';
}

function rowWidth(l: TaperLine): string {
  return l.measured ? `${l.width.text} (measured)` : l.width.text;
}

function taperOf(leg: LegSheet, pp: PrintedPlan): SheetLegGroup['taper'] {
  if (!leg.taper) return null;
  if (leg.finish === 'hem') return hemTaperOf(leg);
  if (!pp.taper) return null;
  const t = leg.taper.plan;
  const work = (l: PrintedSeamWork) => `${l.sign > 0 ? 'let out' : 'take in'} ${l.perSeam.text} at each seam (${l.perSide.text} each side)`;
  const rows = t.lines.map((l, k) => {
    const printed = pp.taper!.lines[k]!;
    return { n: l.n, name: LINE_NAMES[l.name], width: rowWidth(l), work: !pp.taper!.work || printed.sign === 0 ? 'as it is' : work(printed) };
  });
  const target = pp.taper.target.text;
  // Named by its height above the finished edge: the chalked "Cuff top" line is one depth below the mark.
  const above = pp.depth.text;
  // No line with work to print (within tolerance, or under half a step everywhere): nothing to let out.
  const measured = measuredNote(t);
  if (!pp.taper.work) return { summary: `Taper within tolerance: no seam work needed (${target} flat ${above} above the edge).${measured}`, work: null, rows };
  const moving = pp.taper.lines.filter((l) => l.sign !== 0);
  const moves = moving.map((l) => `${l.sign > 0 ? 'let out' : 'take in'} ${l.perSeam.text} at line ${l.n}`);
  // Each side's share in the same order, its unit said once at the end: "1/8, 1/4 in each side".
  const sides = moving.map((l, i) => (i === moving.length - 1 ? l.perSide.text : l.perSide.text.replace(/ (in|cm|mm)$/, '')));
  return {
    summary: `Taper: keep the width ${above} above the finished edge (${target} flat) straight down to the cutting line.${measured}`,
    work: `At each leg seam ${moves.join(', ')}; half of each at each side of the seam: ${sides.join(', ')} each side.`,
    rows,
  };
}

// Under half a step the engine's figure prints as 0: never "let out 0 in" on a line.
function printsZero(len: Len): boolean {
  return /^0(\s|$)/.test(unsigned(len));
}

// A plain hem on a tapered leg: turned up, the hem must match the leg it lands on.
function hemTaperOf(leg: LegSheet & { finish: 'hem' }): SheetLegGroup['taper'] {
  const t = leg.taper!.plan;
  const rows = t.lines.map((l) => ({
    n: l.n,
    name: LINE_NAMES[l.name],
    width: rowWidth(l),
    work:
      l.change.mm === 0 || printsZero(l.perSeam)
        ? 'as it is'
        : `${l.change.mm > 0 ? 'let out' : 'take in'} ${unsigned(l.perSeam)} at each seam (${unsigned(l.perSide)} each side)`,
  }));
  const above = leg.plan.hemAllowance.text;
  const cut = t.lines[t.lines.length - 1]!;
  const flat = t.withinTolerance || cut.change.mm === 0 || printsZero(cut.perSeam);
  // A let-down hem may have flared past the leg it lands on: then the seams come in, not out.
  const seams = cut.change.mm > 0 ? 'flare the seams below the finished edge to it' : 'take the seams in below the finished edge to it';
  const summary =
    (flat
      ? `Taper within tolerance: the hem lies flat, no seam work needed.`
      : `Taper: turned up, the hem must match the leg ${above} above the edge (${t.targetWidth.text} flat): ${seams} at the cutting line.`) + measuredNote(t);
  const work = flat
    ? null
    : `At each leg seam ${cut.change.mm > 0 ? 'let out' : 'take in'} ${unsigned(cut.perSeam)} at line 2, nothing at line 1 (half of it each side of the seam).`;
  return { summary, work, rows };
}

function slopeNote(leg: LegSheet, pp: PrintedPlan): string | null {
  if (leg.finish !== 'hem' || !pp.slope || pp.slope.mm === 0) return null;
  const [edge, cut] = pp.lines;
  if (!edge?.frontBelowMark || !cut?.frontBelowMark) return null;
  return `Sloped hem: ${pp.slope.text} lower at the back. At the front chalk the finished edge ${belowOrAbove(edge.frontBelowMark)} and the cutting line ${belowOrAbove(cut.frontBelowMark)} the back pin mark.`;
}

// The cloth check and the taper note already say these in the sheet's own layout.
const SAID_ELSEWHERE: ReadonlySet<WarningCode> = new Set(['not-enough-cloth', 'taper-beyond-tolerance', 'let-out-exceeds-seam-allowance']);

// The sections a reader adds up to check the lines, when the title's depth alone does not say them.
function sectionsNote(pp: PrintedPlan): string | null {
  const parts: string[] = [];
  if (pp.turnOfCloth) parts.push(`${pp.turnOfCloth.text} turn of cloth at each fold`);
  if (pp.thirdSection && pp.thirdSection.text !== pp.depth.text) parts.push(`third section ${pp.thirdSection.text}`);
  return parts.length > 0 ? parts.join(', ') : null;
}

// Each recorded length as typed, with its reading when typed in another unit than the sheet's.
function recordedNote(leg: LegSheet): string | null {
  if (!leg.recorded?.length) return null;
  return `Recorded at the fitting: ${leg.recorded.map((r) => `${r.label} ${recordedText(r.text, leg.plan.unit, leg.plan.precision)}`).join('; ')}.`;
}

function groupOf(leg: LegSheet, label: string, existing: ExistingFinish | undefined): SheetLegGroup {
  const p = leg.plan;
  const pp = printedPlan(leg);
  const lines: SheetLine[] = pp.lines.map((l) => ({
    n: l.n,
    name: LINE_NAMES[l.name],
    cut: l.name === 'cut',
    belowMark: l.belowMark,
    aboveRawEdge: l.aboveRawEdge,
  }));
  const title = p.kind === 'cuff' ? `Cuff, ${pp.depth.text} deep` : `Plain hem, ${pp.depth.text} allowance`;
  const crease = creaseOf(leg);
  const warnings: PlanWarning[] = [...p.warnings, ...(leg.taper ? leg.taper.plan.warnings : [])];
  const beyond = pp.taper?.beyondSeamAllowance;
  // The engine's let-out warning has its own rounding; the sheet says it with the figures it prints,
  // and not at all beside "no seam work needed".
  const letOut = beyond
    ? [
        beyond.perSide.mm > beyond.seamAllowance.mm
          ? `Letting out needs ${beyond.perSide.text} on each side of each seam, but the seam allowance is only ${beyond.seamAllowance.text}. Choose a shallower cuff or a plain hem.`
          : `Letting out needs a little more than the ${beyond.seamAllowance.text} seam allowance on each side of each seam. Choose a shallower cuff or a plain hem.`,
      ]
    : [];
  return {
    label,
    finish: leg.finish,
    title,
    sections: sectionsNote(pp),
    lines,
    cloth: clothCheck(pp),
    slopeNote: slopeNote(leg, pp),
    taper: taperOf(leg, pp),
    crease: creaseNote(crease, existing),
    recorded: recordedNote(leg),
    warnings: [
      ...new Set([
        ...warnings.filter((w) => !SAID_ELSEWHERE.has(w.code) && !(crease && w.code === 'old-crease-visible')).map((w) => w.message),
        ...letOut,
        ...(crease && existing === 'unfinished' ? [CREASE_ON_NEW] : []),
      ]),
    ],
    leg,
    printed: pp,
  };
}

/** Bench steps for a cuff, in the order they are done; taperStep is the seam work, if any. */
export function cuffSteps(unit: Unit, turnUnder: string, taperStep: string | null): string[] {
  const tack = TACK[unit];
  const STITCH = stitchLengths(unit);
  return [
    "Chalk the four lines level round the leg with dry tailor's chalk, not wax (wax leaves a mark under the iron). Measure each from the pin mark.",
    ...(taperStep ? [taperStep] : []),
    'Cut on line 4, the cutting line.',
    'Fold the bottom to the inside at line 2. Press the folds at the seams first, then front and back.',
    `Turn under ${turnUnder} at the raw edge and stitch it with a long stitch (${STITCH.long}).`,
    'Turn the bottom up to the outside at line 1: lines 1 and 3 meet at the bottom, line 2 becomes the cuff top.',
    'Press with a cloth on the outside, so the cloth takes no shine; wool takes steam.',
    `Tack at the inseam and outseam, ${tack.below} below the cuff top and about ${tack.wide} wide: short stitch (${STITCH.short}), back-stitched. Leave the top free.`,
  ];
}

/** Bench steps for a plain hem, in the order they are done (stitch lengths per inch on inch sheets); taperStep is the seam work, if any. */
export function hemSteps(turnUnder: string, sloped: boolean, unit: Unit = 'mm', taperStep: string | null = null): string[] {
  const STITCH = stitchLengths(unit);
  return [
    `Chalk the two lines ${sloped ? 'round the leg, sloping down to the back,' : 'level round the leg'} with dry tailor's chalk, not wax (wax leaves a mark under the iron).`,
    ...(taperStep ? [taperStep] : []),
    'Cut on line 2, the cutting line.',
    `Turn under ${turnUnder} at the raw edge and stitch it with a standard stitch (${STITCH.standard}).`,
    'Fold up at line 1. Press the fold at the seams first, then front and back.',
    'Blind-stitch the turned edge to the leg, catching only a thread of the outside.',
    'Press with a cloth on the outside, so the cloth takes no shine; wool takes steam.',
    `Tack at the inseam and the outseam: short stitch (${STITCH.short}), back-stitched.`,
  ];
}

// One figure for both legs, or each leg's own when they differ.
function perLeg(groups: SheetLegGroup[], text: (g: SheetLegGroup) => string): string {
  const all = groups.map(text);
  if (new Set(all).size === 1) return all[0]!;
  return groups.map((g, i) => `${all[i]} (${g.label.replace(' leg', '').toLowerCase()})`).join(', ');
}

function stepsOf(groups: SheetLegGroup[]): SheetContent['steps'] {
  const finishes = new Set(groups.map((g) => g.finish));
  if (finishes.size > 1) {
    return groups.map((g) => ({ heading: g.label, items: stepsOf([g])[0]!.items }));
  }
  const turnUnder = perLeg(groups, (g) => g.printed.turnUnder.text);
  const first = groups[0]!.leg;
  const tapered = groups.filter((g) => g.taper?.work);
  if (first.finish === 'hem') {
    const outward = tapered.every((g) => (g.leg.taper?.plan.lines.at(-1)?.change.mm ?? 0) > 0);
    const hemWork = `Before cutting, unpick both leg seams below the finished edge; re-stitch them ${outward ? 'flaring out' : 'on the new line'} to the cutting line (taper note), press open (hot iron: your shop's way).`;
    const step =
      tapered.length === 0
        ? null
        : tapered.length === groups.length
          ? hemWork
          : `${tapered.map((g) => g.label).join(', ')}: ${hemWork[0]!.toLowerCase()}${hemWork.slice(1)}`;
    return [
      {
        heading: null,
        items: hemSteps(
          turnUnder,
          groups.some((g) => g.slopeNote !== null),
          first.plan.unit,
          step,
        ),
      },
    ];
  }
  const from = perLeg(tapered.length ? tapered : groups, (g) => g.printed.depth.text);
  // Re-chalking alone leaves the old stitching: the seam is unpicked, sewn on the new line and pressed
  // open before the bottom is cut and folded, or the cuff is folded over the old, tapered seam.
  const seamWork = `Before cutting, unpick both leg seams from ${from} above the finished edge to the cut line; re-stitch straight down (taper note), press open (hot iron: your shop's way).`;
  const taperStep =
    tapered.length === 0
      ? null
      : tapered.length === groups.length
        ? seamWork
        : `${tapered.map((g) => g.label).join(', ')}: ${seamWork[0]!.toLowerCase()}${seamWork.slice(1)}`;
  return [{ heading: null, items: cuffSteps(first.plan.unit, turnUnder, taperStep) }];
}

// Old cuffs come down before anything else; with a block per leg the step stands in its own block first.
function withLetDown(steps: SheetContent['steps'], existing: ExistingFinish | undefined): SheetContent['steps'] {
  if (existing !== 'cuff') return steps;
  const [only, ...rest] = steps;
  if (only && rest.length === 0 && only.heading === null) return [{ heading: null, items: [LET_DOWN_OLD_CUFF, ...only.items] }];
  return [{ heading: LET_DOWN_HEADING, items: [LET_DOWN_OLD_CUFF] }, ...steps];
}

/** Works out every word and figure of one sheet. */
export function sheetContent(data: CutSheetData): SheetContent {
  const unsaved = !data.link;
  const [first, second] = data.legs;
  if (!first) throw new Error('A cut sheet needs at least one leg.');
  const groups =
    !second || sameWork(first, second)
      ? [groupOf(first, 'Both legs', data.existingFinish)]
      : data.legs.map((l) => groupOf(l, l.side === 'left' ? 'Left leg' : 'Right leg', data.existingFinish));

  const meta: string[] = [];
  if (data.ticket) meta.push(`Ticket ${data.ticket}`);
  if (data.garment) meta.push(data.garment);
  if (data.due) meta.push(`Due ${formatDue(data.due)}`);
  if (data.assignee) meta.push(`For ${data.assignee}`);
  const finished = finishedLine(data.legs);
  if (finished) meta.push(finished);

  const precision = data.unit === 'in' ? `, to 1/${data.precision}` : '';
  return {
    unsaved,
    title: unsaved ? UNSAVED_TITLE : (data.shop ?? 'Cut sheet'),
    meta,
    unitNote: `All lengths in ${UNIT_NOTE[data.unit]}${precision}.`,
    groups,
    steps: withLetDown(stepsOf(groups), data.existingFinish),
    cautions: [...CAUTIONS],
    guideNote: [
      `Check the printer: this ruler should measure exactly ${checkRuler(data.unit).says}.`,
      'Short or long? The page was scaled: print it again unscaled.',
      'Lay the top of the strip on the pin mark and chalk at each line.',
    ],
  };
}
