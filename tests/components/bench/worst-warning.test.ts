// The summary bar's one warning: the most serious first, the cloth left to the bar's own check.
import { describe, expect, it } from 'vitest';
import { worstWarning } from '@/components/bench/worst-warning';
import type { PlanWarning } from '@/lib/allowance/types';

const w = (code: PlanWarning['code'], message: string = code): PlanWarning => ({ code, message, values: {} });

describe('worstWarning', () => {
  it('is none for no warnings, and none for the cloth alone (the bar says the cloth itself)', () => {
    expect(worstWarning([])).toBeNull();
    expect(worstWarning([w('not-enough-cloth')])).toBeNull();
  });

  it('puts work that cannot be done before a figure merely out of the usual, and counts the rest', () => {
    expect(worstWarning([w('cuff-depth-unusual'), w('let-out-exceeds-seam-allowance'), w('old-crease-visible')])).toEqual({
      message: 'let-out-exceeds-seam-allowance',
      others: 2,
    });
  });

  it('says a warning raised by both the plan and its taper check once', () => {
    expect(worstWarning([w('taper-beyond-tolerance', 'Too narrow'), w('taper-beyond-tolerance', 'Too narrow')])).toEqual({ message: 'Too narrow', others: 0 });
  });

  it('puts a taper the engine refused before every warning', () => {
    expect(worstWarning([w('third-section-too-small')], 'A width of 0 cannot be checked.')).toEqual({
      message: 'Taper check: A width of 0 cannot be checked.',
      others: 1,
    });
  });
});
