import { Hatch } from './Hatch';

/** A stretch of the flat cloth between two depths below the mark, named for what it becomes. */
export interface Band {
  from: number;
  to: number;
  text: string;
  accent?: boolean;
}

/** One chalk line on the flat cloth, in millimetres below the pin mark. */
export interface FlatLine {
  n: number;
  label: string;
  mm: number;
  text: string;
  cut?: boolean;
}

interface Props {
  lines: FlatLine[];
  /** the raw edge below the mark, or null when the cloth was not measured */
  rawMm: number | null;
  /** leg shown above the mark */
  aboveMm: number;
  /** px per mm */
  s: number;
  yMark: number;
  x: number;
  width: number;
  /** stretches of cloth named inside the strip; the accented one is tinted (the cuff face) */
  bands?: Band[];
}

/** The cloth laid flat below the pin mark with its chalk lines, to scale. */
export function FlatCloth({ lines, rawMm, aboveMm, s, yMark, x, width, bands = [] }: Props) {
  const cutMm = Math.max(...lines.map((l) => l.mm));
  const bottomMm = rawMm ?? cutMm + 8;
  const y = (mm: number) => yMark + mm * s;
  const top = y(-aboveMm);
  const bottom = y(bottomMm);
  // Without a measured raw edge the cloth ends in a torn line: we do not know where it stops.
  const edge = rawMm === null ? Array.from({ length: 9 }, (_, i) => `L${x + width - (i * width) / 8},${bottom + (i % 2 ? 5 : -5)}`).join(' ') : `H${x}`;
  return (
    <g>
      <path d={`M${x},${top} H${x + width} V${bottom} ${edge} Z`} className="fill-card stroke-ink" strokeWidth={2} />
      {bands.map((b) => (
        <g key={b.text}>
          {b.accent && <rect x={x + 1} y={y(b.from)} width={width - 2} height={(b.to - b.from) * s} className="fill-accent-soft" />}
          {(b.to - b.from) * s > 18 && (
            <text
              x={x + width / 2}
              y={y((b.from + b.to) / 2) + 5}
              textAnchor="middle"
              className={`${b.accent ? 'fill-accent font-semibold' : 'fill-muted'} text-[14px]`}
            >
              {b.text}
            </text>
          )}
        </g>
      ))}
      {rawMm !== null && rawMm < cutMm && (
        <g>
          <rect x={x} y={y(rawMm)} width={width} height={(cutMm - rawMm) * s} fill="url(#short-hatch)" className="stroke-cut" strokeDasharray="4 3" />
          <text x={x + width / 2} y={y((rawMm + cutMm) / 2) + 5} textAnchor="middle" className="fill-cut text-[14px] font-extrabold">
            short
          </text>
        </g>
      )}
      {rawMm !== null && rawMm > cutMm && (
        <g>
          <rect x={x + 1} y={y(cutMm)} width={width - 2} height={(rawMm - cutMm) * s - 1} className="fill-paper" />
          <text x={x + width / 2} y={y((cutMm + rawMm) / 2) + 5} textAnchor="middle" className="fill-muted text-[13px]">
            {(rawMm - cutMm) * s > 16 ? 'cut away' : ''}
          </text>
        </g>
      )}
      <text x={x - 8} y={yMark + 5} textAnchor="end" className="fill-ink text-[14px] font-semibold">
        pin
      </text>
      <circle cx={x + 10} cy={yMark} r={4} className="fill-accent" />
      {lines.map((l) => (
        <g key={l.n}>
          <line
            x1={x}
            x2={x + width}
            y1={y(l.mm)}
            y2={y(l.mm)}
            className={l.cut ? 'stroke-cut' : 'stroke-accent'}
            strokeWidth={l.cut ? 4 : 2.5}
            strokeDasharray={l.cut ? undefined : '8 5'}
          />
          <circle cx={x + width + 16} cy={y(l.mm)} r={11} className={l.cut ? 'fill-cut' : 'fill-ink'} />
          <text x={x + width + 16} y={y(l.mm) + 5} textAnchor="middle" className="fill-paper text-[14px] font-extrabold">
            {l.n}
          </text>
          <text x={x + width + 33} y={y(l.mm) + 5} className={`${l.cut ? 'fill-cut' : 'fill-ink'} text-[15px] font-semibold`}>
            {l.label} {/* The length under the name: beside it, it ran into the section's labels at the pin mark. */}
            <tspan className="measure font-extrabold" x={x + width + 33} dy={20}>
              {l.text}
            </tspan>
          </text>
        </g>
      ))}
      <text x={x - 8} y={bottom + 5} textAnchor="end" className="fill-muted text-[13px]">
        raw
      </text>
      <text x={x - 8} y={bottom + 20} textAnchor="end" className="fill-muted text-[13px]">
        edge
      </text>
      {rawMm === null && (
        <text x={x + width / 2} y={bottom + 26} textAnchor="middle" className="fill-muted text-[13px]">
          cloth not measured
        </text>
      )}
    </g>
  );
}

/** The hatch pattern for cloth that is missing. */
export function ShortHatch() {
  return <Hatch id="short-hatch" size={8} ground="fill-cut-soft" stroke="stroke-cut" strokeWidth={2} />;
}
