// Stepping a garment back one step after a wrong tap: the queue's "Undo" and the garment page's
// "Step back". Whoever may move garments on may step one back; a collected garment goes back to
// ready only by the lead (reopen), since pickup settled the ticket at the counter.
import type { Garment } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { previousStep, stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';
import { can } from '@/lib/shared/roles';
import { ServiceError } from './errors';
import { visibleGarment, writeStep } from './garments';

/** Moves a garment standing at `from` back one step, recorded in its history as a move marked `back`. */
export async function stepBackGarment(actor: Actor, id: string, from: GarmentStep): Promise<Garment> {
  const g = await visibleGarment(actor, id);
  if (g.status !== from) {
    throw new ServiceError(409, `This garment is ${stepLabel(g.status)} now, not ${stepLabel(from)}: someone moved it meanwhile. Reload and look again.`);
  }
  const to = previousStep(g.status);
  if (!to) throw new ServiceError(422, 'This garment has only been received: there is no step before that.');
  const allowed = g.status === 'collected' ? can(actor.role, ['tickets', 'reopen']) : can(actor.role, ['tickets', 'advance']);
  if (!allowed) {
    throw new ServiceError(
      422,
      g.status === 'collected' ? 'Only the lead can step a collected garment back.' : `Your role (${actor.role}) may not move garments.`,
    );
  }
  return writeStep(actor, g, to, true);
}
