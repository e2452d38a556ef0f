// A garment's fitting measurements per leg: read them with their history; save both legs.
import { problem } from '@/lib/server/api';
import { route } from '@/lib/server/route';
import { measurementsRequest } from '@/lib/shared/measurement-request';
import { fittingOf, readLengths, saveMeasurements } from '@/services/measurements';
import { fittingJson } from '@/lib/server/answers/bench';

/** Both legs as saved and every change to them, newest first. */
export const GET = route(
  {
    summary: "The garment's fitting: both legs as saved and every change to them, newest first.",
    permission: ['measurements', 'read'],
    responses: { 200: fittingJson },
  },
  ({ actor, params }) => fittingOf(actor, params.id!),
);

/** Saves both legs; a length the engine cannot read is 422 with a message for that field. */
export const PUT = route(
  {
    summary: 'Saves both legs of the fitting; a length that cannot be read is refused for its field.',
    permission: ['measurements', 'update'],
    body: measurementsRequest,
    examples: [
      {
        summary: 'A cuff on both legs, in inches',
        body: {
          unit: 'in',
          legs: {
            left: { finish: 'cuff', backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' },
            right: { finish: 'cuff', backPin: '31 1/2', cuffDepth: '1 1/2', available: '4 3/4' },
          },
        },
      },
    ],
    responses: { 200: fittingJson },
  },
  ({ actor, params, body }) => {
    const read = readLengths(body);
    if (!read.ok) return problem(422, 'Some lengths could not be read.', read.issues);
    return saveMeasurements(actor, params.id!, body, read.legs);
  },
);
