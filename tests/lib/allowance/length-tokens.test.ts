import { describe, expect, it } from 'vitest';
import { AllowanceError } from '@/lib/allowance';
import { MAX_TEXT_LENGTH, tokenizeLength } from '@/lib/allowance/length-tokens';

describe('tokenizeLength', () => {
  it('splits a mixed number with a unit', () => {
    expect(tokenizeLength('1 1/2 in').map((t) => t.kind)).toEqual(['number', 'number', 'slash', 'number', 'unit']);
  });

  it('records the spacing that tells a hyphen from a minus', () => {
    const [, hyphen] = tokenizeLength('1-1/2');
    expect(hyphen).toMatchObject({ kind: 'hyphen', space: false });
    const [, minus, after] = tokenizeLength('32 - 1/4');
    expect(minus).toMatchObject({ kind: 'hyphen', space: true });
    expect(after).toMatchObject({ kind: 'number', space: true });
  });

  it('reads vulgar fractions, small digits and the fraction slash', () => {
    expect(tokenizeLength('⅜')[0]).toMatchObject({ kind: 'vulgar', num: '3', den: '8' });
    expect(tokenizeLength('⁹⁄₁₆')).toMatchObject([
      { kind: 'number', digits: '9', script: 'sup' },
      { kind: 'slash' },
      { kind: 'number', digits: '16', script: 'sub' },
    ]);
  });

  it('knows the unit words and marks', () => {
    for (const [text, unit] of [
      ['2in', 'in'],
      ['2 inch', 'in'],
      ['2″', 'in'],
      ['2 Millimetres', 'mm'],
      ['2 centimeter', 'cm'],
    ] as const) {
      expect(tokenizeLength(text)[1]).toMatchObject({ kind: 'unit', unit });
    }
  });

  it('treats U+2212 as a minus whatever the spacing', () => {
    expect(tokenizeLength('1−2')[1]).toMatchObject({ kind: 'minus' });
  });

  it.each([
    ['', 'empty'],
    ['\t ', 'empty'],
    ['1;2', 'not-a-length'],
    ['1,250', 'not-a-length'],
    ['1,2,5', 'not-a-length'],
    ['2e3', 'not-a-length'],
    ['3 yd', 'bad-unit'],
    ['x', 'not-a-length'],
    ['x'.repeat(MAX_TEXT_LENGTH + 1), 'not-a-length'],
  ])('refuses "%s" (%s)', (text, code) => {
    expect(() => tokenizeLength(text)).toThrow(AllowanceError);
    try {
      tokenizeLength(text);
    } catch (e) {
      expect((e as AllowanceError).code).toBe(code);
    }
  });

  it('names a character outside the basic plane whole in its message', () => {
    expect(() => tokenizeLength('1🧵')).toThrow('“🧵”');
  });
});
