// The left-to-right bidi answer must be textkit's own, for any text and paragraph direction.
import { bidi } from '@react-pdf/textkit';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ltrBidi, type BidiText } from '@/lib/server/pdf-platform/ltr-bidi';

const own = bidi() as unknown as (text: BidiText) => ReturnType<typeof ltrBidi>;

// Left-to-right letters, European digits and their signs, spaces, tabs, line breaks, marks that
// join the letter before, invisible format characters, neutrals (’ — ½ ×), and then what can lift a
// level: Hebrew and Arabic letters, Arabic digits, the right-to-left mark, embeddings, overrides,
// isolates and their ends.
const LTR = [
  'a',
  'Z',
  'é',
  'ß',
  'Ж',
  'ω',
  '3',
  '9',
  '+',
  '-',
  '%',
  '$',
  '/',
  ',',
  '.',
  ':',
  ' ',
  '\u00a0',
  '\t',
  '\n',
  '\u2029',
  '\u0301',
  '\u200b',
  '\u200d',
  '\u2019',
  '\u2014',
  '½',
  '×',
  '(',
  ')',
  '"',
  '▲',
  '\u200e',
];
const LIFTING = [
  '\u05d0',
  '\u05e9',
  '\u0627',
  '\u0644',
  '\u0661',
  '\u06f1',
  '\u200f',
  '\u202a',
  '\u202b',
  '\u202c',
  '\u202d',
  '\u202e',
  '\u2066',
  '\u2067',
  '\u2068',
  '\u2069',
  '\ud83d',
  '\ude00',
];
const textOf = (chars: string[], direction: string | undefined): BidiText => ({
  string: chars.join(''),
  runs: [{ attributes: direction === undefined ? {} : { direction } }],
});

describe('the left-to-right bidi step', () => {
  it('answers as textkit does, for text with and without right-to-left characters, in every paragraph direction', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof({ weight: 6, arbitrary: fc.constantFrom(...LTR) }, { weight: 1, arbitrary: fc.constantFrom(...LIFTING) }), { maxLength: 40 }),
        fc.constantFrom(undefined, 'ltr', 'rtl'),
        (chars, direction) => {
          const text = textOf(chars, direction);
          expect(ltrBidi(text, own)).toEqual(own(text));
        },
      ),
      { numRuns: 3000 },
    );
  });

  it("answers left-to-right text itself, without textkit's step, and hands the rest on", () => {
    let asked = 0;
    const counting = (text: BidiText) => {
      asked += 1;
      return own(text);
    };
    for (const s of ['Cuff top 1 7/16 in', '', 'Tack at the seams — ½ in below', 'Ticket 1042\n\tZoë’s']) ltrBidi(textOf([...s], undefined), counting);
    ltrBidi(textOf([...'Cuff'], 'ltr'), counting);
    expect(asked).toBe(0);
    for (const s of ['שלום', 'cuff \u0661', 'a\u202eb']) ltrBidi(textOf([...s], undefined), counting);
    ltrBidi(textOf([...'Cuff'], 'rtl'), counting);
    expect(asked).toBe(4);
  });
});
