// A shop's jobs: a ticket per visit, the garments on it and their fitting measurements per leg,
// and the shop's bench settings (measuring unit, its names for the steps).
import { pgTable, text, timestamp, uuid, index, integer, jsonb, date, uniqueIndex } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { createSelectSchema } from 'drizzle-zod';
import { asJson } from '../../lib/shared/as-json';
import { z } from 'zod';
import { DEFAULT_EXISTING_FINISH, EXISTING_FINISHES } from '../../lib/shared/existing-finish';
import { GARMENT_STEPS, type GarmentStep } from '../../lib/shared/garment-steps';
import { FITTING_RULES } from '../../lib/shared/fitting-rule';
import { WAIST_ORDERS } from '../../lib/shared/waist-order';
import { LANGUAGES } from '../../lib/shared/i18n/languages';
import { organization, user } from './auth';
import { customers } from './customers';
import { presets } from './presets';

/** Where a ticket stands: the step of its least advanced garment (kept by services/garments.ts). */
export const TICKET_STATUSES = GARMENT_STEPS;
/** A ticket status: one of the garment steps. */
export type TicketStatus = GarmentStep;

/** Tickets: one per customer visit, carried from intake to pickup. */
export const tickets = pgTable(
  'tickets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    /** said at the counter with the shop's initials (lib/shared/ticket-number.ts): PH 1001, PH 1002 … per shop */
    number: integer('number').notNull(),
    customerId: uuid('customer_id').references(() => customers.id, { onDelete: 'set null' }),
    status: text('status', { enum: GARMENT_STEPS }).notNull().default('received'),
    assigneeId: text('assignee_id').references(() => user.id, { onDelete: 'set null' }),
    dueOn: date('due_on'),
    note: text('note'),
    createdById: text('created_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('tickets_shop_status_idx').on(t.shopId, t.status), uniqueIndex('tickets_shop_number_uidx').on(t.shopId, t.number)],
);

/** Garments on a ticket, each moving through the bench steps on its own. */
export const garments = pgTable(
  'garments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull().default('trousers'),
    finish: text('finish'),
    /** how the bottoms came in: an old cuff is let down before the new finish is made */
    existingFinish: text('existing_finish', { enum: EXISTING_FINISHES }).notNull().default(DEFAULT_EXISTING_FINISH),
    description: text('description'),
    position: integer('position').notNull().default(0),
    status: text('status', { enum: GARMENT_STEPS }).notNull().default('received'),
    assigneeId: text('assignee_id').references(() => user.id, { onDelete: 'set null' }),
    dueOn: date('due_on'),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    // Moves on every update through Drizzle: the queue's ETag (services/queue.ts) is built on it.
    updatedAt: timestamp('updated_at', { withTimezone: true })
      .defaultNow()
      .notNull()
      .$onUpdate(() => new Date()),
  },
  (t) => [
    index('garments_shop_status_idx').on(t.shopId, t.status),
    index('garments_ticket_idx').on(t.ticketId),
    // The queue's two reads (services/queue.ts): open work by due day, and history newest first.
    // The predicates are literal so the queries' literal conditions match them.
    index('garments_shop_open_idx').on(t.shopId, t.dueOn).where(sql`status <> 'collected'`),
    index('garments_shop_history_idx').on(t.shopId, t.createdAt.desc(), t.id.desc()).where(sql`status = 'collected'`),
  ],
);

/** Fitting measurements: one row per garment and leg, each length as typed and in exact mm. */
export const measurements = pgTable(
  'measurements',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    garmentId: uuid('garment_id')
      .notNull()
      .references(() => garments.id, { onDelete: 'cascade' }),
    leg: text('leg', { enum: ['left', 'right'] })
      .notNull()
      .default('left'),
    unit: text('unit', { enum: ['in', 'cm', 'mm'] })
      .notNull()
      .default('in'),
    finish: text('finish', { enum: ['plain', 'slope', 'cuff', 'original'] })
      .notNull()
      .default('cuff'),
    /** the preset's name when it was applied: shown only once the preset itself is removed */
    preset: text('preset'),
    /** the preset applied (house or the taker's own, same shop): its current name is shown through it */
    presetId: uuid('preset_id').references(() => presets.id, { onDelete: 'set null' }),
    /** { field: { text, mm } } for each length given (see src/lib/shared/measurement-request.ts) */
    values: jsonb('values').notNull().default({}),
    takenById: text('taken_by_id').references(() => user.id, { onDelete: 'set null' }),
    takenAt: timestamp('taken_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex('measurements_garment_leg_uidx').on(t.garmentId, t.leg), index('measurements_preset_idx').on(t.presetId)],
);

/** A shop's bench settings: how lengths are typed and shown, and its own names for the steps. */
export const shopSettings = pgTable('shop_settings', {
  shopId: text('shop_id')
    .primaryKey()
    .references(() => organization.id, { onDelete: 'cascade' }),
  scale: text('scale', { enum: ['in8', 'in16', 'cm', 'mm'] })
    .notNull()
    .default('in8'),
  stepLabels: jsonb('step_labels').notNull().default({}),
  /** the shop's IANA time zone, where its days begin and end; null: DEFAULT_TIME_ZONE (src/lib/shared/overview/shop-days.ts) */
  timeZone: text('time_zone'),
  /** a garment passing Chalk-marked with no fitting saved: 'warn' (a confirm on screen) or 'refuse' (the server says no) */
  fittingRule: text('fitting_rule', { enum: FITTING_RULES }).notNull().default('warn'),
  /** a waist change still to do at the fitting: 'record' (the pin mark moves by it) or 'waist-first' (pin after the waist is altered) */
  waistOrder: text('waist_order', { enum: WAIST_ORDERS }).notNull().default('record'),
  /** the language of the shop's screens and cut sheets (src/lib/server/i18n); dates and money follow it */
  language: text('language', { enum: LANGUAGES }).notNull().default('en'),
  updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
});

/** A ticket row as read. */
export const ticketRow = createSelectSchema(tickets);
/** A ticket as the API sends it (dates as ISO strings). */
export const ticketJson = asJson(ticketRow);
/** A garment as the API sends it (dates as ISO strings). */
export const garmentJson = asJson(createSelectSchema(garments));

/** A move of a ticket (all its garments at its step) to the next step. */
export const ticketStatusInput = z.object({ status: z.enum(GARMENT_STEPS, { error: 'Choose one of the bench steps.' }) });

/** A ticket as stored. */
export type Ticket = typeof tickets.$inferSelect;
/** A garment as stored. */
export type Garment = typeof garments.$inferSelect;
/** One leg's measurements as stored. */
export type MeasurementRow = typeof measurements.$inferSelect;
/** A shop's bench settings as stored. */
export type ShopSettings = typeof shopSettings.$inferSelect;
