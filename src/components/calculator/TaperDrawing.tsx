import { useRef } from 'react';
import type { TaperPlan } from '@/lib/allowance/types';
import { Hatch } from './Hatch';
import { spread } from './label-spread';
import { seamFigures } from './seam-figures';
import { useWidth } from './use-narrow';

const W = 640;
/** Smallest size a word of the drawing may show at on screen, in px (issue 11: 7–8 px on a phone before). */
const MIN_PX = 13;
/** Widest a character of the labels runs, in em (Inter's figures are about 0.6 em; most letters less). */
const CHAR_EM = 0.6;

/** The leg flat from the cuff top to the cut, to scale: today's taper, the straight line to keep, the let-out shaded. */
export function TaperDrawing({ taper }: { taper: TaperPlan }) {
  const ref = useRef<HTMLElement>(null);
  // The words are sized against the drawing's scale on screen, so they stay legible when the frame
  // is narrow (a phone); the leg is drawn smaller to leave them room, still to scale.
  const shown = useWidth(ref);
  const font = Math.max(14, (MIN_PX * W) / (shown ?? W));
  const labels = [
    { y: 0, mm: -depthOf(taper), top: true, text: '', n: 0, work: null },
    ...taper.lines.map((l) => {
      const work = seamFigures(l.change.mm, taper.unit, taper.precision);
      return { y: 0, mm: l.belowMark.mm, top: false, text: `${l.n} · ${work.verb} ${work.perSide} each side`, n: l.n, work };
    }),
  ];
  const topText = `cuff top width ${taper.targetWidth.text}`;
  const labelRoom = Math.max(topText.length, ...labels.map((l) => l.text.length)) * CHAR_EM * font;
  const depth = depthOf(taper);
  const cutMm = Math.max(...taper.lines.map((l) => l.belowMark.mm));
  const half = taper.targetWidth.mm / 2;
  // The cuff top sits one cuff depth above the finished edge: on the flat cloth, that far above the mark.
  const pts = [{ mm: -depth, w: taper.targetWidth.mm }, ...taper.lines.map((l) => ({ mm: l.belowMark.mm, w: l.width.mm }))];
  const widest = Math.max(...pts.map((p) => p.w), taper.targetWidth.mm);
  const s = Math.max(0.2, Math.min(2.4, (W - 80 - labelRoom) / widest, 240 / (cutMm + depth)));
  const cx = 40 + (widest * s) / 2;
  const y = (mm: number) => 10 + font + (mm + depth) * s;
  const labelX = cx + half * s + 22;
  // Each label at its line, pushed down clear of the one above when lines are close; a leader shows which line.
  const placed = spread(
    labels.map((l) => ({ ...l, at: y(l.mm), y: y(l.mm) + font * 0.35 })),
    font * 1.3,
  );
  const H = Math.max(y(cutMm), ...placed.map((l) => l.y)) + 40;
  const side = (sign: 1 | -1) => pts.map((p) => `${cx + (sign * p.w * s) / 2},${y(p.mm)}`);
  const straight = (sign: 1 | -1) => [`${cx + sign * half * s},${y(cutMm)}`, `${cx + sign * half * s},${y(-depth)}`];
  return (
    <figure ref={ref} className="rounded-lg border-2 border-rule bg-paper p-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby="taper-title" className="h-auto w-full">
        <title id="taper-title">
          {`The leg flat, drawn to scale: keep ${taper.targetWidth.text} from the cuff top straight down to the cut; the shaded strips are let out.`}
        </title>
        <Hatch id="let-out" size={6} ground="fill-accent-soft" stroke="stroke-accent" strokeWidth={1.5} />
        {([1, -1] as const).map((sign) => (
          <polygon key={sign} points={[...side(sign), ...straight(sign)].join(' ')} fill="url(#let-out)" className="stroke-none" />
        ))}
        <polyline points={[...side(-1)].reverse().concat(side(1)).join(' ')} fill="none" className="stroke-ink" strokeWidth={2.5} />
        {([1, -1] as const).map((sign) => (
          <polyline key={sign} points={straight(sign).join(' ')} fill="none" className="stroke-accent" strokeWidth={2.5} strokeDasharray="8 5" />
        ))}
        {taper.lines.map((l) => (
          <line
            key={l.n}
            x1={cx - half * s - 14}
            x2={cx + half * s + 14}
            y1={y(l.belowMark.mm)}
            y2={y(l.belowMark.mm)}
            className={l.name === 'cut' ? 'stroke-cut' : 'stroke-rule'}
            strokeWidth={l.name === 'cut' ? 3 : 1.5}
          />
        ))}
        {placed.map((l) => {
          return (
            <g key={l.top ? 'top' : l.n}>
              {l.y - l.at > font && (
                <polyline points={`${cx + half * s + 15},${l.at} ${labelX - 4},${l.y - font * 0.35}`} fill="none" className="stroke-muted" strokeWidth={1} />
              )}
              {l.top ? (
                <text x={labelX} y={l.y} fontSize={font} className="fill-accent font-semibold">
                  cuff top width <tspan className="measure">{taper.targetWidth.text}</tspan>
                </text>
              ) : (
                <text x={labelX} y={l.y} fontSize={font} className="fill-ink">
                  {l.n} · {l.work?.verb} <tspan className="measure font-extrabold">{l.work?.perSide}</tspan> each side
                </text>
              )}
            </g>
          );
        })}
      </svg>
    </figure>
  );
}

function depthOf(taper: TaperPlan): number {
  return taper.lines.find((l) => l.name === 'cuff-top')?.belowMark.mm ?? 0;
}
