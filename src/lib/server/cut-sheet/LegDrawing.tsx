// The leg bottom seen flat, to scale, with its chalk lines numbered as in the table beside it.
import { Path, Polygon, Line, Svg, Text, View } from '@react-pdf/renderer';
import type { LegGeometry } from './leg-geometry';
import { INK } from './styles';

// The line numbers beside the drawing are read at the bench: 9 pt like every other word there.
const LABEL_SIZE = 9;
// Room leg-geometry leaves under the drawing for its caption.
const FOOT = 14;

const pts = (p: [number, number][]) => p.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(' ');

/** Draws a leg geometry: outline, cut-away strip, chalk lines, seam lines, labels and scale. */
export function LegDrawing({ g }: { g: LegGeometry }) {
  const [tl, bl, br, tr] = g.outline;
  const labelX = Math.max(tr![0], br![0]) + 4;
  // A wavy break at the top says the leg carries on upwards.
  const breakPath = `M${tl![0]} ${tl![1]} Q ${(tl![0] + tr![0]) / 4} ${tl![1] - 3} ${(tl![0] + tr![0]) / 2} ${tl![1]} T ${tr![0]} ${tr![1]}`;
  // Lines that share a stroke go in one path each: fewer nodes to lay out and draw.
  const across = (cut: boolean) =>
    g.lines
      .filter((l) => l.cut === cut)
      .map((l) => `M${tl![0] - 3} ${l.y}H${labelX - 2}`)
      .join('');
  const chalk = across(false);
  const cutLine = across(true);
  const seams = g.seams.map((sm) => `M${sm.x1} ${sm.y1}L${sm.x2} ${sm.y2}`).join('');
  // Lines closer than a label is tall (a shallow cuff drawn small) get their labels spread
  // downwards, each joined to its line by a short leader, so no two labels run together.
  const tops: number[] = [];
  for (const l of g.lines) tops.push(Math.max(l.y - LABEL_SIZE * 0.7, (tops.at(-1) ?? -Infinity) + LABEL_SIZE * 1.25));
  const leaders = g.lines
    .map((l, i) => (tops[i]! > l.y - LABEL_SIZE * 0.7 + 0.01 ? `M${labelX - 2} ${l.y}L${labelX + 1} ${tops[i]! + LABEL_SIZE * 0.7}` : ''))
    .join('');
  return (
    <View style={{ width: g.width, flexShrink: 0 }}>
      <View style={{ width: g.width, height: Math.max(g.height - FOOT, (tops.at(-1) ?? 0) + LABEL_SIZE * 1.25), position: 'relative' }}>
        <Svg width={g.width} height={g.height}>
          <Polygon points={pts(g.outline)} fill={INK.fill} stroke="none" />
          {g.cutAway.length > 0 && <Polygon points={pts(g.cutAway)} fill="#d9d6cf" stroke="none" />}
          <Path d={`M${tl![0]} ${tl![1]} L${bl![0]} ${bl![1]} M${tr![0]} ${tr![1]} L${br![0]} ${br![1]}`} stroke={INK.text} strokeWidth={1} />
          <Path d={breakPath} stroke={INK.soft} strokeWidth={0.6} fill="none" />
          <Line x1={bl![0]} y1={bl![1]} x2={br![0]} y2={br![1]} stroke={INK.soft} strokeWidth={0.8} strokeDasharray={g.rawEdgeKnown ? undefined : '2 2'} />
          {seams && <Path d={seams} stroke={INK.text} strokeWidth={0.8} strokeDasharray="3 2" fill="none" />}
          {chalk && <Path d={chalk} stroke={INK.text} strokeWidth={0.9} fill="none" />}
          {cutLine && <Path d={cutLine} stroke={INK.cut} strokeWidth={2.2} strokeDasharray="5 2" fill="none" />}
          {leaders && <Path d={leaders} stroke={INK.soft} strokeWidth={0.5} fill="none" />}
        </Svg>
        {g.lines.map((l, i) => (
          <Text
            key={i}
            style={{ position: 'absolute', left: labelX + 2, top: tops[i], fontSize: LABEL_SIZE, fontWeight: 800, color: l.cut ? INK.cut : INK.text }}
          >
            {l.label}
          </Text>
        ))}
      </View>
      {/* Below the labels, in the flow: a label spread downwards never runs into it. */}
      <Text style={{ fontSize: LABEL_SIZE, color: INK.soft }}>{g.caption}</Text>
    </View>
  );
}
