// "Same as last time": the customer's earlier fittings, offered when a garment is taken in.
import { route } from '@/lib/server/route';
import { previousFittings } from '@/services/fitting-copy';
import { previousFittingJson } from '@/lib/server/answers/site';
import { z } from 'zod';

/** The customer's latest fittings per garment kind; for whoever takes garments in. */
export const GET = route(
  {
    summary: 'The customer\'s latest fittings per garment kind ("same as last time" at intake).',
    permission: ['tickets', 'create'],
    responses: { 200: z.array(previousFittingJson) },
  },
  ({ actor, params }) => previousFittings(actor, params.id!),
);
