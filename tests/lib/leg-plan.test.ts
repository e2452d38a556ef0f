// A leg's fitting turned into plan requests: a cuff needs its depth, is planned level whatever the
// front pin says, and gets a taper check only with all three widths.
import { describe, expect, it } from 'vitest';
import { frontPinNote, legHemTaperRequest, legMainRequest, legTaperRequest } from '@/lib/shared/leg-plan';
import { blankLeg } from '@/lib/shared/measurement-request';
import { GARMENT_STEPS, leastAdvanced, nextStep, stepLabel } from '@/lib/shared/garment-steps';

describe('leg plan requests', () => {
  it('ask for a cuff with the depth and cloth typed, blank fields left to the engine', () => {
    const leg = { ...blankLeg(), backPin: '31', cuffDepth: ' 1 1/2 ', available: '5', frontPin: '30 3/4' };
    expect(legMainRequest(leg, 'in', 8)).toEqual({ kind: 'cuff', unit: 'in', precision: 8, cuffDepth: '1 1/2', available: '5' });
  });

  it('wait for the cuff depth before asking', () => {
    expect(legMainRequest(blankLeg('cuff'), 'in')).toBeNull();
  });

  it('send the slope only for a sloped hem', () => {
    const leg = { ...blankLeg('plain'), slope: '1/2', hemAllowance: '1 1/2' };
    expect(legMainRequest(leg, 'cm')).toEqual({ kind: 'hem', unit: 'cm', hemAllowance: '1 1/2' });
    expect(legMainRequest({ ...leg, finish: 'slope' }, 'in', 16)).toEqual({ kind: 'hem', unit: 'in', precision: 16, hemAllowance: '1 1/2', slope: '1/2' });
  });

  it('check the taper only with the depth and all three widths', () => {
    const leg = { ...blankLeg(), cuffDepth: '1 3/4', widthAtEdge: '8', widthAbove: '8 3/4' };
    expect(legTaperRequest(leg, 'in')).toBeNull();
    expect(legTaperRequest({ ...leg, heightAbove: '6', seamAllowance: '1/2' }, 'in')).toMatchObject({ kind: 'taper', heightAbove: '6', seamAllowance: '1/2' });
  });

  it('send the width at the cutting line (and a cuff’s old fold) only for a pair let down first', () => {
    const cuff = { ...blankLeg(), cuffDepth: '1 1/2', oldCrease: '3', widthAtEdge: '7', widthAbove: '8', heightAbove: '24', widthAtCut: ' 7 3/8 ' };
    expect(legTaperRequest(cuff, 'in')).not.toHaveProperty('widthAtCut');
    expect(legTaperRequest(cuff, 'in', 8, { letDown: true })).toMatchObject({ kind: 'taper', widthAtCut: '7 3/8', oldCrease: '3' });
    const hem = { ...cuff, finish: 'plain' as const };
    expect(legHemTaperRequest(hem, 'in')).not.toHaveProperty('widthAtCut');
    expect(legHemTaperRequest(hem, 'in', 8, { letDown: true })).toEqual({
      unit: 'in',
      precision: 8,
      widthAtEdge: '7',
      widthAbove: '8',
      heightAbove: '24',
      widthAtCut: '7 3/8',
    });
    // A draft kept from before the field existed has no widthAtCut at all.
    const { widthAtCut: _w, ...old } = hem;
    expect(legHemTaperRequest(old as typeof hem, 'in', 8, { letDown: true })).not.toHaveProperty('widthAtCut');
  });

  it('note a front pin on a cuff as recorded but hemmed level (cuffs are hemmed level: TRADE.md, Encyclopedia of Men’s Clothes)', () => {
    expect(frontPinNote({ ...blankLeg(), frontPin: '30 3/4' })).toMatch(/cuff is hemmed level/);
    expect(frontPinNote(blankLeg())).toBeNull();
  });
});

describe('garment steps', () => {
  it('run in the agreed order and stop after collected', () => {
    expect(GARMENT_STEPS).toEqual(['received', 'marked', 'cut', 'stitched', 'pressed', 'ready', 'collected']);
    expect(nextStep('pressed')).toBe('ready');
    expect(nextStep('collected')).toBeNull();
  });

  it('put a ticket at its least advanced garment', () => {
    expect(leastAdvanced(['ready', 'cut', 'pressed'])).toBe('cut');
    expect(leastAdvanced([])).toBe('received');
  });

  it("use the shop's renames, ignoring blank ones", () => {
    expect(stepLabel('marked')).toBe('Chalk-marked');
    expect(stepLabel('marked', { marked: 'Pinned and chalked' })).toBe('Pinned and chalked');
    expect(stepLabel('cut', { cut: '  ' })).toBe('Cut');
  });
});
