// A jacket's or coat's sleeves on the sheet: the chalk lines from the present edge with the cut in
// cut red, the sum, the buttons' moves, the vent and the lining, and the engine's checks. The words and
// figures come from sleeve-sheet.ts; the page frame (header, steps, cautions, strip) is the sheet's.
import { Text, View } from '@react-pdf/renderer';
import type { Translate } from '../../i18n/catalog';
import { INK, s } from '../styles';
import type { KindSheetContent } from './kind-sheet';
import type { SleeveBlockWords } from './sleeve-sheet';

const COLUMN_GAP = 8;

function ChalkTable({ c, t }: { c: SleeveBlockWords; t: Translate }) {
  return (
    <>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{t('sleeve.col.line')}</Text>
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
              {l.cut ? `${t('sheet.cutBadge')} · ${l.name}` : l.name}
            </Text>
            <Text style={[l.cut ? s.cutValue : s.value, { width: 150, paddingLeft: COLUMN_GAP, textAlign: 'right', flexShrink: 0 }]}>{l.fromEdge}</Text>
          </View>
        );
      })}
    </>
  );
}

function ButtonsTable({ c, t }: { c: SleeveBlockWords; t: Translate }) {
  const b = c.buttons;
  if (!b) return null;
  const col = { width: 56, paddingLeft: COLUMN_GAP, textAlign: 'right' as const, flexShrink: 0 };
  const wide = { ...col, width: 84 };
  return (
    <View style={{ marginTop: 6 }} wrap={false}>
      <Text style={s.h2}>{b.heading}</Text>
      <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
        <Text style={[s.th, { flexGrow: 1, flexShrink: 1 }]}>{t('sleeve.buttons.col.button')}</Text>
        <Text style={[s.th, col]}>{t('sleeve.buttons.col.now')}</Text>
        <Text style={[s.th, col]}>{t('sleeve.buttons.col.move')}</Text>
        <Text style={[s.th, wide]}>{t('sleeve.buttons.col.newCentre')}</Text>
        <Text style={[s.th, { ...wide, width: 96 }]}>{t('sleeve.buttons.col.after')}</Text>
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
export function SleeveBlock({ content, t }: { content: KindSheetContent; width: number; t: Translate }) {
  const c = content.block as SleeveBlockWords;
  return (
    <View style={{ marginBottom: 4 }}>
      {/* The title goes under the label when the two do not fit on one line. */}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', marginBottom: 2 }} wrap={false}>
        <Text style={[s.legLabel, { marginRight: 8 }]}>{c.label.toUpperCase()}</Text>
        <Text style={s.legTitle}>{c.heading}</Text>
      </View>
      <View wrap={false}>
        <ChalkTable c={c} t={t} />
        <Text style={[s.small, s.strong, { marginTop: 4 }]}>{c.sum}</Text>
      </View>
      <ButtonsTable c={c} t={t} />
      {c.vent.length > 0 && <Text style={[s.small, { marginTop: 3 }]}>{c.vent.join(' ')}</Text>}
      <Text style={[s.small, s.strong, { marginTop: 3 }]}>{c.lining}</Text>
      {c.notes.map((n, i) => (
        <Text key={i} style={[s.small, { marginTop: 2, color: INK.warn, fontWeight: 700 }]}>
          {t('sheet.check', { text: n })}
        </Text>
      ))}
    </View>
  );
}
