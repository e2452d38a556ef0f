// The OpenType features the sheet is set with. Tabular figures: every digit as wide as the
// others, so "1 7/16" never closes up into "17/16" and columns of lengths line up. Plain Latin
// text needs none of Inter's other substitutions (contextual alternates, ligatures, marks), and
// shaping without them is faster; kerning stays on.

/** Feature settings for every run of text on a cut sheet. */
export const SHEET_FEATURES = {
  tnum: true,
  rvrn: false,
  ccmp: false,
  locl: false,
  rlig: false,
  mark: false,
  mkmk: false,
  calt: false,
  clig: false,
  liga: false,
  rclt: false,
  curs: false,
} as const;

/** Characters every Inter font in a PDF starts with (pdf-platform's subset seed): printable ASCII and the signs the sheet uses. */
export const SEED_CHARACTERS = `${Array.from({ length: 0x7f - 0x20 }, (_, i) => String.fromCharCode(0x20 + i)).join('')}·–—−×•▼→½¼¾⅛⅜⅝⅞`;
