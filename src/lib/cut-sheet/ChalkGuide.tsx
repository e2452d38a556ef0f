// The full-size chalk guide: calibration squares, how to check them, and the strip(s) at 1:1.
import { Path, Rect, Svg, Text, View } from '@react-pdf/renderer';
import { INCH_PT, MM25_PT, type GuideStrip } from './chalk-guide';
import { INK, READ_MIN, s } from './styles';

/** Grey of the calibration squares: distinct from every other fill so a test can find them. */
export const SQUARE_GREY = '#a0a0a0';

function Square({ side, label }: { side: number; label: string }) {
  return (
    <View style={{ alignItems: 'center' }}>
      <View style={{ width: side, height: side, backgroundColor: SQUARE_GREY }} />
      <Text style={{ fontSize: READ_MIN, fontWeight: 800, marginTop: 2 }}>{label}</Text>
    </View>
  );
}

function Strip({ strip, width }: { strip: GuideStrip; width: number }) {
  const rulerPath = strip.ruler.map((m) => `M0 ${m.y.toFixed(3)}h${m.len}`).join('');
  // Every tick of a colour in one filled path: fewer nodes to lay out and draw than a Rect each.
  const bar = (cut: boolean) =>
    strip.ticks
      .filter((t) => t.cut === cut)
      .map((t) => `M0 ${Math.max(0, t.y - (cut ? 1 : 0.5)).toFixed(3)}h${width}v${cut ? 2 : 1}h${-width}z`)
      .join('');
  const plain = bar(false);
  const cut = bar(true);
  const textLeft = 12;
  const size = READ_MIN;
  return (
    <View style={{ width }}>
      <Text style={{ fontSize: READ_MIN, fontWeight: 800, marginBottom: 1 }}>{strip.label}</Text>
      <Text style={{ fontSize: READ_MIN, color: INK.soft, marginBottom: 1 }}>▼ top on the pin mark</Text>
      <View style={{ width, height: strip.length, position: 'relative' }}>
        <Svg width={width} height={strip.length}>
          <Rect x={0.25} y={0} width={width - 0.5} height={strip.length} fill="none" stroke={INK.soft} strokeWidth={0.5} strokeDasharray="3 2" />
          <Path d={rulerPath} stroke={INK.soft} strokeWidth={0.4} />
          {plain && <Path d={plain} fill={INK.text} />}
          {cut && <Path d={cut} fill={INK.cut} />}
        </Svg>
        {strip.ticks.map((t, i) => (
          <View key={i} style={{ position: 'absolute', left: textLeft, top: t.y + 2, width: width - textLeft - 1 }}>
            <Text style={{ fontSize: size, fontWeight: 800, color: t.cut ? INK.cut : INK.text }}>{`${t.n} ${t.name}`}</Text>
            <Text style={{ fontSize: size, fontWeight: 700, color: t.cut ? INK.cut : INK.text }}>{t.text}</Text>
          </View>
        ))}
      </View>
      {strip.beyond.length > 0 && (
        <Text style={{ fontSize: READ_MIN, fontWeight: 700, color: INK.cut, marginTop: 2 }}>
          {`Past the paper: ${strip.beyond.map((t) => `${t.n} ${t.name} at ${t.text}`).join(', ')}. Measure it.`}
        </Text>
      )}
    </View>
  );
}

/** The right-hand column: squares to check the print, then the strip(s). */
export function ChalkGuide({ strips, notes }: { strips: GuideStrip[]; notes: string[] }) {
  const width = strips.length > 1 ? 72 : 108;
  return (
    <>
      <Text style={s.h2}>CHALK GUIDE 1:1</Text>
      <View style={{ flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end' }}>
        <Square side={INCH_PT} label="1 in" />
        <Square side={MM25_PT} label="25 mm" />
      </View>
      {notes.map((n, i) => (
        <Text key={i} style={{ fontSize: READ_MIN, marginTop: 2, fontWeight: i < 2 ? 700 : 400 }}>
          {n}
        </Text>
      ))}
      <View style={{ flexDirection: 'row', justifyContent: 'space-between', marginTop: 8 }}>
        {strips.map((st, i) => (
          <Strip key={i} strip={st} width={width} />
        ))}
      </View>
    </>
  );
}
