// Pricing at intake, before any fitting: each garment's asked-for finish priced from the list as an
// estimate, the lead's kinds of work picked for it, and rush by the one rush rule. Runs inside
// intake's own transaction, so a ticket never stands half priced.
import type { Db } from '@/db';
import { priceLines } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { ExistingFinish } from '@/lib/shared/existing-finish';
import { can } from '@/lib/shared/roles';
import { isRushableWork, priceTicket, sumMinor, type GarmentFacts } from '@/lib/pricing/price-lines';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { liveKinds } from './price-kinds';
import { workKeyOf } from '@/lib/shared/fitting/garment-kinds';
import { priceListOf } from './prices';

/** A garment just taken in, with what the counter asked to price on it. */
export interface IntakeGarment {
  id: string;
  label: string;
  finish: 'hem' | 'cuff' | 'original' | null;
  /** garments.kind: a kind other than trousers is priced by its own line (KIND_PRICE_KEYS) */
  kind?: string;
  existingFinish: ExistingFinish;
  /** ids of the lead's kinds of work */
  work: readonly string[];
}

/** Writes the intake's lines on the new ticket through `tx`; returns how many. The finish's line is a
 * worked-out one (`auto`): pricing from the fitting later replaces it. Kinds are lines from the list. */
export async function priceAtIntake(tx: Db, actor: Actor, ticketId: string, garments: readonly IntakeGarment[], rush: boolean): Promise<number> {
  const asked = rush || garments.some((g) => g.finish !== null || g.work.length > 0);
  // A skirt's own line is priced by itself, but only by those who may price: others leave it to the counter.
  const mayPrice = can(actor.role, ['prices', 'adjust']);
  if (!asked && (!mayPrice || !garments.some((g) => workKeyOf(g.kind)))) return 0;
  if (!mayPrice) throw new ServiceError(422, `Your role (${actor.role}) may not price work: leave the finish, the kinds of work and rush to the counter.`);
  const list = await priceListOf(actor.shopId, tx);
  const kinds = await liveKinds(
    tx,
    actor.shopId,
    garments.flatMap((g) => g.work),
  );
  const facts: GarmentFacts[] = garments
    .filter((g) => g.finish !== null || workKeyOf(g.kind))
    .map((g) => ({ garmentId: g.id, label: g.label, finish: g.finish, taperLetOut: false, oldCuff: g.existingFinish === 'cuff', workKey: workKeyOf(g.kind) }));
  const kindLines = garments.flatMap((g) =>
    g.work.map((id) => {
      const k = kinds.get(id)!;
      return {
        garmentId: g.id,
        key: null,
        kindId: k.id,
        rushApplies: k.rushApplies,
        source: 'list' as const,
        label: `${k.name} — ${g.label}`,
        amountMinor: k.amountMinor,
      };
    }),
  );
  // The same pure rule as every other way of pricing (RUSH_RULE): kinds count as work when rush applies to them.
  const priced = priceTicket(facts, list, { rush, otherWork: kindLines.some(isRushableWork) });
  const rushLines = priced.lines.filter((l) => l.key === 'rush');
  if (rush && rushLines.length === 0)
    throw new ServiceError(422, 'Rush goes on a ticket with work priced on it: pick a finish, or a kind of work rush applies to.');
  // Each garment's lines together (finish, then its kinds), rush last, as the ticket shows them.
  const ordered = [
    ...garments.flatMap((g) => [
      ...priced.lines.filter((l) => l.garmentId === g.id).map((l) => ({ ...l, source: 'auto' as const })),
      ...kindLines.filter((l) => l.garmentId === g.id),
    ]),
    ...rushLines.map((l) => ({ ...l, source: 'auto' as const })),
  ];
  if (ordered.length === 0) return 0;
  // One transaction shares one now(): a millisecond apart keeps the lines in this order.
  const at = Date.now();
  await tx.insert(priceLines).values(ordered.map((l, i) => ({ ...l, shopId: actor.shopId, ticketId, createdById: actor.userId, createdAt: new Date(at + i) })));
  await audit(tx, actor.shopId, actor.userId, 'prices.at-intake', ticketId, { lines: ordered.length, rush, totalMinor: sumMinor(ordered) });
  return ordered.length;
}
