// The last good plan, the one rule the calculator and the garment page's leg plan share: a fresh
// plan is drawn and kept; an error or a placeholder answer leaves the kept plan drawn; a plan of
// another kind (cuff kept, plain hem asked) is never drawn.
import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { keepLastGood, planToShow, useLastGoodPlan, type PlanQueryState } from '@/components/calculator/use-last-good-plan';
import type { PlanResponse } from '@/lib/shared/plan-request';

// Stand-ins: only the kind and identity matter to this rule, not the lines inside.
const cuffA = { kind: 'cuff', tag: 'a' } as unknown as PlanResponse;
const cuffB = { kind: 'cuff', tag: 'b' } as unknown as PlanResponse;
const hem = { kind: 'hem', tag: 'h' } as unknown as PlanResponse;

const fresh = (plan: PlanResponse): PlanQueryState => ({ data: { ok: true, plan }, isPlaceholderData: false });
const placeholder = (plan: PlanResponse): PlanQueryState => ({ data: { ok: true, plan }, isPlaceholderData: true });
const refused: PlanQueryState = {
  data: { ok: false, error: 'Cuff depth: type a length such as 1 1/2 or 38.', issues: { cuffDepth: 'x' } },
  isPlaceholderData: false,
};
const pending: PlanQueryState = { data: undefined, isPlaceholderData: false };

describe('keepLastGood', () => {
  it('keeps a fresh plan', () => expect(keepLastGood(cuffA, fresh(cuffB))).toBe(cuffB));
  it('does not keep a placeholder (the previous request’s answer)', () => expect(keepLastGood(cuffA, placeholder(cuffB))).toBe(cuffA));
  it('keeps the old plan through a refusal', () => expect(keepLastGood(cuffA, refused)).toBe(cuffA));
  it('keeps the old plan while nothing has answered', () => expect(keepLastGood(null, pending)).toBeNull());
});

describe('planToShow', () => {
  it('draws the answer’s plan', () => expect(planToShow(fresh(cuffB), cuffA, 'cuff')).toBe(cuffB));
  it('draws the placeholder while the next answer is on its way', () => expect(planToShow(placeholder(cuffB), cuffA, 'cuff')).toBe(cuffB));
  it('draws the last good plan while the input is refused', () => expect(planToShow(refused, cuffA, 'cuff')).toBe(cuffA));
  it('draws the last good plan while pending', () => expect(planToShow(pending, cuffA, 'cuff')).toBe(cuffA));
  it('draws nothing of the wrong kind', () => {
    expect(planToShow(refused, cuffA, 'hem')).toBeNull();
    expect(planToShow(fresh(hem), cuffA, 'cuff')).toBeNull();
  });
});

function Probe({ query, kind }: { query: PlanQueryState; kind: PlanResponse['kind'] }) {
  const plan = useLastGoodPlan(query, kind) as unknown as { tag: string } | null;
  return <output>{plan ? plan.tag : 'none'}</output>;
}

describe('useLastGoodPlan', () => {
  it('draws a fresh plan on the very first render', () => {
    expect(renderToStaticMarkup(<Probe query={fresh(cuffA)} kind="cuff" />)).toBe('<output>a</output>');
  });
  it('draws nothing before any good plan', () => {
    expect(renderToStaticMarkup(<Probe query={refused} kind="cuff" />)).toBe('<output>none</output>');
  });
});
