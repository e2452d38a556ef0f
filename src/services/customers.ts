// A shop's customers.
import { and, asc, eq } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { customers, type Customer } from '@/db/schema';
import type { customerInput } from '@/db/schema/customers';
import type { Actor } from '@/lib/api';
import type { customerPatch } from '@/lib/bench-requests';
import { audit } from './audit';
import { ServiceError } from './errors';
import { isUuid } from './garments';

/** Every customer of the actor's shop, by name. */
export async function listCustomers(actor: Actor): Promise<Customer[]> {
  return db.select().from(customers).where(eq(customers.shopId, actor.shopId)).orderBy(asc(customers.name));
}

/** Adds a customer to the actor's shop. */
export async function createCustomer(actor: Actor, input: z.infer<typeof customerInput>): Promise<Customer> {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(customers).values({ ...input, shopId: actor.shopId }).returning();
    await audit(tx, actor.shopId, actor.userId, 'customer.created', row!.id);
    return row!;
  });
}

/** One customer of the actor's shop; 404 for anyone else's. */
export async function getCustomer(actor: Actor, id: string): Promise<Customer> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such customer in this shop.');
  const [row] = await db.select().from(customers).where(and(eq(customers.id, id), eq(customers.shopId, actor.shopId)));
  if (!row) throw new ServiceError(404, 'No such customer in this shop.');
  return row;
}

/** Changes a customer's name, phone, e-mail or notes; the old and new values are audited. */
export async function updateCustomer(actor: Actor, id: string, patch: z.output<typeof customerPatch>): Promise<Customer> {
  const was = await getCustomer(actor, id);
  const changes: Record<string, { old: unknown; new: unknown }> = {};
  for (const key of ['name', 'phone', 'email', 'notes'] as const) {
    if (patch[key] !== undefined && patch[key] !== was[key]) changes[key] = { old: was[key], new: patch[key] };
  }
  if (Object.keys(changes).length === 0) return was;
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(customers)
      .set(Object.fromEntries(Object.entries(changes).map(([k, v]) => [k, v.new])))
      .where(and(eq(customers.id, id), eq(customers.shopId, actor.shopId)))
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'customer.changed', id, changes);
    return row!;
  });
}
