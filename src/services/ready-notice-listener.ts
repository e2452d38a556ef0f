// Registers the counter's listener on garment moves: when the last garment of a ticket reaches
// "ready", the shop's automatic ready notice goes out. Imported once from startup.ts.
import { garmentMovedListeners } from './garment-events';
import { autoReadyNotice } from './notices';

garmentMovedListeners.push(async (_actor, garment) => {
  if (garment.status === 'ready') await autoReadyNotice(garment.shopId, garment.ticketId);
});
