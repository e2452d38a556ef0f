// A fitting save that comes back while the tailor keeps typing: untouched fields take the saved
// copy, fields typed over since the save started keep what is typed now and are named as newer.
import { describe, expect, it } from 'vitest';
import { afterSave } from '@/components/bench/after-save';

const leg = (over: Record<string, string> = {}) => ({ finish: 'cuff', cuffDepth: '', backPin: '', ...over });

describe('afterSave', () => {
  it('takes the saved copy of every field nobody touched while saving', () => {
    const sent = { unit: 'in', legs: { left: leg({ cuffDepth: '1 1/2 ' }), right: leg() } };
    // The server keeps the typed text trimmed: the form shows what was stored.
    const saved = { unit: 'in', legs: { left: leg({ cuffDepth: '1 1/2' }), right: leg() } };
    const { values, newer } = afterSave(sent, structuredClone(sent), saved);
    expect(values).toEqual(saved);
    expect(newer).toEqual([]);
  });

  it('keeps each field typed over while saving, and names it', () => {
    const sent = { unit: 'in', legs: { left: leg({ cuffDepth: '1 1/2' }), right: leg() } };
    const now = { unit: 'in', legs: { left: leg({ cuffDepth: '1 1/2', backPin: '31' }), right: leg({ cuffDepth: '1 3/4' }) } };
    const saved = { unit: 'in', legs: { left: leg({ cuffDepth: '1 1/2' }), right: leg() } };
    const { values, newer } = afterSave(sent, now, saved);
    expect(values).toEqual(now);
    expect(newer.sort()).toEqual(['legs.left.backPin', 'legs.right.cuffDepth']);
  });

  it('keeps a field cleared while saving cleared, not refilled from the save', () => {
    const sent = { legs: { left: leg({ backPin: '31 1/4' }) } };
    const now = { legs: { left: leg({ backPin: '' }) } };
    const { values, newer } = afterSave(sent, now, sent);
    expect(values.legs.left.backPin).toBe('');
    expect(newer).toEqual(['legs.left.backPin']);
  });

  it('leaves the arguments as they were', () => {
    const sent = { legs: { left: leg() } };
    const now = { legs: { left: leg({ backPin: '30' }) } };
    const saved = { legs: { left: leg() } };
    afterSave(sent, now, saved);
    expect(saved.legs.left.backPin).toBe('');
    expect(now.legs.left.backPin).toBe('30');
  });
});
