// One garment's cut sheet as a react-pdf page. Plain data in; no database, no network.
import { Canvas, Document, Page, Text, View, type DocumentProps, type PageProps } from '@react-pdf/renderer';
import type { SafePageNode } from '@react-pdf/layout';
import { Fragment, type ReactElement } from 'react';
import { ChalkGuide, COLUMN_STRIPS, StripRow, stripColumns, type StripColumn } from './ChalkGuide';
import { guideStrips, type GuideGroup } from './chalk-guide';
import { sheetContent, type SheetContent, type SheetLegGroup } from './content';
import { LegDrawing } from './LegDrawing';
import { legGeometry } from './leg-geometry';
import { textWidth } from './measure';
import { qrCode, type QrCode } from './qr';
import { SkippedNote } from './SkippedNote';
import { KIND_SHEETS } from './kinds';
import type { KindSheetContent } from './kinds/kind-sheet';
import { FAMILY } from './fonts';
import { translator, type Translate } from '../i18n/catalog';
import { intlLocale } from '../../shared/i18n/languages';
import { GUIDE_COLUMN, INK, READ_MIN, s } from './styles';
import type { Len, Unit } from '@/lib/allowance/types';
import type { CutSheetData, PageSize } from '../../shared/cut-sheet-types';

/** Page size in points, Letter and A4. */
export const PAGE_PT: Record<PageSize, { width: number; height: number }> = {
  LETTER: { width: 612, height: 792 },
  A4: { width: 595.28, height: 841.89 },
};
const PADDING = 28;
// Header, check ruler and notes, strip captions: what the strip cannot use (measured
// about 285 on both papers; kept generous, since a longer strip goes on in a second segment).
const GUIDE_OVERHEAD = 300;
const DRAWING_W = 160;
const MAIN_GUTTER = 12;
const DRAWING_H = 136;

/** The side of the printed QR code, quiet zone included (pt). */
const QR_PT = 52;

// pdfkit's painter as react-pdf's Canvas hands it on (the calls used here).
interface QrPainter {
  scale: (x: number, y: number) => QrPainter;
  translate: (x: number, y: number) => QrPainter;
  rect: (x: number, y: number, w: number, h: number) => QrPainter;
  fill: (color: string) => QrPainter;
}

// The QR code's rectangles drawn as rectangles, scaled so the code and a two-module quiet zone
// fill the box: each one `re` where a path of its corners took five drawing commands. The code
// rides on the function, so two trees of one sheet compare equal by what they draw.
function paintQr(qr: QrCode) {
  const paint = (painter: QrPainter) => {
    const scale = QR_PT / (qr.size + 4);
    painter.scale(scale, scale).translate(2, 2);
    for (const r of qr.rects) painter.rect(r.x, r.y, r.w, r.h);
    painter.fill(INK.text);
    return null;
  };
  return Object.assign(paint, { qr });
}

function Header({ c, link }: { c: SheetContent; link?: string }) {
  const qr = link ? qrCode(link) : null;
  return (
    <View style={s.header}>
      <View style={{ flexGrow: 1, flexShrink: 1, flexBasis: 0 }}>
        <Text style={s.kicker}>
          {c.t('sheet.kicker')}
          <Text style={{ fontWeight: 400, letterSpacing: 0 }}>{`      ${c.kind ? c.kind.kickerNote : c.t('sheet.kickerNote', { unitNote: c.unitNote })}`}</Text>
        </Text>
        <Text style={s.title}>{c.title}</Text>
        {c.meta.length > 0 && <Text style={s.meta}>{c.meta.join('   ·   ')}</Text>}
      </View>
      {qr ? (
        <View style={{ alignItems: 'center', marginLeft: 12 }}>
          <Canvas style={{ width: QR_PT, height: QR_PT }} paint={paintQr(qr)} />
          <Text style={{ fontSize: READ_MIN, color: INK.soft }}>{c.t('sheet.garmentPage')}</Text>
        </View>
      ) : (
        <View style={{ width: 170, marginLeft: 12, paddingTop: 18 }}>
          <Text style={{ fontSize: READ_MIN, color: INK.soft }}>{c.t('sheet.customerTicket')}</Text>
          <View style={{ borderBottomWidth: 0.75, borderBottomColor: INK.text, height: 18 }} />
        </View>
      )}
    </View>
  );
}

// Room between two columns of figures: they must never read as one number ("0 mm120.5 mm").
const COLUMN_GAP = 8;
const VALUE_SIZE = 14;
const NAME_SIZE = 10;

/** Column widths for a leg's lines table, from the widest text each column holds. */
function tableColumns(g: SheetLegGroup, t: Translate) {
  const rows = g.lines.filter((l) => !l.cut);
  const widest = (texts: string[], weight: 400 | 700 | 800, size: number) => Math.max(0, ...texts.map((t) => textWidth(t, weight, size)));
  // Headings wrap a word to a line at most, so their longest word sets their least width.
  const heading = widest([...t('sheet.col.below').split(' '), ...t('sheet.col.above').split(' ')], 700, Number(s.th.fontSize));
  const name = Math.max(
    ...rows.map((l) => textWidth(`${l.n} `, 800, NAME_SIZE) + textWidth(l.name, 400, NAME_SIZE)),
    widest([t('sheet.col.line')], 700, Number(s.th.fontSize)),
  );
  const below =
    Math.max(
      heading,
      widest(
        rows.map((l) => l.belowMark.text),
        700,
        VALUE_SIZE,
      ),
    ) + COLUMN_GAP;
  const above =
    Math.max(
      heading,
      widest(
        rows.map((l) => l.aboveRawEdge?.text ?? '—'),
        700,
        VALUE_SIZE,
      ),
    ) + COLUMN_GAP;
  return { name: Math.ceil(name) + 2, below: Math.ceil(below) + 1, above: Math.ceil(above) + 1 };
}

type Columns = ReturnType<typeof tableColumns>;

// Headings on one line when the drawing can give up the width: a line less in every leg block.
function oneLineHeadings(cols: Columns, t: Translate): Columns {
  const th = Number(s.th.fontSize);
  return {
    ...cols,
    below: Math.max(cols.below, Math.ceil(textWidth(t('sheet.col.below'), 700, th)) + COLUMN_GAP + 1),
    above: Math.max(cols.above, Math.ceil(textWidth(t('sheet.col.above'), 700, th)) + COLUMN_GAP + 1),
  };
}

function LineRow({ n, name, below, above, cols, stacked }: { n: number; name: string; below: string; above: string; cols: Columns; stacked: boolean }) {
  const label = (
    <Text style={[s.lineName, stacked ? {} : { flexGrow: 1, flexShrink: 1 }]}>
      <Text style={s.lineNo}>{n} </Text>
      {name}
    </Text>
  );
  return (
    <View style={{ borderBottomWidth: 0.5, borderBottomColor: INK.rule, paddingVertical: 1.5 }}>
      {stacked && label}
      <View style={{ flexDirection: 'row', alignItems: 'flex-end' }}>
        {stacked ? <View style={{ flexGrow: 1 }} /> : label}
        <Text style={[s.value, { width: cols.below, paddingLeft: COLUMN_GAP, textAlign: 'right', flexShrink: 0 }]}>{below}</Text>
        <Text style={[s.value, { width: cols.above, paddingLeft: COLUMN_GAP, textAlign: 'right', flexShrink: 0 }]}>{above}</Text>
      </View>
    </View>
  );
}

// A cutting line below the raw edge cannot be cut: say so in words, not with a minus sign.
function rawEdge(len: Len | null, t: Translate): { value: string; caption: string } {
  if (!len) return { value: '—', caption: t('sheet.raw.none') };
  if (len.mm < 0) return { value: len.text.replace(/^-/, ''), caption: t('sheet.raw.past') };
  return { value: len.text, caption: t('sheet.raw.above') };
}

function LinesTable({ g, cols, stacked, t }: { g: SheetLegGroup; cols: Columns; stacked: boolean; t: Translate }) {
  const head = (text: string, width: number) => <Text style={[s.th, { width, paddingLeft: COLUMN_GAP, textAlign: 'right', flexShrink: 0 }]}>{text}</Text>;
  return (
    <>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{t('sheet.col.line')}</Text>
        {head(t('sheet.col.below'), cols.below)}
        {head(t('sheet.col.above'), cols.above)}
      </View>
      {g.lines
        .filter((l) => !l.cut)
        .map((l) => (
          <LineRow key={l.n} n={l.n} name={l.name} below={l.belowMark.text} above={l.aboveRawEdge?.text ?? '—'} cols={cols} stacked={stacked} />
        ))}
    </>
  );
}

// The cut badge's width: its letters (800 weight), a point of spacing after each, 4 pt padding each side.
function badgeWidth(text: string): number {
  return Math.ceil(textWidth(text, 800, Number(s.badge.fontSize)) + [...text].length * Number(s.badge.letterSpacing) + 2 * Number(s.badge.paddingHorizontal));
}

// The one line that cannot be undone: biggest type, boxed, in cut red and labelled for greyscale.
function CutLine({ g, t }: { g: SheetLegGroup; t: Translate }) {
  const cut = g.lines.find((l) => l.cut);
  if (!cut) return null;
  const raw = rawEdge(cut.aboveRawEdge, t);
  const caption = [s.cutCaption, { marginLeft: 6, marginBottom: 3, flexShrink: 1 }];
  const value = [s.cutValue, { flexShrink: 0 }];
  return (
    <View style={{ borderWidth: 2, borderColor: INK.cut, marginTop: 4, paddingHorizontal: 6, paddingVertical: 2, flexDirection: 'row' }}>
      {/* As wide as the badge's letters with their spacing and padding (the layout leaves the spacing out). */}
      <View style={{ marginRight: 6, marginTop: 6, minWidth: badgeWidth(t('sheet.cutBadge')) }}>
        <Text style={s.badge}>{t('sheet.cutBadge')}</Text>
        <Text style={[s.th, { marginTop: 1 }]}>{t('sheet.lineN', { n: cut.n })}</Text>
      </View>
      <View style={{ flexShrink: 1 }}>
        <View style={{ flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' }}>
          <Text style={value}>{cut.belowMark.text}</Text>
          <Text style={caption}>{t('sheet.belowPinMark')}</Text>
        </View>
        <View style={{ flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' }}>
          <Text style={value}>{raw.value}</Text>
          <Text style={caption}>{raw.caption}</Text>
        </View>
      </View>
    </View>
  );
}

// The drawing gives up width to a table of wide figures, down to this; past it names go above their figures.
const DRAWING_MIN_W = 96;

// A kept factory hem: its lines from the pin mark (the join and the leg's cut above it), each with
// its height above the present edge, both cuts in cut red; then the sum that says where the length went.
function OriginalBlock({ g, t }: { g: SheetLegGroup; t: Translate }) {
  const o = g.original!;
  const from = (len: Len) => (len.mm < 0 ? t('sheet.above', { length: len.text.replace(/^-/, '') }) : t('sheet.below', { length: len.text }));
  const col = { paddingLeft: COLUMN_GAP, textAlign: 'right' as const, flexShrink: 0, width: 118 };
  return (
    <View style={{ marginBottom: 4 }} wrap={false}>
      <View style={{ flexDirection: 'row', alignItems: 'baseline', marginBottom: 2 }}>
        <Text style={[s.legLabel, { width: 70 }]}>{g.label.toUpperCase()}</Text>
        <Text style={s.legTitle}>{g.title}</Text>
      </View>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{t('original.col.line')}</Text>
        <Text style={[s.th, col]}>{t('original.col.below')}</Text>
        <Text style={[s.th, col]}>{t('original.col.above')}</Text>
      </View>
      {g.lines.map((l, i) => {
        const above = o.printed.lines[i]!.abovePresentEdge.text;
        const ink = l.cut ? { color: INK.cut, fontWeight: 800 as const } : {};
        return (
          // The name on a line of its own, the figures under it: the names are long and the figures wide.
          <View key={l.n} style={{ borderBottomWidth: 0.5, borderBottomColor: INK.rule, paddingVertical: 1.5 }}>
            <Text style={[s.lineName, ink]}>
              <Text style={s.lineNo}>{l.n} </Text>
              {l.cut ? `${t('original.cut')} · ${l.name}` : l.name}
            </Text>
            <View style={{ flexDirection: 'row', justifyContent: 'flex-end' }}>
              <Text style={[s.value, col, ink]}>{from(l.belowMark)}</Text>
              <Text style={[s.value, col, ink]}>{above}</Text>
            </View>
          </View>
        );
      })}
      <Text style={[s.small, s.strong, { marginTop: 4 }]}>{o.sum}</Text>
      <Text style={[s.small, { marginTop: 2 }]}>{o.taper}</Text>
      <LegNotes g={g} t={t} />
    </View>
  );
}

// A garment fitted once (a skirt): its kind's own block (cut-sheet/kinds/).
function KindBlock({ content, width, t }: { content: KindSheetContent; width: number; t: Translate }) {
  const { Block } = KIND_SHEETS[content.kind];
  return <Block content={content} width={width} t={t} />;
}

function LegBlock({ g, width, t }: { g: SheetLegGroup; width: number; t: Translate }) {
  if (g.leg.finish === 'original') return <OriginalBlock g={g} t={t} />;
  const least = tableColumns(g, t);
  const usual = oneLineHeadings(least, t);
  const cols = usual.name + usual.below + usual.above <= width - 8 - DRAWING_MIN_W ? usual : least;
  const tableNeeds = cols.name + cols.below + cols.above;
  const drawingW = Math.max(DRAWING_MIN_W, Math.min(DRAWING_W, width - 8 - tableNeeds));
  const stacked = tableNeeds > width - 8 - drawingW;
  const geo = legGeometry(g.leg as Exclude<typeof g.leg, { finish: 'original' }>, drawingW, DRAWING_H, t);
  return (
    <View style={{ marginBottom: 4 }} wrap={false}>
      <View style={{ flexDirection: 'row', alignItems: 'baseline', marginBottom: 2 }}>
        <Text style={[s.legLabel, { width: 70 }]}>{g.label.toUpperCase()}</Text>
        <Text style={s.legTitle}>{g.title}</Text>
        {g.sections && <Text style={[s.small, { marginLeft: 6, flexShrink: 1 }]}>{`· ${g.sections}`}</Text>}
      </View>
      <View style={{ flexDirection: 'row', alignItems: 'flex-start' }}>
        <View style={{ width: width - drawingW - 8, marginRight: 8 }}>
          <LinesTable g={g} cols={cols} stacked={stacked} t={t} />
          <CutLine g={g} t={t} />
        </View>
        <LegDrawing g={geo} />
      </View>
      <Text style={[s.small, { marginTop: 4, fontWeight: g.cloth.ok === false ? 800 : 700, color: g.cloth.ok === false ? INK.cut : INK.text }]}>
        {g.cloth.text}
      </Text>
      {g.cloth.options.length > 0 && <Text style={[s.small, { marginLeft: 10 }]}>{t('sheet.instead', { options: g.cloth.options.join(' ') })}</Text>}
      {g.slopeNote && <Text style={[s.small, { marginTop: 2 }]}>{g.slopeNote}</Text>}
      {g.taper && <Text style={[s.small, s.strong, { marginTop: 2 }]}>{g.taper.summary}</Text>}
      {g.taper?.work && <Text style={[s.small, { marginTop: 1 }]}>{g.taper.work}</Text>}
      {g.crease && <Text style={[s.small, { marginTop: 2 }]}>{g.crease}</Text>}
      <LegNotes g={g} t={t} />
    </View>
  );
}

/** The last lines under a leg: lengths recorded for the bench, the pending waist change, the shrink lines, the checks. */
function LegNotes({ g, t }: { g: { recorded: string | null; waist: string | null; shrink: string[] | null; warnings: string[] }; t: Translate }) {
  return (
    <>
      {g.recorded && <Text style={[s.small, { marginTop: 2 }]}>{g.recorded}</Text>}
      {g.waist && <Text style={[s.small, s.strong, { marginTop: 2 }]}>{g.waist}</Text>}
      {g.shrink?.map((line, i) => (
        <Text key={`shrink-${i}`} style={[s.small, i === 1 || i === 2 ? s.strong : {}, { marginTop: 2 }]}>
          {line}
        </Text>
      ))}
      {g.warnings.map((w, i) => (
        <Text key={i} style={[s.small, { marginTop: 2, color: INK.warn, fontWeight: 700 }]}>
          {t('sheet.check', { text: w })}
        </Text>
      ))}
    </>
  );
}

function Steps({ c }: { c: SheetContent }) {
  return (
    <View wrap={false}>
      <Text style={s.h2}>{c.t('sheet.atBench')}</Text>
      {c.steps.map((block, b) => (
        <Fragment key={b}>
          {block.heading && <Text style={[s.small, s.strong, { marginTop: 2 }]}>{block.heading}</Text>}
          {block.items.map((t, i) => (
            <View key={i} style={s.step}>
              <Text style={s.stepNo}>{i + 1}.</Text>
              <Text style={s.stepText}>{t}</Text>
            </View>
          ))}
        </Fragment>
      ))}
      <Text style={s.h2}>{c.t('safety.heading').toLocaleUpperCase(intlLocale(c.language))}</Text>
      {c.cautions.map((t, i) => (
        <Text key={i} style={{ fontSize: READ_MIN, marginBottom: 1 }}>
          {`•  ${t}`}
        </Text>
      ))}
    </View>
  );
}

/** The chalk guide's strip columns of a sheet: those its guide column holds, and the rest for a page of strip. */
export function sheetStripColumns(data: CutSheetData): { column: StripColumn[]; page: StripColumn[] } {
  return workedOut(data).strips;
}

// A sheet's words and strip columns, worked out once per data object: render.ts asks for the strip
// columns to find each sheet's pages and the page itself needs both (twice the work per sheet
// before). Data is never changed once built; weakly held, a batch's go with its data.
const worked = new WeakMap<CutSheetData, { c: SheetContent; strips: ReturnType<typeof stripColumnsOf> }>();

function workedOut(data: CutSheetData) {
  let w = worked.get(data);
  if (!w) {
    const c = sheetContent(data);
    worked.set(data, (w = { c, strips: stripColumnsOf(c, data) }));
  }
  return w;
}

// A kept factory hem's strip starts at its highest line, the join (a factory hem's depth above the
// pin mark), so every line is below the strip's 0 at 1:1; the pin mark is a tick of its own.
function guideGroupOf(g: SheetLegGroup, t: Translate): GuideGroup {
  return g.original ? { ...g, lines: g.original.strip, top: t('sheet.guide.topOnJoin') } : g;
}

function stripColumnsOf(c: SheetContent, data: CutSheetData) {
  const page = PAGE_PT[data.pageSize ?? 'LETTER'];
  const all = stripColumns(
    guideStrips(c.kind ? c.kind.guide : c.groups.map((g) => guideGroupOf(g, c.t)), data.unit, page.height - 2 * PADDING - GUIDE_OVERHEAD),
  );
  return { column: all.slice(0, COLUMN_STRIPS), page: all.slice(COLUMN_STRIPS) };
}

// The strip's parts the guide column could not hold, side by side at 1:1, with the check ruler again:
// a page printed on its own must be checked on its own.
function StripPage({ c, columns, size, style, unit }: { c: SheetContent; columns: StripColumn[]; size: PageSize; style: PageProps['style']; unit: Unit }) {
  return (
    <Page size={size} style={[style, { height: PAGE_PT[size].height, minHeight: PAGE_PT[size].height }].flat() as PageProps['style']} wrap={false}>
      <Text style={s.kicker}>{`${c.t('sheet.continued')}      ${c.unitNote}`}</Text>
      <Text style={[s.meta, { marginBottom: 4 }]}>{[c.title, ...c.meta.slice(0, 2)].join('   ·   ')}</Text>
      <View style={{ width: GUIDE_COLUMN }}>
        <ChalkGuide columns={[]} notes={c.guideNote.slice(0, 2)} unit={unit} t={c.t} />
      </View>
      <StripRow columns={columns} width={108} gap={16} t={c.t} />
    </Page>
  );
}

/**
 * A sheet's page from an unwrapped layout, as the same page wrapped stands before react-pdf splits
 * it: the two differ only in `wrap` and the min-height CutSheetPage gives an unwrapped page (its
 * height is the paper's either way), and min-height reaches nothing on a page taller than it.
 */
export function asWrapped(page: SafePageNode): SafePageNode {
  const { minHeight: _minHeight, ...style } = page.style as Record<string, unknown>;
  return { ...page, style: style as SafePageNode['style'], props: { ...page.props, wrap: true } };
}

/** One page for one garment: header, legs with drawings, bench steps, cautions and chalk guide; a strip too long for the column goes on over a second page. */
export function CutSheetPage({ data, wrap, family = FAMILY }: { data: CutSheetData; wrap: boolean; family?: string | string[] }) {
  const size = data.pageSize ?? 'LETTER';
  const { c, strips } = workedOut(data);
  const page = PAGE_PT[size];
  const mainWidth = page.width - 2 * PADDING - GUIDE_COLUMN;
  // Only a sheet with text Inter cannot set names a font stack; the usual sheet keeps s.page as it is.
  const style = family === FAMILY ? s.page : [s.page, { fontFamily: family }];
  // Unwrapped, react-pdf lays the page out once instead of twice, but the page then grows with
  // its content; the height keeps it at paper size when it fits (render.ts checks that it did).
  return (
    <>
      <Page size={size} style={wrap ? style : [style, { height: page.height, minHeight: page.height }].flat()} wrap={wrap}>
        <Header c={c} link={data.link} />
        <View style={s.body}>
          <View style={[s.main, { width: mainWidth }]}>
            {c.kind && <KindBlock content={c.kind} width={mainWidth - MAIN_GUTTER} t={c.t} />}
            {c.groups.map((g, i) => (
              <LegBlock key={i} g={g} width={mainWidth - MAIN_GUTTER} t={c.t} />
            ))}
            <Steps c={c} />
          </View>
          <View style={[s.side, { width: GUIDE_COLUMN }]}>
            <ChalkGuide columns={strips.column} notes={c.guideNote} unit={data.unit} t={c.t} />
          </View>
        </View>
      </Page>
      {strips.page.length > 0 && <StripPage c={c} columns={strips.page} size={size} style={style} unit={data.unit} />}
    </>
  );
}

// The PDF's title in the first sheet's language.
function documentTitle(sheets: CutSheetData[]): string {
  const first = sheets[0];
  const t = translator(first?.language ?? 'en');
  return first && sheets.length === 1 ? t('sheet.titleOf', { ticket: first.ticket ?? t('sheet.unsaved') }) : t('sheet.titles');
}

/** A document of cut sheets, one page each; wrap (for all, or per sheet) lets an overfull sheet spill onto a second page; skipped garments get a last page; family from typeset(). */
export function cutSheetDocument(
  sheets: CutSheetData[],
  wrap: boolean | boolean[] = true,
  skipped: string[] = [],
  family: string | string[] = FAMILY,
): ReactElement<DocumentProps> {
  const first = sheets[0];
  return (
    <Document title={documentTitle(sheets)} creator="Cuffwright" producer="Cuffwright">
      {sheets.map((d, i) => (
        <CutSheetPage key={i} data={d} wrap={Array.isArray(wrap) ? (wrap[i] ?? true) : wrap} family={family} />
      ))}
      {skipped.length > 0 && <SkippedNote skipped={skipped} size={first?.pageSize ?? 'LETTER'} family={family} t={translator(first?.language ?? 'en')} />}
    </Document>
  );
}
