import { describe, expect, it } from 'vitest';
import { DEFAULTS, USUAL_CUFF_DEPTHS } from '@/lib/allowance';
import { exactDefaults, usualCuffDepthsText } from '@/lib/allowance/defaults';

describe('DEFAULTS', () => {
  it('inch defaults (TRADE.md: turn-under ½ in common practice; hem 1¼–2 in and turn-under ¼ in, powersewing.com; ⅛ in tolerance common practice)', () => {
    const d = DEFAULTS.in;
    expect([d.cuffTurnUnder.text, d.hemAllowance.text, d.hemTurnUnder.text, d.taperTolerance.text]).toEqual(['1/2 in', '1 1/2 in', '1/4 in', '1/8 in']);
    expect([d.usualCuffDepth.min.text, d.usualCuffDepth.max.text]).toEqual(['1 in', '2 1/4 in']);
    expect([d.usualHemAllowance.min.text, d.usualHemAllowance.max.text]).toEqual(['1 1/4 in', '2 in']);
    expect(d.maxCuffDepth.text).toBe('6 in');
    expect(d.precision).toBe(16);
  });

  it('metric defaults are our round numbers (the brief: 12 mm, 40 mm, 6 mm, 3 mm)', () => {
    expect([DEFAULTS.mm.cuffTurnUnder.text, DEFAULTS.mm.hemAllowance.text, DEFAULTS.mm.hemTurnUnder.text, DEFAULTS.mm.taperTolerance.text]).toEqual([
      '12 mm',
      '40 mm',
      '6 mm',
      '3 mm',
    ]);
    expect(DEFAULTS.cm.hemAllowance.text).toBe('4 cm');
    expect(DEFAULTS.cm.hemAllowance.mm).toBe(DEFAULTS.mm.hemAllowance.mm);
  });

  it('metric usual ranges lie within a millimetre of the inch ones (TRADE.md figures; NIST: convert, then round sensibly)', () => {
    expect(Math.abs(DEFAULTS.mm.usualCuffDepth.min.mm - DEFAULTS.in.usualCuffDepth.min.mm)).toBeLessThan(1);
    expect(Math.abs(DEFAULTS.mm.usualCuffDepth.max.mm - DEFAULTS.in.usualCuffDepth.max.mm)).toBeLessThan(1);
    expect(Math.abs(DEFAULTS.mm.usualHemAllowance.min.mm - DEFAULTS.in.usualHemAllowance.min.mm)).toBeLessThan(1);
    expect(Math.abs(DEFAULTS.mm.usualHemAllowance.max.mm - DEFAULTS.in.usualHemAllowance.max.mm)).toBeLessThan(1);
  });
});

describe('USUAL_CUFF_DEPTHS', () => {
  it("1¼, 1½, 1¾ and 2 in (TRADE.md: Encyclopedia of Men's Clothes; Permanent Style 2020)", () => {
    expect(USUAL_CUFF_DEPTHS.in.map((u) => [u.depth.text, u.note])).toEqual([
      ['1 1/4 in', 'trim'],
      ['1 1/2 in', 'classic'],
      ['1 3/4 in', 'wide'],
      ['2 in', 'modern'],
    ]);
  });

  it('metric: 32, 38, 44, 50 mm, each within a millimetre of its inch depth (TRADE.md; 5 cm modern standard)', () => {
    expect(USUAL_CUFF_DEPTHS.mm.map((u) => u.depth.text)).toEqual(['32 mm', '38 mm', '44 mm', '50 mm']);
    expect(USUAL_CUFF_DEPTHS.cm.map((u) => u.depth.text)).toEqual(['3.2 cm', '3.8 cm', '4.4 cm', '5 cm']);
    USUAL_CUFF_DEPTHS.mm.forEach((u, k) => expect(Math.abs(u.depth.mm - USUAL_CUFF_DEPTHS.in[k]!.depth.mm)).toBeLessThan(1));
  });
});

describe('exact defaults', () => {
  it('the quick numbers match their exact twins (1/16 in = 1.5875 mm, NBS 1959; 1.5 mm metric)', () => {
    for (const unit of ['in', 'mm'] as const) {
      const e = exactDefaults(unit);
      expect(e.onFoldWithinMm).toBe(e.onFoldWithin.valueOf());
      expect(e.usualCuffDepth.minMm).toBe(e.usualCuffDepth.min.valueOf());
      expect(e.usualHemAllowance.maxMm).toBe(e.usualHemAllowance.max.valueOf());
    }
    expect(exactDefaults('in').onFoldWithinMm).toBe(1.5875);
  });
});

describe('the usual cuff depths in words (the bench hint)', () => {
  it('says 1 1/4, 1 1/2 or 1 3/4 in, or 3.2–4.4 cm: the same figures as the presets, not "4–5 cm" (TRADE.md: Encyclopedia of Men\'s Clothes; 32–44 mm our rounding)', () => {
    expect(usualCuffDepthsText()).toBe('1 1/4, 1 1/2 or 1 3/4 in, or 3.2–4.4 cm');
  });

  it('the bench form shows that text, not its own figures', async () => {
    const { readFile } = await import('node:fs/promises');
    const source = await readFile(new URL('../../../src/components/bench/LegFields.tsx', import.meta.url), 'utf8');
    expect(source).toContain('usualCuffDepthsText()');
    expect(source).not.toMatch(/4–5 cm/);
  });
});
