// Widths of short text in Inter as the sheet sets it (tabular figures, kerning), for laying out
// columns of figures that must never run together, whatever their width.
import { Font } from '@react-pdf/renderer';
import { FAMILY } from './fonts';
import { SHEET_FEATURES } from './shaping-features';

interface Face {
  unitsPerEm: number;
  layout: (text: string, features: object) => { advanceWidth: number };
}

// A sheet measures the same column words and figures as the last (a few dozen a sheet): each
// text's advance is kept per face, so a repeated one is not shaped and summed again.
const ADVANCE_LIMIT = 5000;
const advances = new WeakMap<Face, Map<string, number>>();

function advanceOf(face: Face, text: string): number {
  let kept = advances.get(face);
  if (!kept) advances.set(face, (kept = new Map()));
  let advance = kept.get(text);
  if (advance === undefined) {
    if (kept.size >= ADVANCE_LIMIT) kept.clear();
    advance = face.layout(text, SHEET_FEATURES).advanceWidth;
    kept.set(text, advance);
  }
  return advance;
}

/** Width in points of one line of text in Inter at a weight and size (fonts must be registered and loaded). */
export function textWidth(text: string, weight: 400 | 700 | 800, size: number): number {
  const face = Font.getFont({ fontFamily: FAMILY, fontWeight: weight, fontStyle: 'normal' })?.data as Face | null | undefined;
  // Not loaded (never on a rendered sheet): a generous guess, every character as wide as a figure.
  if (!face?.layout) return text.length * 0.7 * size;
  return (advanceOf(face, text) * size) / face.unitsPerEm;
}
