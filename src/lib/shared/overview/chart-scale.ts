// The charts' value axis: a round top value a person reads at a glance (1, 2, 2.5, 5 × 10ⁿ).

/** The smallest round number at or above the value (1 for nothing, so an empty chart still has an axis). */
export function niceMax(value: number): number {
  if (!(value > 0)) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  for (const step of [1, 2, 2.5, 5, 10]) if (step * power >= value) return step * power;
  return 10 * power;
}

/** A bar's length for a value on an axis of `max` drawn `full` units long (never negative). */
export function barLength(value: number, max: number, full: number): number {
  return max > 0 ? Math.max(0, (value / max) * full) : 0;
}
