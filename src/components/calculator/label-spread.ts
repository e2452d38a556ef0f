/** Pushes labels apart top to bottom so none sits closer than `gap` px to the one above it. */
export function spread<T extends { y: number }>(labels: T[], gap: number): T[] {
  const out = [...labels].sort((a, b) => a.y - b.y).map((l) => ({ ...l }));
  for (let i = 1; i < out.length; i++) out[i]!.y = Math.max(out[i]!.y, out[i - 1]!.y + gap);
  return out;
}
