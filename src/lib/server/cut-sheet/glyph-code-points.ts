// fontkit keeps one glyph object per glyph number, holding the characters of the call that first
// made it, and textkit counts a paragraph's characters from them (pdfkit writes them into the
// PDF's text layer too). Two ways that went wrong:
// - A PDF's font subset makes the parts of composite glyphs by number alone, with no characters
//   (Inter's comma, semicolon and "”" are built from its "’"), so after one sheet every later "’"
//   in the process stood for no character: lines broke mid-word and the text read back wrong.
// - Some glyphs stand for two characters (Inter draws "’" and the modifier letter "ʼ" alike, "Δ"
//   and "∆", "Ω" and "Ω"): whichever the process set first named the glyph for every later use,
//   so after a name typed with "ʼ" every sheet's "’" read back as "ʼ".
// A correction, not a speed patch: always on, whatever PDF_SPEED_PATCHES says.

interface Glyph {
  codePoints: number[];
}

/** A fontkit face, as far as making glyphs goes. */
export interface GlyphMaker {
  getGlyph: (id: number, characters?: number[]) => Glyph | null;
}

const sameCharacters = (a: number[], b: number[]) => a.length === b.length && a.every((c, i) => c === b[i]);

/**
 * Makes a face give each use of a glyph in text the characters it stands for there: a glyph first
 * made without characters takes those of its first use; one first made for other characters is
 * handed out as a view of the same glyph (its outline and metrics shared) holding these.
 */
export function keepCodePointsOfText(face: GlyphMaker): void {
  const make = face.getGlyph.bind(face);
  // Views per glyph number and characters: a handful per face in practice.
  const views = new Map<number, Map<string, Glyph>>();
  face.getGlyph = (id: number, characters: number[] = []) => {
    const glyph = make(id, characters);
    if (!glyph || characters.length === 0) return glyph;
    if (glyph.codePoints.length === 0) glyph.codePoints = characters;
    if (sameCharacters(glyph.codePoints, characters)) return glyph;
    let byCharacters = views.get(id);
    if (!byCharacters) views.set(id, (byCharacters = new Map()));
    const key = characters.join(',');
    let view = byCharacters.get(key);
    if (!view) {
      view = Object.create(glyph, { codePoints: { value: [...characters], writable: true, enumerable: true, configurable: true } }) as Glyph;
      byCharacters.set(key, view);
    }
    return view;
  };
}
