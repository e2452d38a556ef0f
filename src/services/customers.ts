// A shop's customers.
import { asc, eq } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { customers, type Customer } from '@/db/schema';
import type { customerInput } from '@/db/schema/customers';
import type { Actor } from '@/lib/api';
import { audit } from './audit';

/** Every customer of the actor's shop, by name. */
export async function listCustomers(actor: Actor): Promise<Customer[]> {
  return db.select().from(customers).where(eq(customers.shopId, actor.shopId)).orderBy(asc(customers.name));
}

/** Adds a customer to the actor's shop. */
export async function createCustomer(actor: Actor, input: z.infer<typeof customerInput>): Promise<Customer> {
  const [row] = await db.insert(customers).values({ ...input, shopId: actor.shopId }).returning();
  await audit(actor.shopId, actor.userId, 'customer.created', row!.id);
  return row!;
}
