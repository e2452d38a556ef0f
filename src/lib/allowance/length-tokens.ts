import { AllowanceError } from './allowance-error';
import type { Unit } from './types';

/** One token of typed length text. `space` says whether white space came just before it. */
export type LengthToken =
  /** `comma`: typed with a decimal comma ("3,8"), digits given with a point; only metric lengths take it */
  | { kind: 'number'; digits: string; script: 'plain' | 'sup' | 'sub'; space: boolean; comma?: string }
  | { kind: 'slash'; space: boolean }
  | { kind: 'vulgar'; num: string; den: string; char: string; space: boolean }
  | { kind: 'unit'; unit: Unit; word: string; space: boolean }
  | { kind: 'plus'; space: boolean }
  /** '-' or '–': a sign, an operator, or the joint of a mixed number "1-1/2", by spacing */
  | { kind: 'hyphen'; space: boolean }
  /** '−' (U+2212): always a minus */
  | { kind: 'minus'; space: boolean };

/** Longest text parseLength reads: longer is not a length someone typed. */
export const MAX_TEXT_LENGTH = 120;

const VULGAR: Record<string, [string, string]> = {
  '¼': ['1', '4'],
  '½': ['1', '2'],
  '¾': ['3', '4'],
  '⅐': ['1', '7'],
  '⅑': ['1', '9'],
  '⅒': ['1', '10'],
  '⅓': ['1', '3'],
  '⅔': ['2', '3'],
  '⅕': ['1', '5'],
  '⅖': ['2', '5'],
  '⅗': ['3', '5'],
  '⅘': ['4', '5'],
  '⅙': ['1', '6'],
  '⅚': ['5', '6'],
  '⅛': ['1', '8'],
  '⅜': ['3', '8'],
  '⅝': ['5', '8'],
  '⅞': ['7', '8'],
};
const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const SUB = '₀₁₂₃₄₅₆₇₈₉';

const UNIT_WORDS: Record<string, Unit> = {
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  '″': 'in',
  '”': 'in',
  mm: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  cm: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
};

const EXAMPLE = 'Type a length such as 1 1/2, 1½, 1.5 or 38 mm.';

function isDigit(c: string): boolean {
  return c >= '0' && c <= '9';
}

function isLetter(c: string): boolean {
  return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}

function notALength(message: string): AllowanceError {
  return new AllowanceError('not-a-length', message);
}

// Format characters (zero-width space, BOM, soft hyphen, joiners, direction marks) come in with
// pasted text and are invisible: they are dropped before reading, never refused.
const INVISIBLE = /\p{Cf}/gu;

/** Typed text without its invisible format characters. */
export function withoutInvisible(text: string): string {
  return text.replace(INVISIBLE, '');
}

// "3,8" or "1,50": a decimal comma. "1,500" (a thousands comma?) and "1,5,2" are refused as unclear.
function commaNumber(text: string, i: number, j: number): { digits: string; typed: string; end: number } {
  let end = j;
  while (end < text.length && (isDigit(text[end]!) || text[end] === ',' || text[end] === '.')) end += 1;
  const typed = text.slice(i, end);
  if (!/^\d+,\d+$/.test(typed)) throw notALength(`“${typed}” is not a number: write one decimal comma or point, e.g. 3,8 or 3.8.`);
  const [whole, decimals] = typed.split(',') as [string, string];
  if (decimals.length === 3) {
    throw notALength(
      `“${typed}” is unclear: is it ${whole}.${decimals} or ${whole}${decimals}? Type ${whole}.${decimals.replace(/0+$/, '') || '0'} or ${whole}${decimals}.`,
    );
  }
  return { digits: `${whole}.${decimals}`, typed, end };
}

/** Split typed length text into tokens, checking every character. Throws AllowanceError. */
export function tokenizeLength(typed: string): LengthToken[] {
  const text = withoutInvisible(typed);
  if (text.trim() === '') throw new AllowanceError('empty', `No length given. ${EXAMPLE}`);
  if (text.length > MAX_TEXT_LENGTH) throw notALength(`That is too long for a length. ${EXAMPLE}`);
  const tokens: LengthToken[] = [];
  let space = false;
  let i = 0;
  while (i < text.length) {
    const c = text[i]!;
    if (c.trim() === '') {
      space = true;
      i += 1;
      continue;
    }
    if (isDigit(c) || c === '.') {
      let j = i;
      while (j < text.length && (isDigit(text[j]!) || text[j] === '.')) j += 1;
      const digits = text.slice(i, j);
      const dot = digits.indexOf('.');
      if (dot !== digits.lastIndexOf('.') || digits === '.' || digits.endsWith('.')) {
        throw notALength(`“${digits}” is not a number. ${EXAMPLE}`);
      }
      if (text[j] === ',' && isDigit(text[j + 1] ?? '')) {
        if (dot >= 0) throw notALength(`“${text.slice(i, j + 2)}…” is not a number: use one decimal comma or point.`);
        const c = commaNumber(text, i, j);
        tokens.push({ kind: 'number', digits: c.digits, script: 'plain', space, comma: c.typed });
        i = c.end;
        space = false;
        continue;
      }
      if ((text[j] === 'e' || text[j] === 'E') && /[0-9+-]/.test(text[j + 1] ?? '')) {
        const shown = /^[0-9.]+[eE][+-]?[0-9]*/.exec(text.slice(i))![0];
        throw notALength(`Write the length in plain digits, not “${shown}”. ${EXAMPLE}`);
      }
      tokens.push({ kind: 'number', digits, script: 'plain', space });
      i = j;
    } else if (SUP.includes(c) || SUB.includes(c)) {
      const set = SUP.includes(c) ? SUP : SUB;
      let digits = '';
      while (i < text.length && set.includes(text[i]!)) {
        digits += String(set.indexOf(text[i]!));
        i += 1;
      }
      tokens.push({ kind: 'number', digits, script: set === SUP ? 'sup' : 'sub', space });
    } else if (c === '/' || c === '⁄' || c === '∕') {
      tokens.push({ kind: 'slash', space });
      i += 1;
    } else if (VULGAR[c] !== undefined) {
      const [num, den] = VULGAR[c];
      tokens.push({ kind: 'vulgar', num, den, char: c, space });
      i += 1;
    } else if (c === '+') {
      tokens.push({ kind: 'plus', space });
      i += 1;
    } else if (c === '-' || c === '–') {
      tokens.push({ kind: 'hyphen', space });
      i += 1;
    } else if (c === '−') {
      tokens.push({ kind: 'minus', space });
      i += 1;
    } else if (isLetter(c) || UNIT_WORDS[c] !== undefined) {
      let j = i + 1;
      if (isLetter(c)) while (j < text.length && isLetter(text[j]!)) j += 1;
      const word = text.slice(i, j);
      const unit = UNIT_WORDS[word.toLowerCase()];
      const last = tokens[tokens.length - 1];
      const afterNumber = last !== undefined && (last.kind === 'number' || last.kind === 'vulgar');
      if (unit === undefined) {
        if (!afterNumber || !/^[a-z]+$/i.test(word)) throw notALength(`“${word}” is not a length. ${EXAMPLE}`);
        throw new AllowanceError('bad-unit', `“${word}” is not a unit here: use in, mm or cm.`);
      }
      tokens.push({ kind: 'unit', unit, word, space });
      i = j;
    } else if (c === ',') {
      throw notALength('Use a point for decimals (1.5), and one length per box.');
    } else if (c === "'" || c === '′') {
      throw new AllowanceError('bad-unit', 'Feet are not used here: give the length in inches (in), mm or cm.');
    } else {
      const shown = String.fromCodePoint(text.codePointAt(i)!);
      throw notALength(`“${shown}” can’t be part of a length. ${EXAMPLE}`);
    }
    space = false;
  }
  return tokens;
}
