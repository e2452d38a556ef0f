import type { Unit } from '@/lib/allowance/types';

/** A scale bar of one inch or two centimetres, so the drawing can be read as drawn to scale. */
export function ScaleBar({ unit, s, x, y }: { unit: Unit; s: number; x: number; y: number }) {
  const mm = unit === 'in' ? 25.4 : 20;
  const label = unit === 'in' ? '1 in' : unit === 'cm' ? '2 cm' : '20 mm';
  return (
    <g>
      <line x1={x} x2={x + mm * s} y1={y} y2={y} className="stroke-ink" strokeWidth={2} />
      <line x1={x} x2={x} y1={y - 5} y2={y + 5} className="stroke-ink" strokeWidth={2} />
      <line x1={x + mm * s} x2={x + mm * s} y1={y - 5} y2={y + 5} className="stroke-ink" strokeWidth={2} />
      <text x={x + mm * s + 8} y={y + 5} className="fill-muted text-[13px]">
        {label} · drawn to scale
      </text>
    </g>
  );
}
