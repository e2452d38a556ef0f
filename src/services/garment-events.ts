// The hook other parts of the shop listen on when a garment moves a step (the counter's ready
// notice, closing a ticket at pickup). Listeners register themselves at import time.
import type { Garment } from '@/db/schema';
import type { Actor } from '@/lib/server/api';

/** Everyone to tell after a garment's step changed. */
export const garmentMovedListeners: Array<(actor: Actor, garment: Garment) => Promise<void>> = [];

/** Tells every listener, one after another; a listener's failure is logged, never undoes the move. */
export async function onGarmentMoved(actor: Actor, garment: Garment): Promise<void> {
  for (const listener of garmentMovedListeners) {
    try {
      await listener(actor, garment);
    } catch (e) {
      console.error('a garment-moved listener failed', e);
    }
  }
}
