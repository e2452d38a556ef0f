// fontkit keeps one glyph object per glyph number, holding the characters of the call that first
// made it, and textkit counts a paragraph's characters from them. A PDF's font subset makes the
// parts of composite glyphs by number alone, with no characters (Inter's comma, semicolon and "”"
// are built from its "’"), so after one sheet every later "’" in the process stood for no
// character: lines broke mid-word and the text read back wrong. A correction, not a speed patch: always on, whatever PDF_SPEED_PATCHES says.

/** A fontkit face, as far as making glyphs goes. */
export interface GlyphMaker {
  getGlyph: (id: number, characters?: number[]) => { codePoints: number[] } | null;
}

/** Makes a face give a glyph first made without characters those of its first use in text. */
export function keepCodePointsOfText(face: GlyphMaker): void {
  const make = face.getGlyph.bind(face);
  face.getGlyph = (id: number, characters: number[] = []) => {
    const glyph = make(id, characters);
    if (glyph && characters.length > 0 && glyph.codePoints.length === 0) glyph.codePoints = characters;
    return glyph;
  };
}
