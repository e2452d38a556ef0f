// POST /api/plan: the public calculator's one endpoint. Parse, ask the engine, answer JSON.
import {
  type AllowanceError,
  checkHemTaper,
  checkTaper,
  isAllowanceError,
  planCuff,
  planHem,
  validateCuffInput,
  validateHemInput,
  validateHemTaperInput,
  validateTaperInput,
} from '@/lib/allowance';
import { json, problem } from '@/lib/server/api';
import { planRequest, PLAN_UNREADABLE, type PlanRequest, type PlanResponse } from '@/lib/shared/plan-request';
import { route } from '@/lib/server/route';
import { planAnswerJson, type PlanAnswer } from '@/lib/server/answers/plan';

export const prerender = false;

function plan(req: PlanRequest): PlanResponse {
  switch (req.kind) {
    case 'cuff':
      return planCuff(req);
    case 'hem':
      return planHem(req);
    case 'taper':
      return checkTaper(req);
    case 'hem-taper':
      return checkHemTaper(req);
  }
}

/** Every field the engine refuses, not just the first, so the form can mark them all at once. */
function allRefusals(req: PlanRequest, first: AllowanceError): AllowanceError[] {
  const validate = { cuff: validateCuffInput, hem: validateHemInput, taper: validateTaperInput, 'hem-taper': validateHemTaperInput }[req.kind];
  const all = validate(req);
  return all.length ? all : [first];
}

// Lengths that cannot be read ("1 1/2 furlongs") and lengths that cannot be made (a cuff of 0)
// are both refusals of a readable request: 422, one message per field.
// Beside the English, each refusal's code and values: the page renders them in its own language.
function refused(req: PlanRequest, err: AllowanceError): Response {
  const errors = allRefusals(req, err);
  const issues: Record<string, string> = {};
  const refusals: Record<string, { code: string; values?: Readonly<Record<string, string | number>> }> = {};
  for (const e of errors) {
    if (!e.field || e.field in issues) continue;
    issues[e.field] = e.message;
    refusals[e.field] = e.values ? { code: e.code, values: e.values } : { code: e.code };
  }
  const first = errors[0] ?? err;
  return json({ error: first.message, issues, refusals, refusal: first.values ? { code: first.code, values: first.values } : { code: first.code } }, 422);
}

/** Plans a cuff, a plain hem or a taper check (under a cuff or a plain hem) from the posted lengths. */
export const POST = route(
  {
    summary: 'Plans a cuff or a plain hem, or checks a taper under either, from lengths as typed ("1 1/2", "38 mm").',
    description: 'Public: the calculator on the home page. Lengths may be numbers or text with fractions; blank optional lengths use the usual allowances.',
    permission: 'public',
    body: planRequest,
    unreadable: PLAN_UNREADABLE,
    examples: [
      { summary: 'A 1 1/2 in cuff', body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' } },
      { summary: 'A plain hem in centimetres', body: { kind: 'hem', unit: 'cm', hemAllowance: '4', turnUnder: '1' } },
      {
        summary: 'A 1 3/4 in cuff on 4 in of cloth, an old crease 2 in below the mark: short, with what fits instead',
        body: { kind: 'cuff', unit: 'in', cuffDepth: '1 3/4', available: '4', oldCrease: '2' },
      },
      {
        summary: 'A taper check under a 1 1/2 in cuff, 1/2 in seams',
        body: { kind: 'taper', unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '24', seamAllowance: '1/2' },
      },
      {
        summary: 'A taper check under a plain hem, in millimetres',
        body: { kind: 'hem-taper', unit: 'mm', hemAllowance: '40', widthAtEdge: '180', widthAbove: '205', heightAbove: '300' },
      },
    ],
    responses: { 200: planAnswerJson },
  },
  ({ body }) => {
    try {
      const res = json(plan(body) satisfies PlanAnswer);
      res.headers.set('cache-control', 'no-store');
      return res;
    } catch (err) {
      if (isAllowanceError(err)) return refused(body, err);
      // A fault of ours: the details go to the log, never to a stranger.
      console.error('POST /api/plan failed', err);
      return problem(500, 'The calculator hit a problem on our side. Your entries are kept; try again.');
    }
  },
);
