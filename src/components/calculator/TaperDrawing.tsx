import type { TaperPlan } from '@/lib/allowance/types';
import { Hatch } from './Hatch';
import { seamWork } from './line-names';

const W = 640;

/** The leg flat from the cuff top to the cut, to scale: today's taper, the straight line to keep, the let-out shaded. */
export function TaperDrawing({ taper }: { taper: TaperPlan }) {
  const depth = taper.lines.find((l) => l.name === 'cuff-top')?.belowMark.mm ?? 0;
  const cutMm = Math.max(...taper.lines.map((l) => l.belowMark.mm));
  const half = taper.targetWidth.mm / 2;
  // The cuff top sits one cuff depth above the finished edge: on the flat cloth, that far above the mark.
  const pts = [{ mm: -depth, w: taper.targetWidth.mm }, ...taper.lines.map((l) => ({ mm: l.belowMark.mm, w: l.width.mm }))];
  const widest = Math.max(...pts.map((p) => p.w), taper.targetWidth.mm);
  const s = Math.min(2.4, (W - 300) / widest, 240 / (cutMm + depth));
  const cx = 40 + (widest * s) / 2;
  const y = (mm: number) => 30 + (mm + depth) * s;
  const H = y(cutMm) + 40;
  const side = (sign: 1 | -1) => pts.map((p) => `${cx + (sign * p.w * s) / 2},${y(p.mm)}`);
  const straight = (sign: 1 | -1) => [`${cx + sign * half * s},${y(cutMm)}`, `${cx + sign * half * s},${y(-depth)}`];
  return (
    <figure className="rounded-lg border-2 border-rule bg-paper p-2">
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
          <g key={l.n}>
            <line x1={cx - half * s - 14} x2={cx + half * s + 14} y1={y(l.belowMark.mm)} y2={y(l.belowMark.mm)}
              className={l.name === 'cut' ? 'stroke-cut' : 'stroke-rule'} strokeWidth={l.name === 'cut' ? 3 : 1.5} />
            <text x={cx + half * s + 22} y={y(l.belowMark.mm) + 5} className="fill-ink text-[14px]">
              {l.n} · {seamWork(l.change.mm)} <tspan className="measure font-extrabold">{l.perSide.text}</tspan> each side
            </text>
          </g>
        ))}
        <text x={cx + half * s + 22} y={y(-depth) + 5} className="fill-accent text-[14px] font-semibold">
          cuff top width <tspan className="measure">{taper.targetWidth.text}</tspan>
        </text>
      </svg>
    </figure>
  );
}
