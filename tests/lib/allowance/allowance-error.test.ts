import { describe, expect, it } from 'vitest';
import { AllowanceError, isAllowanceError } from '@/lib/allowance';

describe('AllowanceError', () => {
  it('is an Error with a code, a message and maybe a field', () => {
    const e = new AllowanceError('negative', 'Turn-under cannot be negative.', 'turnUnder');
    expect(e).toBeInstanceOf(Error);
    expect([e.name, e.code, e.field, e.message]).toEqual(['AllowanceError', 'negative', 'turnUnder', 'Turn-under cannot be negative.']);
    expect('field' in new AllowanceError('empty', 'No length given.')).toBe(false);
  });

  it('is recognised, also when it crossed a bundle boundary', () => {
    expect(isAllowanceError(new AllowanceError('empty', 'x'))).toBe(true);
    const lookalike = Object.assign(new Error('x'), { name: 'AllowanceError', code: 'empty' });
    expect(isAllowanceError(lookalike)).toBe(true);
    expect(isAllowanceError(new Error('x'))).toBe(false);
    expect(isAllowanceError('AllowanceError')).toBe(false);
  });
});
