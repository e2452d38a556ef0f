// The public calculator checks a plan request in the browser without zod (plan-check.ts); the
// server checks it with its zod schema (plan-request.ts). Both must answer alike: the same
// request out when it passes, and the same message for each field when it does not, so the
// words beside a field are the same whether the browser or the server found the fault.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkPlanRequest } from '@/lib/shared/plan-check';
import { PLAN_FIELD_NAMES, PLAN_FIELDS } from '@/lib/shared/plan-messages';
import { cuffRequest, fieldMessages, hemRequest, planRequest, taperRequest } from '@/lib/shared/plan-request';

/** What the server makes of a body: the endpoint's first message, per-field messages, or the parsed request. */
function server(body: unknown) {
  const parsed = planRequest.safeParse(body);
  if (parsed.success) return { ok: true as const, value: JSON.parse(JSON.stringify(parsed.data)) };
  const fields = fieldMessages(parsed.error);
  return { ok: false as const, error: Object.values(fields)[0] ?? parsed.error.issues[0]?.message, issues: fields };
}

function client(body: unknown) {
  const c = checkPlanRequest(body);
  return c.ok ? { ok: true as const, value: JSON.parse(JSON.stringify(c.value)) } : c;
}

const length = fc.oneof(
  fc.constantFrom(undefined, '', '   ', '1 1/2', ' 38 mm ', '4 1/2 + 1/2', 'abc', '\u0000', 'pair \ud800', '\udc00', '1 \u200b1/2', null, true, {}, []),
  fc.string({ maxLength: 60 }),
  fc.string({ minLength: 38, maxLength: 50, unit: fc.constantFrom('1', ' ', '/', 'a') }),
  fc.double(),
  fc.integer({ min: -200_000, max: 200_000 }),
  fc.constantFrom(100_000, -100_000, 100_000.5, Number.NaN, Number.POSITIVE_INFINITY),
);

const body = fc.record(
  {
    kind: fc.oneof(
      { weight: 8, arbitrary: fc.constantFrom('cuff', 'hem', 'taper', 'hem-taper') },
      { weight: 1, arbitrary: fc.constantFrom(undefined, 'sleeve', 3) },
    ),
    unit: fc.oneof({ weight: 8, arbitrary: fc.constantFrom('in', 'cm', 'mm') }, { weight: 1, arbitrary: fc.constantFrom(undefined, 'ft', 'IN') }),
    precision: fc.constantFrom(undefined, 8, 16, 32, 4, '8'),
    ...Object.fromEntries(Object.keys(PLAN_FIELD_NAMES).map((k) => [k, length])),
  },
  { requiredKeys: [] },
);

describe('the calculator’s check answers as the server’s schema does', () => {
  it('for generated bodies: the same request out, or the same message for every field', () => {
    fc.assert(
      fc.property(body, (b) => {
        expect(client(b)).toEqual(server(b));
      }),
      { numRuns: 1000 },
    );
  });

  it('for the bad inputs a person types into the form', () => {
    const cases: [Record<string, unknown>, string, string][] = [
      [{ kind: 'cuff', unit: 'in', cuffDepth: '' }, 'cuffDepth', 'Enter the cuff depth.'],
      [{ kind: 'cuff', unit: 'in', cuffDepth: '    ' }, 'cuffDepth', 'Enter the cuff depth.'],
      [{ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2 + '.repeat(6) }, 'cuffDepth', 'Cuff depth is too long: type a length such as 1 1/2.'],
      [
        { kind: 'cuff', unit: 'mm', cuffDepth: '40', available: 'a\u0000' },
        'available',
        'Remove the hidden character (a NUL or a broken emoji) from this field.',
      ],
      [{ kind: 'hem', unit: 'cm', slope: 'x'.repeat(41) }, 'slope', 'Slope is too long: type a length such as 1 1/2.'],
      [
        { kind: 'taper', unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '8', widthAbove: '10', heightAbove: '' },
        'heightAbove',
        'Enter the height above the edge.',
      ],
      [
        { kind: 'taper', unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '8', widthAbove: '10', heightAbove: '12', seamAllowance: 'y'.repeat(45) },
        'seamAllowance',
        'Seam allowance is too long: type a length such as 1 1/2.',
      ],
    ];
    for (const [b, field, message] of cases) {
      const c = checkPlanRequest(b);
      expect(c.ok === false && c.issues[field], JSON.stringify(b)).toBe(message);
      expect(server(b).issues?.[field]).toBe(message);
    }
  });

  it('knows each kind’s lengths in the schema’s order', () => {
    const lengths = (shape: object) => Object.keys(shape).filter((k) => !['kind', 'unit', 'precision'].includes(k));
    expect(PLAN_FIELDS.cuff.fields).toEqual(lengths(cuffRequest.shape));
    expect(PLAN_FIELDS.hem.fields).toEqual(lengths(hemRequest.shape));
    expect(PLAN_FIELDS.taper.fields).toEqual(lengths(taperRequest.shape));
  });

  it('passes what the calculator sends, trimmed and with blank lengths left out', () => {
    expect(checkPlanRequest({ kind: 'cuff', unit: 'in', precision: 16, cuffDepth: ' 1 1/2 ', available: '', turnUnder: '1/2' })).toEqual({
      ok: true,
      value: { kind: 'cuff', unit: 'in', precision: 16, cuffDepth: '1 1/2', turnUnder: '1/2' },
    });
  });
});
