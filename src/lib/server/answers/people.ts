// What the customers, staff and presets routes answer, as zod schemas of the JSON sent (dates as
// ISO strings); the types they describe are in src/lib/shared (customer-types.ts, staff-views.ts,
// preset-settings.ts) and src/db/schema, and route() holds each handler's return type to its schema.
import { z } from 'zod';
import { customerJson } from '@/db/schema/customers';
import { auditEntryJson } from './bench';
import { CONTACT_PREFERENCES } from '@/lib/shared/contact-channels';
import { GARMENT_STEPS } from '@/lib/shared/garment-steps';
import { presetSettings } from '@/lib/shared/preset-settings';
import { ROLES } from '@/lib/shared/roles';

const step = z.enum(GARMENT_STEPS);
const role = z.enum(ROLES);

/** A customer found by the search box, with their latest ticket. */
export const customerHitJson = customerJson.pick({ id: true, name: true, phone: true, email: true }).extend({
  lastTicket: z.number().int().nullable(),
  lastTicketLabel: z.string().nullable(),
});

/** A customer's own details as the customers screen edits them. */
export const customerDetailsJson = customerJson.pick({ id: true, name: true, phone: true, email: true, notes: true, erasedAt: true, createdAt: true }).extend({
  contactBy: z.enum(CONTACT_PREFERENCES),
});

const money = { id: z.string(), method: z.string(), amountMinor: z.number().int(), currency: z.string(), at: z.string() };

/** Everything the customers screen shows about one customer. */
export const customerFileJson = z.object({
  customer: customerDetailsJson,
  tickets: z.array(
    z.object({
      id: z.string(),
      number: z.number().int(),
      label: z.string(),
      status: step,
      dueOn: z.string().nullable(),
      createdAt: z.string(),
      garments: z.array(z.object({ id: z.string(), description: z.string(), status: step })),
      payments: z.array(z.object(money)),
      refunds: z.array(z.object({ ...money, status: z.string() })),
      notices: z.array(z.object({ id: z.string(), kind: z.string(), status: z.string(), sentAt: z.string().nullable() })),
    }),
  ),
  history: z.array(auditEntryJson),
});

/** One person on the staff list. */
export const staffMemberJson = z.object({ id: z.string(), userId: z.string(), name: z.string(), email: z.string(), role, since: z.string() });
/** A pending invitation. */
export const pendingInviteJson = z.object({ id: z.string(), email: z.string(), role, expiresAt: z.string() });
/** The staff screen: members and pending invitations. */
export const staffListJson = z.object({ members: z.array(staffMemberJson), invitations: z.array(pendingInviteJson) });
/** A member's new role. */
export const roleChangedJson = z.object({ id: z.string(), role });
/** A member removed. */
export const memberRemovedJson = z.object({ id: z.string(), removed: z.boolean() });

/** A preset as listed: the shop's (house) or the caller's own, with its settings. */
export const presetViewJson = z.object({ id: z.string(), name: z.string(), house: z.boolean(), isDefault: z.boolean(), settings: presetSettings });
/** One kept edit of a preset. */
export const presetChangeJson = z.object({
  id: z.string(),
  at: z.string(),
  actorName: z.string().nullable(),
  field: z.string(),
  old: z.union([z.string(), z.boolean()]).nullable(),
  new: z.union([z.string(), z.boolean()]).nullable(),
});
/** A preset deleted. */
export const presetDeletedJson = z.object({ id: z.string(), deleted: z.literal(true) });
