import type { HemPlan } from '@/lib/allowance/types';
import { Labels } from './DrawingLabels';
import { FlatCloth, ScaleBar, ShortHatch } from './FlatCloth';
import { LINE_NAMES } from './line-names';

const W = 720;
const G = 9;

/** The plain hem to scale at the back of the leg: flat with its two lines, and finished in section. */
export function HemDrawing({ plan }: { plan: HemPlan }) {
  const A = plan.hemAllowance.mm;
  const T = Math.min(plan.turnUnder.mm, A);
  const cutMm = Math.max(...plan.lines.map((l) => l.belowMark.mm));
  const rawMm = plan.lines[0]?.aboveRawEdge?.mm ?? null;
  const aboveMm = A + 16;
  const belowMm = Math.max(cutMm, rawMm ?? 0) + 12;
  const s = Math.min(4, 360 / (aboveMm + belowMm));
  const yMark = 34 + aboveMm * s;
  const H = yMark + belowMm * s + 52;
  const up = (mm: number) => yMark - mm * s;
  const xL = 510;
  const [xh, xt] = [xL - 2 * G, xL - G];
  const r = G / 2;
  const yIn = up(A - T);
  const section = [
    `M${xL},${up(aboveMm - 6)} V${yMark - G}`,
    `A${G},${G} 0 0 1 ${xh},${yMark - G}`,
    `V${yIn + r} A${r},${r} 0 0 1 ${xt},${yIn + r}`,
    `V${yIn + T * s}`,
  ].join(' ');
  const lines = plan.lines.map((l) => ({ n: l.n, label: LINE_NAMES[l.name], mm: l.belowMark.mm, text: l.belowMark.text, cut: l.name === 'cut' }));
  return (
    <figure className="rounded-lg border-2 border-rule bg-card p-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby="hem-title" className="h-auto w-full">
        <title id="hem-title">
          {`The plain hem drawn to scale at the back of the leg: cut ${plan.lines.find((l) => l.name === 'cut')?.belowMark.text} below the pin mark, ` +
            'fold up at the finished edge, turn under the raw edge.'}
        </title>
        <ShortHatch />
        <text x={56} y={18} className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Flat, from the pin mark down</text>
        <text x={W - 12} y={18} textAnchor="end" className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Finished, in section</text>
        <FlatCloth lines={lines} rawMm={rawMm} aboveMm={aboveMm - 6} s={s} yMark={yMark} x={56} width={130}
          bands={[
            { from: -(aboveMm - 6), to: 0, text: 'leg' },
            { from: 0, to: Math.min(cutMm, rawMm ?? cutMm), text: 'hem allowance', accent: true },
          ]} />
        <line x1={xL - 70} x2={W - 12} y1={yMark} y2={yMark} className="stroke-rule" strokeWidth={1} strokeDasharray="2 4" />
        <path d={section} fill="none" className="stroke-ink" strokeWidth={3} strokeLinecap="round" strokeLinejoin="round" />
        <Labels
          x={xL + 36}
          anchor="start"
          labels={[
            { y: up(aboveMm - 10), to: [xL + 3, up(aboveMm - 10) - 5], text: 'leg, outside' },
            { y: yMark + 24, to: [xL + 2, yMark - 4], text: 'finished edge', n: [1] },
          ]}
        />
        <Labels
          x={xh - 40}
          anchor="end"
          labels={[
            { y: yIn + 4, to: [xt - 3, yIn + r], text: 'turn-under' },
            { y: yIn + T * s + 10, to: [xt - 2, yIn + T * s], text: 'cut edge', n: [2], cut: true },
            { y: (yIn + yMark) / 2 + 14, to: [xh - 3, (yIn + yMark) / 2 + 9], text: 'hem allowance' },
          ]}
        />
        <ScaleBar unit={plan.unit} s={s} x={56} y={H - 16} />
      </svg>
    </figure>
  );
}
