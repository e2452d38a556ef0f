import { describe, expect, it } from 'vitest';
import * as engine from '@/lib/allowance';

describe('the engine entry point', () => {
  it('exports the contract', () => {
    for (const name of [
      'parseLength',
      'formatLength',
      'planCuff',
      'planHem',
      'checkTaper',
      'splitFraction',
      'toInches',
      'validateCuffInput',
      'validateHemInput',
      'validateTaperInput',
      'isAllowanceError',
    ]) {
      expect(typeof (engine as Record<string, unknown>)[name]).toBe('function');
    }
    expect(new engine.AllowanceError('empty', 'x')).toBeInstanceOf(Error);
    expect(Object.keys(engine.DEFAULTS)).toEqual(['in', 'cm', 'mm']);
    expect(Object.keys(engine.USUAL_CUFF_DEPTHS)).toEqual(['in', 'cm', 'mm']);
  });
});
