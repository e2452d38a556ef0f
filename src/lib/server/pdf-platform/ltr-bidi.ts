// textkit runs the whole Unicode bidi algorithm (bidi-js) over every paragraph it lays out, then
// turns the levels into runs. Text with no right-to-left character, no Arabic digit and no bidi
// control, in a paragraph that is not right-to-left, has every level 0 (UAX #9: European digits
// after the left-to-right start become left-to-right, neutrals between left-to-right text take its
// direction, separators and trailing spaces take the paragraph's), so its answer is one run at
// level 0, or none for empty text. Each character's bidi type is read from bidi-js itself, once per
// code unit, as bidi-js reads them. Anything else goes to textkit's own step. The hook into
// react-pdf's layout is ours: patches/@react-pdf+layout+*.patch adds it.
import bidiFactory from 'bidi-js';
import * as reactPdfLayout from '@react-pdf/layout';

/** textkit's attributed string, as far as its bidi step reads it. */
export interface BidiText {
  string: string;
  runs: { attributes: Record<string, unknown> }[];
}

/** What textkit's bidi step answers: the string and its runs of one level each. */
export interface BidiRuns {
  string: string;
  runs: { start: number; end: number; attributes: { bidiLevel: number } }[];
}

type Own = (text: BidiText) => BidiRuns;

// The bidi types that can lift a level above 0 in a left-to-right paragraph.
const LIFTING = new Set(['R', 'AL', 'AN', 'LRE', 'RLE', 'LRO', 'RLO', 'PDF', 'LRI', 'RLI', 'FSI', 'PDI']);
const bidi = bidiFactory();
// Per UTF-16 code unit: 0 not looked at yet, 1 stays at level 0, 2 may not.
const kinds = new Uint8Array(0x10000);

function levelZero(string: string): boolean {
  for (let i = 0; i < string.length; i++) {
    const unit = string.charCodeAt(i);
    let kind = kinds[unit]!;
    if (kind === 0) kinds[unit] = kind = LIFTING.has(bidi.getBidiCharTypeName(string[i]!)) ? 2 : 1;
    if (kind === 2) return false;
  }
  return true;
}

/** textkit's bidi step, answered at once for left-to-right text (every level 0) and by textkit otherwise. */
export function ltrBidi(text: BidiText, own: Own): BidiRuns {
  const direction = text.runs[0]?.attributes.direction;
  if ((direction !== undefined && direction !== 'ltr') || !levelZero(text.string)) return own(text);
  const { string } = text;
  return { string, runs: string.length === 0 ? [] : [{ start: 0, end: string.length, attributes: { bidiLevel: 0 } }] };
}

/** Puts ltrBidi in front of textkit's bidi step; throws if the layout lacks the hook (our patch not applied). Returns how to take it out. */
export function ltrBidiFast(layoutModule: object = reactPdfLayout): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const set = (layoutModule as { setBidiHook?: (hook: typeof ltrBidi | null) => void }).setBidiHook;
  if (typeof set !== 'function') throw new Error('@react-pdf/layout has no setBidiHook: patches/@react-pdf+layout+*.patch is not applied');
  set(ltrBidi);
  return () => set(null);
}
