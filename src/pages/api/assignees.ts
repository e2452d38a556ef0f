// The people of the shop a garment can be given to, for the pickers on the bench screens.
import { route } from '@/lib/server/route';
import { staffOf } from '@/services/garments';
import { personJson } from '@/lib/server/answers/bench';
import { z } from 'zod';

/** The shop's people by name, with their roles. */
export const GET = route(
  { summary: "The shop's people a garment can be given to, with their roles.", permission: ['tickets', 'read'], responses: { 200: z.array(personJson) } },
  ({ actor }) => staffOf(actor),
);
