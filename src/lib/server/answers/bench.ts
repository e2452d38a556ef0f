// What the bench's routes answer (tickets, garments, people, settings), as zod schemas of the JSON
// sent (dates as ISO strings): each route declares them in `responses`, route() holds the handler's
// return type to them, and /api/openapi.json shows them. The types they describe live in
// src/lib/shared/bench-types.ts (islands read those) and src/db/schema (rows).
import { z } from 'zod';
import { ticketJson } from '@/db/schema/tickets';
import { SCALES } from '@/lib/shared/bench-requests';
import { CONTACT_PREFERENCES } from '@/lib/shared/contact-channels';
import { EXISTING_FINISHES } from '@/lib/shared/existing-finish';
import { FITTING_RULES } from '@/lib/shared/fitting-rule';
import { GARMENT_STEPS } from '@/lib/shared/garment-steps';
import { LANGUAGES } from '@/lib/shared/i18n/languages';
import { FINISHES, LEG_LENGTHS, LEGS } from '@/lib/shared/measurement-request';
import { WAIST_ORDERS } from '@/lib/shared/waist-order';
import { GARMENT_KINDS } from '@/lib/shared/fitting/garment-kinds';

const step = z.enum(GARMENT_STEPS);

/** A person a garment can be given to. */
export const personJson = z.object({ userId: z.string(), name: z.string(), role: z.string() });

/** The shop's bench settings. */
export const benchSettingsJson = z.object({
  scale: z.enum(SCALES),
  stepLabels: z.partialRecord(step, z.string()),
  fittingRule: z.enum(FITTING_RULES),
  waistOrder: z.enum(WAIST_ORDERS),
  language: z.enum(LANGUAGES),
});

/** The shop's time zone, and whether the lead chose it (else the default). */
export const shopTimeZoneJson = z.object({ timeZone: z.string(), chosen: z.boolean() });

/** A ticket on the list: the row, its customer's name and how many garments. */
export const ticketListItemJson = ticketJson.extend({ customerName: z.string().nullable(), garmentCount: z.number().int() });

/** The customer as a ticket or garment shows them; contact details only for roles that read customers. */
export const customerCardJson = z.object({
  id: z.string(),
  name: z.string(),
  phone: z.string().nullable().optional(),
  email: z.string().nullable().optional(),
  notes: z.string().nullable().optional(),
  contactBy: z.enum(CONTACT_PREFERENCES).optional(),
});

/** A garment as listed on its ticket, with whether a fitting is saved. */
export const ticketGarmentJson = z.object({
  id: z.string(),
  description: z.string(),
  /** what kind of garment (trousers, a skirt or dress) */
  kind: z.enum(GARMENT_KINDS).optional(),
  status: step,
  dueOn: z.string().nullable(),
  assigneeId: z.string().nullable(),
  assigneeName: z.string().nullable(),
  fitted: z.boolean(),
});

/** A ticket with its customer and the garments the role may see. */
export const ticketDetailJson = z.object({
  id: z.string(),
  number: z.number().int(),
  status: step,
  note: z.string().nullable(),
  dueOn: z.string().nullable(),
  createdAt: z.string(),
  customer: customerCardJson.nullable(),
  garments: z.array(ticketGarmentJson),
});

/** A garment with its ticket and customer. */
export const garmentDetailJson = ticketGarmentJson.extend({
  existingFinish: z.enum(EXISTING_FINISHES),
  ticket: ticketDetailJson.pick({ id: true, number: true, status: true, note: true }),
  customer: customerCardJson.nullable(),
});

/** One recorded change (newest first on screen). */
export const auditEntryJson = z.object({
  id: z.string(),
  at: z.string(),
  actorName: z.string().nullable(),
  action: z.string(),
  detail: z.record(z.string(), z.unknown()),
});

/** One leg's fitting as saved: each length as typed and in millimetres. */
export const savedLegJson = z.object({
  leg: z.enum(LEGS),
  unit: z.enum(['in', 'cm', 'mm']),
  finish: z.enum(FINISHES),
  preset: z.string().nullable(),
  presetId: z.string().nullable(),
  // mm: a length's millimetres; a choice or a percent (the shrink allowance) is text only.
  values: z.partialRecord(z.enum(LEG_LENGTHS), z.object({ text: z.string(), mm: z.number().optional() })),
  takenAt: z.string(),
  takenBy: z.string().nullable(),
});

/** A leg's pending waist change and where it moves the pin mark (as the sheet prints it). */
export const waistNoteJson = z.object({
  code: z.enum(['moves', 'movesBy', 'none', 'needs', 'first']),
  change: z.string(),
  by: z.string(),
  direction: z.enum(['down', 'up', 'none']),
  pin: z.string(),
  mark: z.string(),
  rule: z.string(),
  source: z.string(),
});

/** A garment's fitting: both legs as saved and every change, newest first. */
export const fittingJson = z.object({
  legs: z.array(savedLegJson),
  history: z.array(auditEntryJson),
  waist: z.partialRecord(z.enum(LEGS), waistNoteJson).optional(),
});

/** One garment in the queue, with its ticket and customer named (the phone only for roles that read customers). */
export const queueRowJson = ticketGarmentJson.omit({ fitted: true }).extend({
  ticketId: z.string(),
  ticketNumber: z.number().int(),
  customerName: z.string().nullable(),
  customerPhone: z.string().nullable().optional(),
  readyAt: z.string().nullable().optional(),
});

/** A garment fitted once (a skirt or dress): its fitting as saved, lengths as typed with their mm, choices as typed, and the garment's history. */
export const kindFittingJson = z.object({
  kind: z.enum(GARMENT_KINDS).exclude(['trousers']),
  unit: z.enum(['in', 'cm', 'mm']).nullable(),
  values: z.record(z.string(), z.object({ text: z.string(), mm: z.number() })),
  choices: z.record(z.string(), z.string()),
  takenAt: z.string().nullable(),
  takenBy: z.string().nullable(),
  history: z.array(auditEntryJson),
});
