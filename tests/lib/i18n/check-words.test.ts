// The forms' own checks in the catalog's words: the calculator's plan check and the fitting's zod
// schema say in English exactly what the server says, and in French their own words.
import { describe, expect, it } from 'vitest';
import { translator } from '@/lib/server/i18n/catalog';
import { catalogLengthWords, zodLengthText } from '@/lib/shared/i18n/check-words';
import type { MessageKey } from '@/lib/shared/i18n/format';
import { measurementsRequest, type LEG_LENGTHS, LEG_LENGTH_LABELS, blankLeg } from '@/lib/shared/measurement-request';
import { checkPlanRequest, ENGLISH_LENGTH_WORDS, type LengthFault } from '@/lib/shared/plan-check';
import { PLAN_FIELD_NAMES, type PlanField } from '@/lib/shared/plan-messages';

const en = translator('en');
const fr = translator('fr');
const FAULTS: LengthFault[] = ['enter', 'farTooLarge', 'tooLong', 'notALength', 'unstorable'];

describe('the calculator check in the catalog', () => {
  it('says in English every fault of every length as the server schema does, word for word', () => {
    for (const f of Object.keys(PLAN_FIELD_NAMES) as PlanField[]) {
      for (const fault of FAULTS) expect(catalogLengthWords(en)(f, fault)).toBe(ENGLISH_LENGTH_WORDS(f, fault));
    }
  });

  it('says them in French, with no placeholder or English left', () => {
    for (const f of Object.keys(PLAN_FIELD_NAMES) as PlanField[]) {
      for (const fault of FAULTS) {
        const text = catalogLengthWords(fr)(f, fault);
        expect(text).not.toMatch(/[{}]|^check\./);
        expect(text).not.toBe(ENGLISH_LENGTH_WORDS(f, fault));
      }
    }
    const checked = checkPlanRequest({ kind: 'cuff', unit: 'in', cuffDepth: '' }, catalogLengthWords(fr));
    expect(checked).toMatchObject({ ok: false, issues: { cuffDepth: 'Saisissez : hauteur du revers.' } });
    // Without words of its own, the check keeps the server's English.
    expect(checkPlanRequest({ kind: 'cuff', unit: 'in', cuffDepth: '' })).toMatchObject({ issues: { cuffDepth: 'Enter the cuff depth.' } });
  });
});

describe('the fitting schema in the catalog', () => {
  const faulty = { unit: 'in', legs: { left: { ...blankLeg(), cuffDepth: 'x'.repeat(41), turnUnder: 7, hemSection: 'a\u0000' }, right: blankLeg() } };
  const issues = measurementsRequest.safeParse(faulty).error?.issues ?? [];

  it('raises the faults the words are mapped from', () => {
    expect(new Set(issues.map((i) => i.code))).toEqual(new Set(['too_big', 'invalid_type', 'custom']));
  });

  it('says each zod fault in English as zod said it, and in French in its own words', () => {
    for (const issue of issues) {
      const f = issue.path[2] as (typeof LEG_LENGTHS)[number];
      expect(en(`field.${f}` as MessageKey)).toBe(LEG_LENGTH_LABELS[f]);
      expect(zodLengthText(en, { type: issue.code, message: issue.message }, en(`field.${f}` as MessageKey))).toBe(issue.message);
      const said = zodLengthText(fr, { type: issue.code, message: issue.message }, fr(`field.${f}` as MessageKey));
      expect(said).not.toBe(issue.message);
      expect(said).not.toMatch(/[{}]/);
    }
    // The server's own answers (type 'server') come as they are.
    expect(zodLengthText(fr, { type: 'server', message: 'As sent.' }, 'x')).toBe('As sent.');
  });
});
