import { spread } from './label-spread';

/** A chalk line's number in a disc, as on the flat cloth. */
export function Num({ n, cx, cy, cut = false }: { n: number; cx: number; cy: number; cut?: boolean }) {
  return (
    <g>
      <circle cx={cx} cy={cy} r={10} className={cut ? 'fill-cut' : 'fill-ink'} />
      <text x={cx} y={cy + 4.5} textAnchor="middle" className="fill-paper text-[13px] font-extrabold">
        {n}
      </text>
    </g>
  );
}

/** A label with a leader line to the point it names. */
export interface Label {
  y: number;
  to: [number, number];
  text: string;
  accent?: boolean;
  /** chalk line numbers shown in discs before the text */
  n?: number[];
  cut?: boolean;
}

/** A column of labels, spread so they never overlap, each led to its point. */
export function Labels({ labels, x, anchor }: { labels: Label[]; x: number; anchor: 'start' | 'end' }) {
  return (
    <g>
      {spread(labels, 24).map((l) => {
        const discs = (l.n ?? []).length * 24;
        const textX = anchor === 'start' ? x + discs : x - discs;
        const discX = anchor === 'start' ? x + 10 : x - discs + 14;
        return (
          <g key={l.text}>
            <polyline points={`${l.to[0]},${l.to[1]} ${anchor === 'start' ? x - 6 : x + 6},${l.y - 5}`} fill="none" className="stroke-muted" strokeWidth={1} />
            {(l.n ?? []).map((n, i) => (
              <Num key={n} n={n} cx={discX + i * 24} cy={l.y - 5} cut={l.cut} />
            ))}
            <text x={textX} y={l.y} textAnchor={anchor} className={`${l.accent ? 'fill-accent font-semibold' : 'fill-ink'} text-[15px]`}>
              {l.text}
            </text>
          </g>
        );
      })}
    </g>
  );
}
