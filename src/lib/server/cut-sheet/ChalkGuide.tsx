// The full-size chalk guide: the check ruler, how to read it, and the strip(s) at 1:1.
import { Path, Rect, Svg, Text, View } from '@react-pdf/renderer';
import type { Unit } from '@/lib/allowance/types';
import { checkRuler, type GuideSegment, type GuideStrip, type MatchMark } from './chalk-guide';
import { translator, type Translate } from '../i18n/catalog';
import { INK, READ_MIN, s } from './styles';

const EN = translator('en');

// Room left and right of the ruler's 0 and last tick for their numbers.
const RULER_SIDE = 4;
const RULER_H = 26;

/** The printer check: a short length of tape measure at 1:1, ticks hanging from its edge, numbered below. */
function CheckRulerStrip({ unit }: { unit: Unit }) {
  const r = checkRuler(unit);
  const width = r.length + 2 * RULER_SIDE;
  const ticks = r.ticks.map((t) => `M${(t.x + RULER_SIDE).toFixed(3)} 0v${t.len}`).join('');
  return (
    <View style={{ width, height: RULER_H, position: 'relative' }}>
      <Svg width={width} height={RULER_H}>
        <Rect x={0} y={0} width={width} height={RULER_H} fill={INK.fill} />
        <Path d={`M0 0.3h${width}`} stroke={INK.text} strokeWidth={0.6} />
        <Path d={ticks} stroke={INK.text} strokeWidth={0.6} />
      </Svg>
      {r.ticks
        .filter((t) => t.label !== null)
        .map((t, i) => (
          <Text
            key={i}
            style={{ position: 'absolute', left: t.x + RULER_SIDE - 10, top: 13, width: 20, textAlign: 'center', fontSize: READ_MIN, fontWeight: 700 }}
          >
            {t.label}
          </Text>
        ))}
    </View>
  );
}

/** One column of the chalk guide: a segment of a strip, with its strip's label. */
export interface StripColumn {
  label: string;
  /** where the strip's top is laid, when not on the pin mark */
  top?: string;
  part: number;
  segment: GuideSegment;
}

/** The strips' segments in print order: each strip's segments one after another. */
export function stripColumns(strips: GuideStrip[]): StripColumn[] {
  // Part by part: with two legs, both first parts stand in the guide column and the rest go on.
  const all = strips.flatMap((st, k) => st.segments.map((segment, i) => ({ label: st.label, ...(st.top ? { top: st.top } : {}), part: i + 1, segment, k })));
  return all.sort((a, b) => a.part - b.part || a.k - b.k).map(({ k: _k, ...c }) => c);
}

function matchText(m: MatchMark, t: Translate) {
  return t('sheet.guide.match', { letter: m.letter });
}

function Strip({ column, width, t }: { column: StripColumn; width: number; t: Translate }) {
  const seg = column.segment;
  const rulerPath = seg.ruler.map((m) => `M0 ${m.y.toFixed(3)}h${m.len}`).join('');
  // Every tick of a colour in one filled path: fewer nodes to lay out and draw than a Rect each.
  const bar = (cut: boolean) =>
    seg.ticks
      .filter((t) => t.cut === cut)
      .map((t) => `M0 ${Math.max(0, t.y - (cut ? 1 : 0.5)).toFixed(3)}h${width}v${cut ? 2 : 1}h${-width}z`)
      .join('');
  const plain = bar(false);
  const cut = bar(true);
  const matches = [seg.matchAbove, seg.matchBelow].filter((m): m is MatchMark => m !== null);
  const matchPath = matches.map((m) => `M0 ${m.y.toFixed(3)}h${width}`).join('');
  const textLeft = 12;
  const size = READ_MIN;
  const first = column.part === 1;
  return (
    <View style={{ width }}>
      <Text style={{ fontSize: READ_MIN, fontWeight: 800, marginBottom: 1 }}>{first ? column.label : `${column.label.split(',')[0]}, ${column.part}`}</Text>
      <Text style={{ fontSize: READ_MIN, color: INK.soft, marginBottom: 1 }}>
        {first ? (column.top ?? t('sheet.guide.top')) : t('sheet.guide.onMatch', { letter: seg.matchAbove!.letter })}
      </Text>
      <View style={{ width, height: seg.length, position: 'relative' }}>
        <Svg width={width} height={seg.length}>
          <Rect x={0.25} y={0} width={width - 0.5} height={seg.length} fill="none" stroke={INK.soft} strokeWidth={0.5} strokeDasharray="3 2" />
          <Path d={rulerPath} stroke={INK.soft} strokeWidth={0.4} />
          {matchPath && <Path d={matchPath} stroke={INK.text} strokeWidth={1} strokeDasharray="4 2" />}
          {plain && <Path d={plain} fill={INK.text} />}
          {cut && <Path d={cut} fill={INK.cut} />}
        </Svg>
        {matches.map((m, i) => (
          <Text key={`m${i}`} style={{ position: 'absolute', left: textLeft, top: m.y - 13, fontSize: size, fontWeight: 700 }}>
            {matchText(m, t)}
          </Text>
        ))}
        {seg.ticks.map((t, i) => (
          <View
            key={i}
            style={{ position: 'absolute', left: textLeft, top: t.labelY, width: width - textLeft - 1, ...(t.crossed ? { backgroundColor: '#ffffff' } : {}) }}
          >
            <Text style={{ fontSize: size, fontWeight: 800, color: t.cut ? INK.cut : INK.text }}>{t.n > 0 ? `${t.n} ${t.name}` : `▶ ${t.name}`}</Text>
            <Text style={{ fontSize: size, fontWeight: 700, color: t.cut ? INK.cut : INK.text }}>{t.text}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

/** Columns side by side: two fit the guide column, more a page of their own. */
export function StripRow({ columns, width, gap, t = EN }: { columns: StripColumn[]; width: number; gap?: number; t?: Translate }) {
  return (
    <View style={{ flexDirection: 'row', justifyContent: gap === undefined ? 'space-between' : 'flex-start', marginTop: 8 }}>
      {columns.map((c, i) => (
        <View key={i} style={{ marginLeft: i > 0 && gap !== undefined ? gap : 0 }}>
          <Strip column={c} width={width} t={t} />
        </View>
      ))}
    </View>
  );
}

/** How many strip columns the guide column holds side by side. */
export const COLUMN_STRIPS = 2;

/** The right-hand column: the ruler to check the printer, then the strip(s), as many as it holds. */
export function ChalkGuide({ columns, notes, unit, t = EN }: { columns: StripColumn[]; notes: string[]; unit: Unit; t?: Translate }) {
  const width = columns.length > 1 ? 72 : 108;
  return (
    <>
      <Text style={s.h2}>{t('sheet.guide.heading')}</Text>
      <CheckRulerStrip unit={unit} />
      {notes.map((n, i) => (
        <Text key={i} style={{ fontSize: READ_MIN, marginTop: 2, fontWeight: i < 2 ? 700 : 400 }}>
          {n}
        </Text>
      ))}
      <StripRow columns={columns.slice(0, COLUMN_STRIPS)} width={width} t={t} />
    </>
  );
}
