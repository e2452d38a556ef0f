// POST /api/plan: the public calculator's one endpoint. Parse, ask the engine, answer JSON.
import type { APIRoute } from 'astro';
import {
  AllowanceError,
  checkHemTaper,
  checkTaper,
  isAllowanceError,
  planCuff,
  planHem,
  validateCuffInput,
  validateHemInput,
  validateHemTaperInput,
  validateTaperInput,
  type AllowanceErrorCode,
} from '@/lib/allowance';
import { readJson } from '@/lib/api';
import { fieldMessages, planRequest, type PlanErrorBody, type PlanRequest, type PlanResponse } from '@/lib/plan-request';

export const prerender = false;

// Lengths that read fine but cannot be made (a cuff of 0, a taper with no leg) are 422; unreadable ones 400.
const IMPOSSIBLE: ReadonlySet<AllowanceErrorCode> = new Set(['not-positive', 'negative', 'out-of-range']);

function json(status: number, body: PlanResponse | PlanErrorBody): Response {
  return Response.json(body, { status, headers: { 'cache-control': 'no-store' } });
}

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

function refused(req: PlanRequest, err: AllowanceError): Response {
  const errors = allRefusals(req, err);
  const fields: Record<string, string> = {};
  for (const e of errors) if (e.field && !(e.field in fields)) fields[e.field] = e.message;
  const status = errors.every((e) => IMPOSSIBLE.has(e.code)) ? 422 : 400;
  return json(status, { error: errors[0]?.message ?? err.message, fields });
}

/** Plans a cuff, a plain hem or a taper check (under a cuff or a plain hem) from the posted lengths. */
export const POST: APIRoute = async ({ request }) => {
  const read = await readJson(request);
  if (read instanceof Response) {
    if (read.status !== 400) return read;
    return json(400, { error: 'Send the plan as JSON, for example {"kind":"cuff","unit":"in","cuffDepth":"1 1/2"}.', fields: {} });
  }
  const body = read.value;

  const parsed = planRequest.safeParse(body);
  if (!parsed.success) {
    const fields = fieldMessages(parsed.error);
    const first = Object.values(fields)[0] ?? parsed.error.issues[0]?.message ?? 'The plan is not in the expected shape.';
    return json(400, { error: first, fields });
  }

  try {
    return json(200, plan(parsed.data));
  } catch (err) {
    if (isAllowanceError(err)) return refused(parsed.data, err);
    console.error('POST /api/plan failed', err);
    return json(500, { error: 'The calculator hit a problem on our side. Your entries are kept; try again.', fields: {} });
  }
};
