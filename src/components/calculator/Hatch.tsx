interface Props {
  /** the pattern's id, filled in with fill="url(#id)" */
  id: string;
  /** tile size in px */
  size: number;
  /** class of the tile's ground */
  ground: string;
  /** class of the diagonal stroke */
  stroke: string;
  strokeWidth: number;
}

/** A diagonal hatch pattern, defined once in an SVG and used as a fill. */
export function Hatch({ id, size, ground, stroke, strokeWidth }: Props) {
  return (
    <defs>
      <pattern id={id} width={size} height={size} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width={size} height={size} className={ground} />
        <line x1="0" y1="0" x2="0" y2={size} className={stroke} strokeWidth={strokeWidth} />
      </pattern>
    </defs>
  );
}
