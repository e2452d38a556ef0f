// A jacket's or coat's sleeves on a cut sheet (react-pdf): where to chalk from the present edge, the
// cut in cut red, the buttons' moves, the vent and the lining, the bench steps and cautions, and the
// 1:1 strip. Plain data in; the words and figures come from sleeve-content.ts.
import { Document, Page, Text, View, type DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { renderPdf } from '../render-pdf';
import { ChalkGuide, COLUMN_STRIPS, StripRow, stripColumns } from './ChalkGuide';
import { guideStrips } from './chalk-guide';
import { Header, PAGE_PT, Steps } from './CutSheet';
import { FAMILY, typeset } from './fonts';
import { type SleeveContent, type SleeveSheetData, sleeveSheetContent } from './sleeve-content';
import { GUIDE_COLUMN, INK, s } from './styles';

const PADDING = 28;
// Header, check ruler, its notes and the strip's captions: what the strip cannot use (as the trouser sheet's).
const GUIDE_OVERHEAD = 300;
const COLUMN_GAP = 8;

function ChalkTable({ c }: { c: SleeveContent }) {
  return (
    <>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{c.t('sleeve.col.line')}</Text>
        <Text style={[s.th, { width: 150, paddingLeft: COLUMN_GAP, textAlign: 'right' }]}>{c.fromHeading}</Text>
      </View>
      {c.lines.map((l, i) => {
        const ink = l.cut ? { color: INK.cut, fontWeight: 800 as const } : {};
        return (
          <View
            key={i}
            style={[
              { flexDirection: 'row', alignItems: 'flex-end', paddingVertical: 1.5 },
              l.cut ? { borderWidth: 2, borderColor: INK.cut, paddingHorizontal: 4 } : { borderBottomWidth: 0.5, borderBottomColor: INK.rule },
            ]}
          >
            <Text style={[s.lineName, ink, { flexGrow: 1, flexShrink: 1 }]}>
              <Text style={s.lineNo}>{l.n > 0 ? `${l.n} ` : '▶ '}</Text>
              {l.cut ? `${c.t('sheet.cutBadge')} · ${l.name}` : l.name}
            </Text>
            <Text style={[l.cut ? s.cutValue : s.value, { width: 150, paddingLeft: COLUMN_GAP, textAlign: 'right', flexShrink: 0 }]}>{l.fromEdge}</Text>
          </View>
        );
      })}
    </>
  );
}

function ButtonsTable({ c }: { c: SleeveContent }) {
  const b = c.buttons;
  if (!b) return null;
  const col = { width: 56, paddingLeft: COLUMN_GAP, textAlign: 'right' as const, flexShrink: 0 };
  const wide = { ...col, width: 84 };
  return (
    <View style={{ marginTop: 6 }} wrap={false}>
      <Text style={s.h2}>{b.heading}</Text>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{c.t('sleeve.buttons.col.button')}</Text>
        <Text style={[s.th, col]}>{c.t('sleeve.buttons.col.now')}</Text>
        <Text style={[s.th, col]}>{c.t('sleeve.buttons.col.move')}</Text>
        <Text style={[s.th, wide]}>{c.t('sleeve.buttons.col.newCentre')}</Text>
        <Text style={[s.th, { ...wide, width: 96 }]}>{c.t('sleeve.buttons.col.after')}</Text>
      </View>
      {b.rows.map((r) => (
        <View key={r.n} style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.5, borderBottomColor: INK.rule, paddingVertical: 1 }}>
          <Text style={[s.lineName, { flexGrow: 1, flexShrink: 1 }]}>
            <Text style={s.lineNo}>{r.line === null ? '' : `${r.line} `}</Text>
            {r.name}
          </Text>
          <Text style={[s.small, s.strong, col]}>{r.now}</Text>
          <Text style={[s.small, s.strong, col]}>{`+ ${r.move}`}</Text>
          <Text style={[s.value, wide, { fontSize: 12 }]}>{r.newCentre}</Text>
          <Text style={[s.small, s.strong, { ...wide, width: 96 }]}>{r.after}</Text>
        </View>
      ))}
      <Text style={[s.small, { marginTop: 2 }]}>{b.sum}</Text>
    </View>
  );
}

/** The sleeves' block: title, the chalk lines and cut, the sum, the buttons, vent, lining and the checks. */
function SleeveBlock({ c }: { c: SleeveContent }) {
  return (
    <View style={{ marginBottom: 4 }}>
      {/* The title goes under the label when the two do not fit on one line. */}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', marginBottom: 2 }} wrap={false}>
        <Text style={[s.legLabel, { marginRight: 8 }]}>{c.label.toUpperCase()}</Text>
        <Text style={s.legTitle}>{c.heading}</Text>
      </View>
      <View wrap={false}>
        <ChalkTable c={c} />
        <Text style={[s.small, s.strong, { marginTop: 4 }]}>{c.sum}</Text>
      </View>
      <ButtonsTable c={c} />
      {c.vent.length > 0 && <Text style={[s.small, { marginTop: 3 }]}>{c.vent.join(' ')}</Text>}
      <Text style={[s.small, s.strong, { marginTop: 3 }]}>{c.lining}</Text>
      {c.recorded && <Text style={[s.small, { marginTop: 2 }]}>{c.recorded}</Text>}
      {c.notes.map((n, i) => (
        <Text key={i} style={[s.small, { marginTop: 2, color: INK.warn, fontWeight: 700 }]}>
          {c.t('sheet.check', { text: n })}
        </Text>
      ))}
    </View>
  );
}

/** The strip columns of a sleeve sheet: those the guide column holds, and the rest for a page of strip. */
export function sleeveStripColumns(data: SleeveSheetData, c: SleeveContent = sleeveSheetContent(data)) {
  const page = PAGE_PT[data.pageSize ?? 'LETTER'];
  const all = stripColumns(guideStrips([c.strip], data.plan.unit, page.height - 2 * PADDING - GUIDE_OVERHEAD));
  return { column: all.slice(0, COLUMN_STRIPS), page: all.slice(COLUMN_STRIPS) };
}

/** One garment's sleeve sheet: a page (a second when the strip goes on), set in `family`. */
export function SleeveSheetPage({ data, family = FAMILY }: { data: SleeveSheetData; family?: string | string[] }) {
  const size = data.pageSize ?? 'LETTER';
  const c = sleeveSheetContent(data);
  const strips = sleeveStripColumns(data, c);
  const mainWidth = PAGE_PT[size].width - 2 * PADDING - GUIDE_COLUMN;
  const style = family === FAMILY ? s.page : [s.page, { fontFamily: family }];
  return (
    <>
      <Page size={size} style={style}>
        <Header c={c} link={data.link} kickerNote={c.kickerNote} />
        <View style={s.body}>
          <View style={[s.main, { width: mainWidth }]}>
            <SleeveBlock c={c} />
            <Steps c={c} />
          </View>
          <View style={[s.side, { width: GUIDE_COLUMN }]} wrap={false}>
            <ChalkGuide columns={strips.column} notes={c.guideNote} unit={data.plan.unit} t={c.t} />
          </View>
        </View>
      </Page>
      {strips.page.length > 0 && (
        // The rest of the strip side by side at 1:1, with the check ruler again: a page printed on its own is checked on its own.
        <Page size={size} style={style} wrap={false}>
          <Text style={s.kicker}>{`${c.t('sheet.continued')}      ${c.unitNote}`}</Text>
          <Text style={[s.meta, { marginBottom: 4 }]}>{[c.title, ...c.meta.slice(0, 2)].join('   ·   ')}</Text>
          <View style={{ width: GUIDE_COLUMN }}>
            <ChalkGuide columns={[]} notes={c.guideNote.slice(0, 2)} unit={data.plan.unit} t={c.t} />
          </View>
          <StripRow columns={strips.page} width={108} gap={16} t={c.t} />
        </Page>
      )}
    </>
  );
}

/** A document of one sleeve sheet; family from typeset(). */
export function sleeveSheetDocument(data: SleeveSheetData, family: string | string[] = FAMILY): ReactElement<DocumentProps> {
  const c = sleeveSheetContent(data);
  return (
    <Document title={c.t('sheet.titleOf', { ticket: data.ticket ?? c.t('sheet.unsaved') })} creator="Cuffwright" producer="Cuffwright">
      <SleeveSheetPage data={data} family={family} />
    </Document>
  );
}

/** Renders one garment's sleeve sheet to PDF bytes (names in any script: typeset picks the faces). */
export async function renderSleeveSheet(data: SleeveSheetData): Promise<Uint8Array<ArrayBuffer>> {
  const { family, print } = await typeset(data);
  return new Uint8Array(await renderPdf(sleeveSheetDocument(print(data), family)));
}
