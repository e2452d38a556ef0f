import type { HemPlan } from '@/lib/allowance/types';
import { Labels } from './DrawingLabels';
import { FlatAndSection, SectionPath } from './FlatAndSection';
import { LAYER_GAP as G, SECTION_X as xL, flatLines, sectionScale, turnUnder } from './section-drawing';

/** The plain hem to scale at the back of the leg: flat with its two lines, and finished in section. */
export function HemDrawing({ plan }: { plan: HemPlan }) {
  const A = plan.hemAllowance.mm;
  const T = Math.min(plan.turnUnder.mm, A);
  const cutMm = Math.max(...plan.lines.map((l) => l.belowMark.mm));
  // The raw edge below the mark (the finished edge may sit below it: unwashed cloth left long).
  const edgeMm = plan.lines[0]?.belowMark.mm ?? 0;
  const rawMm = plan.lines[0]?.aboveRawEdge ? plan.lines[0].aboveRawEdge.mm + edgeMm : null;
  const aboveMm = A + 16;
  const { s, yMark, H, up } = sectionScale(aboveMm, cutMm, rawMm, 360);
  const [xh, xt] = [xL - 2 * G, xL - G];
  // The fold at the finished edge: at the mark, or below it on unwashed cloth left long.
  const yEdge = yMark + edgeMm * s;
  const yIn = yEdge - (A - T) * s;
  const turn = turnUnder(xt, yIn, T * s, 2);
  const section = [`M${xL},${up(aboveMm - 6)} V${yEdge - G}`, `A${G},${G} 0 0 1 ${xh},${yEdge - G}`, turn.path].join(' ');
  return (
    <FlatAndSection
      id="hem"
      title={
        `The plain hem drawn to scale at the back of the leg: cut ${plan.lines.find((l) => l.name === 'cut')?.belowMark.text} below the pin mark, ` +
        'fold up at the finished edge, turn under the raw edge.'
      }
      unit={plan.unit}
      lines={flatLines(plan.lines)}
      rawMm={rawMm}
      aboveMm={aboveMm - 6}
      bands={[
        { from: -(aboveMm - 6), to: edgeMm, text: 'leg' },
        { from: edgeMm, to: Math.min(cutMm, rawMm ?? cutMm), text: 'hem allowance', accent: true },
      ]}
      s={s}
      yMark={yMark}
      H={H}
    >
      <SectionPath d={section} />
      <Labels
        x={xL + 36}
        anchor="start"
        labels={[
          { y: up(aboveMm - 10), to: [xL + 3, up(aboveMm - 10) - 5], text: 'leg, outside' },
          { y: yEdge + 24, to: [xL + 2, yEdge - 4], text: 'finished edge', n: [1] },
        ]}
      />
      <Labels x={xh - 40} anchor="end" labels={[...turn.labels, { y: (yIn + yEdge) / 2 + 14, to: [xh - 3, (yIn + yEdge) / 2 + 9], text: 'hem allowance' }]} />
    </FlatAndSection>
  );
}
