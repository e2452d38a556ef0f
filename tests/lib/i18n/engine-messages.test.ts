// Every engine warning and crease verdict rendered from its code and values through the English
// catalog is the engine's own sentence, word for word; the French catalog renders each too.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkHemTaper, checkTaper, planCuff, planHem } from '@/lib/allowance';
import { type PlanWarning, WARNING_CODES, type WarningCode } from '@/lib/allowance/types';
import { translator } from '@/lib/server/i18n/catalog';
import { creaseText, warningText } from '@/lib/shared/i18n/engine-messages';

const en = translator('en');
const fr = translator('fr');

// Inputs in eighths of an inch and in millimetres, wide enough to raise every warning.
const eighths = (lo: number, hi: number) => fc.integer({ min: lo, max: hi }).map((n) => `${Math.floor(n / 8)} ${n % 8}/8`);
const unitArb = fc.constantFrom('in' as const, 'mm' as const);

function checkWarnings(warnings: PlanWarning[], seen: Set<WarningCode>): void {
  for (const w of warnings) {
    seen.add(w.code);
    expect(warningText(en, w)).toBe(w.message);
    expect(warningText(fr, w)).not.toMatch(/\{|\}/);
  }
}

describe('engine messages through the catalog', () => {
  it('English rendered from code and values is the engine message (cuffs, hems, tapers)', () => {
    const seen = new Set<WarningCode>();
    fc.assert(
      fc.property(
        unitArb,
        eighths(6, 40),
        eighths(1, 40),
        eighths(1, 12),
        fc.option(eighths(0, 120)),
        fc.option(eighths(-8, 100)),
        fc.boolean(),
        (unit, depth, section, turn, available, crease, slope) => {
          const mm = (s: string) => (unit === 'mm' ? `${s} in` : s);
          try {
            const plan = planCuff({
              unit,
              cuffDepth: mm(depth),
              hemSection: mm(section),
              turnUnder: mm(turn),
              ...(available ? { available: mm(available) } : {}),
              ...(crease ? { oldCrease: mm(crease) } : {}),
              ...(slope ? { slope: mm('1/2') } : {}),
            });
            checkWarnings(plan.warnings, seen);
            if (plan.creaseLands) expect(creaseText(en, plan.creaseLands)).toBe(plan.creaseLands.message);
          } catch (e) {
            if (!(e instanceof Error && e.name === 'AllowanceError')) throw e;
          }
          try {
            // Half the hems with their finished edge left below the mark (unwashed cloth): its own words.
            const hem = planHem({
              unit,
              hemAllowance: mm(depth),
              turnUnder: mm(turn),
              ...(available ? { available: mm(available) } : {}),
              ...(slope ? { edgeBelowMark: mm(section) } : {}),
            });
            checkWarnings(hem.warnings, seen);
          } catch (e) {
            if (!(e instanceof Error && e.name === 'AllowanceError')) throw e;
          }
        },
      ),
      { numRuns: 600, seed: 13 },
    );
    for (const [edge, above, height, cut, seam] of [
      ['8', '9', '10', undefined, '1/8'],
      ['9', '8', '10', undefined, '1'],
      ['8', '9', '10', '7', '1/8'],
      ['8', '8 1/2', '10', '9', '1/16'],
    ] as const) {
      const t = checkTaper({
        unit: 'in',
        cuffDepth: '1 3/4',
        widthAtEdge: edge,
        widthAbove: above,
        heightAbove: height,
        seamAllowance: seam,
        ...(cut ? { widthAtCut: cut } : {}),
      });
      checkWarnings(t.warnings, seen);
      const h = checkHemTaper({
        unit: 'in',
        widthAtEdge: edge,
        widthAbove: above,
        heightAbove: height,
        seamAllowance: seam,
        ...(cut ? { widthAtCut: cut } : {}),
      });
      checkWarnings(h.warnings, seen);
    }
    // Every code the engine can raise was met and rendered.
    const all: readonly WarningCode[] = WARNING_CODES;
    expect([...seen].sort()).toEqual([...all].sort());
  });
});
