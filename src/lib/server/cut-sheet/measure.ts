// Widths of short text in Inter as the sheet sets it (tabular figures, kerning), for laying out
// columns of figures that must never run together, whatever their width.
import { Font } from '@react-pdf/renderer';
import { FAMILY } from './fonts';
import { SHEET_FEATURES } from './shaping-features';

interface Face {
  unitsPerEm: number;
  layout: (text: string, features: object) => { advanceWidth: number };
}

/** Width in points of one line of text in Inter at a weight and size (fonts must be registered and loaded). */
export function textWidth(text: string, weight: 400 | 700 | 800, size: number): number {
  const face = Font.getFont({ fontFamily: FAMILY, fontWeight: weight, fontStyle: 'normal' })?.data as Face | null | undefined;
  // Not loaded (never on a rendered sheet): a generous guess, every character as wide as a figure.
  if (!face?.layout) return text.length * 0.7 * size;
  return (face.layout(text, SHEET_FEATURES).advanceWidth * size) / face.unitsPerEm;
}
