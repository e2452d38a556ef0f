// Shared fixtures for the garment service tests: tickets with a garment, fittings typed and saved.
import type { Actor } from '@/lib/server/api';
import type { IntakeInput } from '@/lib/shared/bench-requests';
import { blankLeg, measurementsRequest, type Finish } from '@/lib/shared/measurement-request';
import { garmentsOfTicket } from '@/services/garments';
import { readLengths, saveMeasurements } from '@/services/measurements';
import { createTicket } from '@/services/tickets';
import type { Shop } from './fixtures';

/** Opens a ticket at the shop's counter and returns it with its first garment. */
export async function openTicket(shop: Shop, intake: IntakeInput) {
  const ticket = await createTicket(shop.counter, intake);
  return { ticket, garment: (await garmentsOfTicket(shop.shopId, ticket.id))[0]! };
}

/** A fitting as the form sends it: each leg's typed lengths over a blank leg of the finish. */
export function fittingRequest(left: Record<string, string>, right: Record<string, string> = left, unit: 'in' | 'cm' | 'mm' = 'in', finish: Finish = 'cuff') {
  return measurementsRequest.parse({ unit, legs: { left: { ...blankLeg(finish), ...left }, right: { ...blankLeg(finish), ...right } } });
}

/** Reads and saves a fitting as the actor; a length that cannot be read fails the test. */
export async function saveFitting(actor: Actor, garmentId: string, input: ReturnType<typeof fittingRequest>) {
  const read = readLengths(input);
  if (!read.ok) throw new Error(JSON.stringify(read.issues));
  return saveMeasurements(actor, garmentId, input, read.legs);
}
