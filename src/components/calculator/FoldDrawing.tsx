import type { CuffPlan } from '@/lib/allowance/types';
import { FlatCloth, ScaleBar, ShortHatch } from './FlatCloth';
import { Labels } from './DrawingLabels';
import { LINE_NAMES } from './line-names';

const W = 720;
const G = 9; // gap between layers in the section, in px: cloth thickness is not to scale

/** The cuff to scale: the flat cloth with its four chalk lines, and beside it the finished cuff in section. */
export function FoldDrawing({ plan }: { plan: CuffPlan }) {
  const D = plan.cuffDepth.mm;
  const S = plan.hemSection.mm;
  const T = Math.min(plan.turnUnder.mm, S);
  const at = (name: string) => plan.lines.find((l) => l.name === name)?.belowMark.mm ?? 0;
  const cutMm = at('cut');
  const rawMm = plan.lines[0]?.aboveRawEdge?.mm ?? null;
  const aboveMm = Math.max(D, S) + 16;
  const belowMm = Math.max(cutMm, rawMm ?? 0) + 12;
  const s = Math.min(4, 480 / (aboveMm + belowMm));
  const yMark = 34 + aboveMm * s;
  const H = yMark + belowMm * s + 52;
  const up = (mm: number) => yMark - mm * s;

  const xL = 510;
  const [x3, xt, x1, x2] = [xL - 2 * G, xL - G, xL + G, xL + 2 * G];
  const yFold = yMark - 2 * G;
  const yTop = up(D);
  const yInside = up(S - T);
  const r = G / 2;
  const leg = `M${xL},${up(aboveMm - 6)} V${yFold} A${r},${r} 0 0 0 ${x1},${yFold} V${yTop + r}`;
  const face = `M${x1},${yTop + r} A${r},${r} 0 0 1 ${x2},${yTop + r} V${yFold}`;
  const inside = `M${x2},${yFold} A${2 * G},${2 * G} 0 0 1 ${x3},${yFold} V${yInside + r} A${r},${r} 0 0 1 ${xt},${yInside + r} V${yInside + T * s}`;

  const lines = plan.lines.map((l) => ({ n: l.n, label: LINE_NAMES[l.name], mm: l.belowMark.mm, text: l.belowMark.text, cut: l.name === 'cut' }));
  return (
    <figure className="rounded-lg border-2 border-rule bg-card p-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby="fold-title fold-desc" className="h-auto w-full">
        <title id="fold-title">The cuff drawn to scale</title>
        <desc id="fold-desc">
          {`Left, the cloth flat below the pin mark with chalk lines at ${plan.lines.map((l) => `${LINE_NAMES[l.name]} ${l.belowMark.text}`).join(', ')}. ` +
            'Right, the finished cuff in section: the leg, section 1 behind the cuff face, the inside section with its turn-under.'}
        </desc>
        <ShortHatch />
        <text x={56} y={18} className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Flat, from the pin mark down</text>
        <text x={W - 12} y={18} textAnchor="end" className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Finished, in section</text>
        <FlatCloth lines={lines} rawMm={rawMm} aboveMm={aboveMm - 6} s={s} yMark={yMark} x={56} width={130}
          bands={[
            { from: -(aboveMm - 6), to: 0, text: 'leg' },
            { from: 0, to: at('cuff-top'), text: 'section 1' },
            { from: at('cuff-top'), to: at('inner-fold'), text: 'cuff face', accent: true },
            { from: at('inner-fold'), to: Math.min(cutMm, rawMm ?? cutMm), text: 'inside section' },
          ]} />

        <line x1={xL - 70} x2={W - 12} y1={yMark} y2={yMark} className="stroke-rule" strokeWidth={1} strokeDasharray="2 4" />
        <path d={leg} fill="none" className="stroke-ink" strokeWidth={3} strokeLinecap="round" strokeLinejoin="round" />
        <path d={inside} fill="none" className="stroke-ink" strokeWidth={3} strokeLinecap="round" strokeLinejoin="round" />
        <path d={face} fill="none" className="stroke-accent" strokeWidth={5} strokeLinecap="round" strokeLinejoin="round" />
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
          labels={[
            { y: yInside + 4, to: [xt - 3, yInside + r], text: 'turn-under' },
            { y: yInside + T * s + 10, to: [xt - 2, yInside + T * s], text: 'cut edge', n: [4], cut: true },
            { y: (yInside + yFold) / 2 + 30, to: [x3 - 3, (yInside + yFold) / 2 + 20], text: 'inside section' },
          ]}
        />
        <ScaleBar unit={plan.unit} s={s} x={56} y={H - 16} />
      </svg>
    </figure>
  );
}
