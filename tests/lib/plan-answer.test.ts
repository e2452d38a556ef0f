// POST /api/plan's declared answer (src/lib/server/answers/plan.ts) against the engine's own plans:
// every kind of plan, with and without its optional parts (cloth short with alternatives, an old
// crease, a slope, a let-down leg measured at the cut, a hem-taper), is what the API document
// declares, checked the way the HTTP test checks answers (the document's JSON Schema, no field more
// or less); a field the engine does not send is refused.
import { describe, expect, it } from 'vitest';
import { checkHemTaper, checkTaper, planCuff, planHem } from '@/lib/allowance';
import { planAnswerJson } from '@/lib/server/answers/plan';
import { openApiDocument } from '@/lib/server/openapi';
import { planRequest } from '@/lib/shared/plan-request';
import { answerProblems, type DocumentedResponses } from '../http/response-check';

const doc = openApiDocument(
  [{ file: 'plan.ts', method: 'POST', spec: { summary: 'Plans.', permission: 'public', body: planRequest, responses: { 200: planAnswerJson } } }],
  '0.0.0',
);
const responses = doc.paths['/api/plan']!.post!.responses as DocumentedResponses;
// As the route sends it: through JSON.
const sent = (plan: unknown) => JSON.parse(JSON.stringify(plan)) as Record<string, unknown>;
const problems = (plan: unknown) => answerProblems(responses, 200, 'application/json', sent(plan));

describe('the plan answer', () => {
  it('declares a cuff, with its cloth short, its alternatives and an old crease', () => {
    const short = planCuff({ unit: 'in', cuffDepth: '1 3/4', available: '4', oldCrease: '2' });
    expect(short.alternatives).not.toBeNull();
    expect(short.creaseLands).toBeDefined();
    expect(problems(short)).toEqual([]);
    expect(problems(planCuff({ unit: 'mm', precision: 8, cuffDepth: '40' }))).toEqual([]);
  });

  it('declares a plain hem, level and sloped', () => {
    expect(problems(planHem({ unit: 'cm', hemAllowance: '4', turnUnder: '1' }))).toEqual([]);
    expect(problems(planHem({ unit: 'in', available: '1', slope: '1/4' }))).toEqual([]);
  });

  it('declares a taper check under a cuff, on a let-down leg measured at the cut, and under a plain hem', () => {
    expect(problems(checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '24', seamAllowance: '1/2' }))).toEqual([]);
    const letDown = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '24', widthAtCut: '7 1/4' });
    expect(letDown.lines.some((l) => l.measured)).toBe(true);
    expect(problems(letDown)).toEqual([]);
    const underHem = checkHemTaper({ unit: 'mm', hemAllowance: '40', widthAtEdge: '180', widthAbove: '205', heightAbove: '300' });
    expect(underHem.finish).toBe('hem');
    expect(problems(underHem)).toEqual([]);
  });

  it('refuses a field the engine does not send, and a kind it does not plan', () => {
    const cuff = sent(planCuff({ unit: 'in', cuffDepth: '1 1/2' }));
    expect(answerProblems(responses, 200, 'application/json', { ...cuff, extra: 1 })).not.toEqual([]);
    expect(answerProblems(responses, 200, 'application/json', { ...cuff, kind: 'skirt' })).not.toEqual([]);
  });
});
