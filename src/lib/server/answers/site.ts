// What the account, photo, health and callback routes answer, as zod schemas of the JSON sent (dates
// as ISO strings); route() holds each handler's return type to its schema, and the API document
// shows them (DEVELOPERS.md "Adding an API route").
import { z } from 'zod';
import { FINISHES, LEGS } from '@/lib/shared/measurement-request';
import { ROLES } from '@/lib/shared/roles';

/** Who is signed in, and their shop. */
export const meJson = z.object({ name: z.string(), email: z.string(), role: z.enum(ROLES), shop: z.object({ id: z.string(), name: z.string() }) });

/** The shop a sign-up opened (the session cookie comes with it). */
export const shopCreatedJson = z.object({ shopId: z.string() });

/** A pending invitation as the invitee sees it. */
export const invitationJson = z.object({ id: z.string(), email: z.string(), role: z.enum(ROLES), shopName: z.string(), hasAccount: z.boolean() });

/** The shop an accepted invitation joined (the session cookie comes with it). */
export const invitationAcceptedJson = z.object({ shopName: z.string() });

/** One fitting photo as listed. */
export const photoJson = z.object({
  id: z.string(),
  name: z.string(),
  mimeType: z.string(),
  bytes: z.number().int(),
  url: z.string(),
  thumbUrl: z.string(),
  hasThumb: z.boolean(),
  uploadedBy: z.string().nullable(),
  createdAt: z.string(),
});

/** A garment's photos and the size limit of one. */
export const photoListJson = z.object({ photos: z.array(photoJson), maxBytes: z.number().int() });

/** A photo removed. */
export const photoDeletedJson = z.object({ id: z.string(), deleted: z.literal(true) });

/** This server's health (the same shape at 200 and 503). */
export const healthJson = z.object({
  ok: z.boolean(),
  started: z.boolean(),
  database: z.enum(['reachable', 'unreachable']),
  kind: z.enum(['pglite', 'postgres']),
  migrations: z.enum(['current', 'behind', 'ahead', 'unknown']),
  shipped: z.number().int(),
  applied: z.number().int().nullable(),
  error: z.string().optional(),
});

/** A payment event taken in. */
export const webhookReceivedJson = z.object({ received: z.literal(true), message: z.string() });

/** An SMS delivery report taken in; `recorded` false when it named no notice of ours. */
export const smsReceivedJson = z.object({ received: z.literal(true), recorded: z.boolean() });

/** A message the local capture holds (mail or text), newest first. */
export const sentMessageJson = z.object({
  id: z.string(),
  at: z.string(),
  kind: z.string(),
  channel: z.enum(['email', 'sms']),
  to: z.string(),
  subject: z.string(),
  text: z.string().nullable(),
});

/** An earlier fitting of the customer, offered as "same as last time". */
export const previousFittingJson = z.object({
  garmentId: z.string(),
  kind: z.string(),
  description: z.string(),
  ticketNumber: z.number().int(),
  ticketLabel: z.string(),
  takenAt: z.string(),
  unit: z.enum(['in', 'cm', 'mm']),
  legs: z.array(
    z.object({
      leg: z.enum(LEGS),
      finish: z.enum(FINISHES),
      preset: z.string().nullable(),
      finishedLength: z.string().nullable(),
      cuffDepth: z.string().nullable(),
    }),
  ),
});
