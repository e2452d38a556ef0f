import type { CuffPlan } from '@/lib/allowance/types';
import { Labels } from './DrawingLabels';
import { FlatAndSection, SectionPath } from './FlatAndSection';
import { LINE_NAMES } from './line-names';
import { LAYER_GAP as G, SECTION_X as xL, flatLines, sectionScale, turnUnder } from './section-drawing';

/** The cuff to scale: the flat cloth with its four chalk lines, and beside it the finished cuff in section. */
export function FoldDrawing({ plan }: { plan: CuffPlan }) {
  const D = plan.cuffDepth.mm;
  const S = plan.hemSection.mm;
  const T = Math.min(plan.turnUnder.mm, S);
  const at = (name: string) => plan.lines.find((l) => l.name === name)?.belowMark.mm ?? 0;
  const cutMm = at('cut');
  const rawMm = plan.lines[0]?.aboveRawEdge?.mm ?? null;
  const aboveMm = Math.max(D, S) + 16;
  const { s, yMark, H, up } = sectionScale(aboveMm, cutMm, rawMm, 480);

  const [x3, xt, x1, x2] = [xL - 2 * G, xL - G, xL + G, xL + 2 * G];
  const yFold = yMark - 2 * G;
  const yTop = up(D);
  const yInside = up(S - T);
  const r = G / 2;
  const turn = turnUnder(xt, yInside, T * s, 4);
  const leg = `M${xL},${up(aboveMm - 6)} V${yFold} A${r},${r} 0 0 0 ${x1},${yFold} V${yTop + r}`;
  const face = `M${x1},${yTop + r} A${r},${r} 0 0 1 ${x2},${yTop + r} V${yFold}`;
  const inside = `M${x2},${yFold} A${2 * G},${2 * G} 0 0 1 ${x3},${yFold} ${turn.path}`;

  return (
    <FlatAndSection
      id="fold"
      title="The cuff drawn to scale"
      desc={
        `Left, the cloth flat below the pin mark with chalk lines at ${plan.lines.map((l) => `${LINE_NAMES[l.name]} ${l.belowMark.text}`).join(', ')}. ` +
        'Right, the finished cuff in section: the leg, section 1 behind the cuff face, the inside section with its turn-under.'
      }
      unit={plan.unit}
      lines={flatLines(plan.lines)}
      rawMm={rawMm}
      aboveMm={aboveMm - 6}
      bands={[
        { from: -(aboveMm - 6), to: 0, text: 'leg' },
        { from: 0, to: at('cuff-top'), text: 'section 1' },
        { from: at('cuff-top'), to: at('inner-fold'), text: 'cuff face', accent: true },
        { from: at('inner-fold'), to: Math.min(cutMm, rawMm ?? cutMm), text: 'inside section' },
      ]}
      s={s}
      yMark={yMark}
      H={H}
    >
      <SectionPath d={leg} />
      <SectionPath d={inside} />
      <SectionPath d={face} accent />
      <Labels
        x={x2 + 28}
        anchor="start"
        labels={[
          { y: up(aboveMm - 10), to: [xL + 3, up(aboveMm - 10) - 5], text: 'leg' },
          { y: yTop + 2, to: [x2 + 3, yTop], text: 'cuff top', n: [2] },
          { y: (yTop + yFold) / 2, to: [x2 + 4, (yTop + yFold) / 2 - 5], text: 'cuff face', accent: true },
          { y: (yTop + yFold) / 2 + 24, to: [x1 + 2, (yTop + yFold) / 2 + 19], text: 'section 1' },
          { y: yMark + 24, to: [x2 + 4, yMark - 4], text: 'finished edge', n: [1, 3] },
        ]}
      />
      <Labels
        x={x3 - 36}
        anchor="end"
        labels={[...turn.labels, { y: (yInside + yFold) / 2 + 30, to: [x3 - 3, (yInside + yFold) / 2 + 20], text: 'inside section' }]}
      />
    </FlatAndSection>
  );
}
