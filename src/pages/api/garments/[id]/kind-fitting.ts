// A garment fitted once, not per leg (a skirt or dress, a jacket's sleeves): its fitting as saved, and its save.
import { route } from '@/lib/server/route';
import { kindFittingRequest } from '@/lib/shared/kind-fitting-request';
import { kindFittingOf, saveKindFitting } from '@/services/kind-fittings';
import { kindFittingJson } from '@/lib/server/answers/bench';

/** The whole-garment fitting as saved (empty fields until the first save). */
export const GET = route(
  {
    summary: "The fitting of a garment fitted once (a skirt or dress, a jacket's sleeves), as saved: lengths as typed with their mm, and choices.",
    permission: ['measurements', 'read'],
    responses: { 200: kindFittingJson },
  },
  ({ actor, params }) => kindFittingOf(actor, params.id!),
);

/** Saves the whole-garment fitting; a length that cannot be read, or a shape the engine refuses, is 422 for its field. */
export const PUT = route(
  {
    summary: "Saves the fitting of a garment fitted once (a skirt or dress, a jacket's sleeves); what the kind's engine would refuse is refused for its field.",
    permission: ['measurements', 'update'],
    body: kindFittingRequest,
    examples: [
      {
        summary: 'A half-circle skirt levelled from the floor, in inches',
        body: {
          kind: 'skirt',
          unit: 'in',
          fields: {
            hemRound: '110',
            flare: 'circle',
            circleFraction: '1/2',
            hemDepth: '1',
            markerHeight: '16',
            hemFromFloor: '15',
            'pin-centre-front': '2 1/4',
            'pin-centre-back': '2 3/4',
            'cloth-centre-front': '1 1/2',
          },
        },
      },
    ],
    responses: { 200: kindFittingJson },
  },
  ({ actor, params, body }) => saveKindFitting(actor, params.id!, body),
);
