// A skirt's or dress's block on the sheet: the figures with their sums written out, the cloth kept
// below the new hem line in cut red, the table of places round the hem, and the engine's notes.
import { Text, View } from '@react-pdf/renderer';
import type { Translate } from '../../i18n/catalog';
import { INK, READ_MIN, s } from '../styles';
import type { KindSheetContent } from './kind-sheet';
import type { SkirtBlockWords } from './skirt-sheet';

const COLS = ['pin', 'newLine', 'cut', 'cloth', 'spare'] as const;

/** The skirt's block, in the main column's width. */
export function SkirtBlock({ content, width, t }: { content: KindSheetContent; width: number; t: Translate }) {
  const b = content.block as SkirtBlockWords;
  const place = Math.min(92, Math.max(70, width * 0.22));
  const col = (width - place) / COLS.length;
  const cell = { width: col, textAlign: 'right' as const, flexShrink: 0, paddingLeft: 4 };
  return (
    <View style={{ marginBottom: 4 }} wrap={false}>
      <View style={{ flexDirection: 'row', alignItems: 'baseline', marginBottom: 2 }}>
        <Text style={s.legTitle}>{b.title}</Text>
      </View>
      {b.figures.map((f, i) => (
        <Text key={i} style={[s.small, { marginTop: 1 }]}>
          {f}
        </Text>
      ))}
      <View style={{ borderWidth: 2, borderColor: INK.cut, marginTop: 4, paddingHorizontal: 6, paddingVertical: 3 }}>
        <Text style={[s.cutCaption, { fontSize: 11 }]}>{b.keep}</Text>
      </View>
      {b.level && <Text style={[s.small, s.strong, { marginTop: 4 }]}>{b.level}</Text>}
      {b.points.length > 0 && (
        <View style={{ marginTop: 3 }}>
          <View style={{ flexDirection: 'row', alignItems: 'flex-end', borderBottomWidth: 0.75, borderBottomColor: INK.text, paddingBottom: 1 }}>
            <Text style={[s.th, { width: place, flexShrink: 0 }]}>{t('skirtSheet.col.place')}</Text>
            {COLS.map((c) => (
              <Text key={c} style={[s.th, cell, c === 'cut' ? { color: INK.cut } : {}]}>
                {t(`skirtSheet.col.${c}`)}
              </Text>
            ))}
          </View>
          {b.points.map((r) => (
            <View key={r.place} style={{ flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: INK.rule, paddingVertical: 1.5 }}>
              <Text style={[s.lineName, { width: place, flexShrink: 0 }]}>{r.place}</Text>
              {COLS.map((c) => (
                <Text
                  key={c}
                  style={[
                    { fontSize: 10.5, fontWeight: 700 },
                    cell,
                    c === 'cut' ? { color: INK.cut, fontWeight: 800 } : {},
                    c === 'spare' && r.short ? { color: INK.cut, fontWeight: 800 } : {},
                  ]}
                >
                  {r[c]}
                </Text>
              ))}
            </View>
          ))}
          <Text style={{ fontSize: READ_MIN, color: INK.soft, marginTop: 1 }}>{t('skirtSheet.col.key')}</Text>
        </View>
      )}
      {b.notes.map((n, i) => (
        <Text key={i} style={[s.small, { marginTop: 2, color: INK.warn, fontWeight: 700 }]}>
          {t('sheet.check', { text: n })}
        </Text>
      ))}
    </View>
  );
}
