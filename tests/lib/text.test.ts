// The shared text schema: a NUL or a lone surrogate in any text field of any request schema is
// refused with an issue on that field, so it never reaches PostgreSQL (which refuses both).
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { newCustomer as customerInput } from '@/lib/shared/customer-request';
import { acceptInviteInput, shopSignUpInput } from '@/lib/shared/account-inputs';
import { customerPatch, garmentPatch, intakeRequest, settingsRequest } from '@/lib/shared/bench-requests';
import { lineInput, priceListInput } from '@/lib/shared/counter-request';
import { measurementsRequest, blankLeg } from '@/lib/shared/measurement-request';
import { planRequest } from '@/lib/shared/plan-request';
import { presetCreateInput, presetUpdateInput } from '@/lib/shared/preset-settings';
import { batchQuery } from '@/lib/shared/sheet-request';
import { isUnstorable, text, unstorablePath } from '@/lib/shared/text';
import { PRICE_KEYS } from '@/lib/pricing/price-keys';

const BAD = ['pair \u0000 one', 'pair \ud800', '\udc00 pair', 'a\ud83d'];

/** [schema, a valid body, a function putting a text at one field, that field's path]. */
const CASES: [string, z.ZodType, unknown, (v: string) => unknown, string][] = [
  ['customer name', customerInput, { name: 'Ada Example' }, (v) => ({ name: v }), 'name'],
  ['customer notes', customerInput, { name: 'Ada' }, (v) => ({ name: 'Ada', notes: v }), 'notes'],
  ['customer patch phone', customerPatch, {}, (v) => ({ phone: v }), 'phone'],
  ['garment description', garmentPatch, {}, (v) => ({ description: v }), 'description'],
  ['garment assignee', garmentPatch, {}, (v) => ({ assigneeId: v }), 'assigneeId'],
  ['intake note', intakeRequest, {}, (v) => ({ note: v }), 'note'],
  ['intake garment', intakeRequest, {}, (v) => ({ garments: [{ description: v }] }), 'garments.0.description'],
  ['step label', settingsRequest, { scale: 'in8' }, (v) => ({ scale: 'in8', stepLabels: { marked: v } }), 'stepLabels.marked'],
  ['adjustment reason', lineInput, { source: 'list', key: PRICE_KEYS[0] }, (v) => ({ source: 'adjust', label: 'x', amountMinor: 5, reason: v }), 'reason'],
  [
    'price hours',
    priceListInput,
    undefined,
    (v) => ({ currency: 'USD', hours: v, location: '', autoReadyNotice: false, items: PRICE_KEYS.map((key) => ({ key, label: 'L', amountMinor: 1 })) }),
    'hours',
  ],
  [
    'leg preset',
    measurementsRequest,
    { unit: 'in', legs: { left: blankLeg(), right: blankLeg() } },
    (v) => ({ unit: 'in', legs: { left: { ...blankLeg(), preset: v }, right: blankLeg() } }),
    'legs.left.preset',
  ],
  ['plan length', planRequest, { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' }, (v) => ({ kind: 'cuff', unit: 'in', cuffDepth: v }), 'cuffDepth'],
  [
    'preset name',
    presetCreateInput,
    { name: 'P', settings: { finish: 'cuff', unit: 'in' } },
    (v) => ({ name: v, settings: { finish: 'cuff', unit: 'in' } }),
    'name',
  ],
  ['preset rename', presetUpdateInput, { name: 'P' }, (v) => ({ name: v }), 'name'],
  [
    'sign-up shop name',
    shopSignUpInput,
    { shopName: 'Shop', name: 'Lee', email: 'a@example.com', password: 'a-long-password' },
    (v) => ({ shopName: v, name: 'Lee', email: 'a@example.com', password: 'a-long-password' }),
    'shopName',
  ],
  ['invitee password', acceptInviteInput, { name: 'Lee', password: 'a-long-password' }, (v) => ({ name: 'Lee', password: `${v}-long-enough` }), 'password'],
  ['queue search', batchQuery, {}, (v) => ({ search: v }), 'search'],
  ['queue who', batchQuery, {}, (v) => ({ who: v }), 'who'],
];

describe('text()', () => {
  it('refuses a NUL and lone surrogates, keeps pairs and ordinary text', () => {
    for (const bad of BAD) expect(isUnstorable(bad), JSON.stringify(bad)).toBe(true);
    for (const good of ['', 'Navy wool 32" — ½', 'pair 😀', '\ud83d\ude00x']) expect(isUnstorable(good), good).toBe(false);
    expect(text().trim().max(3).parse(' ab ')).toBe('ab');
  });

  for (const [name, schema, valid, withText, path] of CASES) {
    it(`every request schema refuses it at its field: ${name}`, () => {
      if (valid !== undefined) expect(schema.safeParse(valid).success).toBe(true);
      expect(schema.safeParse(withText('fine')).success).toBe(true);
      for (const bad of BAD) {
        const r = schema.safeParse(withText(bad));
        expect(r.success, `${name} took ${JSON.stringify(bad)}`).toBe(false);
        expect(r.error!.issues.map((i) => i.path.join('.'))).toContain(path);
      }
    });
  }

  it('unstorablePath finds the first field (or key) a body holds that PostgreSQL cannot keep', () => {
    expect(unstorablePath({ name: 'Lee', email: 'a@example.com', nested: [{ ok: 1 }] })).toBeNull();
    expect(unstorablePath({ name: 'a\u0000b' })).toBe('name');
    expect(unstorablePath({ user: { names: ['ok', 'x\ud800'] } })).toBe('user.names.1');
    expect(unstorablePath({ 'k\u0000': 1 })).toBe('_');
    expect(unstorablePath('\udc00')).toBe('_');
  });
});
