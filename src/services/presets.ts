// House presets (kept by the lead) and each person's own: named settings that fill a leg's plan.
import { and, asc, desc, eq, isNull, ne, or, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import { measurements, presets, type Preset } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { isAllowanceError, parseLength, validateCuffInput, validateHemInput } from '@/lib/allowance';
import {
  LENGTHS_OF,
  PRESET_LENGTHS,
  type PresetChange,
  type PresetLength,
  type PresetSettings,
  type PresetView,
  type presetCreateInput,
  type presetUpdateInput,
} from '@/lib/shared/preset-settings';
import { ServiceError } from './errors';
import { audit, auditMany, auditOf } from './audit';
import { isUuid } from './ticket-core';

/** Keeps only the lengths the finish uses (a hem allowance means nothing on a cuff). */
export function normaliseSettings(s: PresetSettings): PresetSettings {
  const out: PresetSettings = { finish: s.finish, unit: s.unit };
  for (const k of LENGTHS_OF[s.finish]) if (s[k] !== undefined) out[k] = s[k];
  return out;
}

/**
 * What the engine says about the settings' lengths, one message per field (`settings.cuffDepth`…);
 * empty when every length reads and a plan could be made with them.
 */
export function settingsIssues(s: PresetSettings): Record<string, string> {
  const issues: Record<string, string> = {};
  const kept = normaliseSettings(s);
  for (const k of LENGTHS_OF[kept.finish]) {
    const text = kept[k];
    if (text === undefined) continue;
    try {
      parseLength(text, kept.unit);
    } catch (e) {
      if (!isAllowanceError(e)) throw e;
      issues[`settings.${k}`] = `${PRESET_LENGTHS[k]}: ${e.message}`;
    }
  }
  if (Object.keys(issues).length) return issues;
  const refusals = kept.finish === 'cuff' ? validateCuffInput(kept) : validateHemInput(kept);
  for (const e of refusals) issues[`settings.${e.field ?? 'finish'}`] ??= e.message;
  return issues;
}

function view(row: Preset): PresetView {
  return { id: row.id, name: row.name, house: row.ownerId === null, isDefault: row.isDefault, settings: row.settings };
}

function visibleTo(actor: Actor) {
  return and(eq(presets.shopId, actor.shopId), or(isNull(presets.ownerId), eq(presets.ownerId, actor.userId)));
}

/** The shop's house presets (the default first) then the actor's own, by name. */
export async function listPresets(actor: Actor): Promise<PresetView[]> {
  const rows = await db.select().from(presets).where(visibleTo(actor)).orderBy(sql`${presets.ownerId} is not null`, desc(presets.isDefault), asc(presets.name));
  return rows.map(view);
}

/** 'house' or 'own' for a preset the actor can see, or null (someone else's, another shop's, no such id). */
export async function presetScope(actor: Actor, id: string): Promise<'house' | 'own' | null> {
  if (!isUuid(id)) return null;
  const [row] = await db
    .select({ ownerId: presets.ownerId })
    .from(presets)
    .where(and(eq(presets.id, id), visibleTo(actor)));
  if (!row) return null;
  return row.ownerId === null ? 'house' : 'own';
}

async function nameTaken(tx: Db, actor: Actor, ownerId: string | null, name: string, except?: string) {
  const [row] = await tx
    .select({ id: presets.id })
    .from(presets)
    .where(
      and(
        eq(presets.shopId, actor.shopId),
        ownerId === null ? isNull(presets.ownerId) : eq(presets.ownerId, ownerId),
        sql`lower(${presets.name}) = lower(${name})`,
        except ? ne(presets.id, except) : undefined,
      ),
    );
  return Boolean(row);
}

function checkSettings(s: PresetSettings): PresetSettings {
  const issues = settingsIssues(s);
  const first = Object.values(issues)[0];
  if (first) throw new ServiceError(422, first);
  return normaliseSettings(s);
}

/** Adds a house preset (the route lets only the lead) or one of the actor's own. */
export async function createPreset(actor: Actor, input: z.output<typeof presetCreateInput>): Promise<PresetView> {
  const house = input.scope === 'house';
  if (input.isDefault && !house) throw new ServiceError(422, 'Only a house preset can be the default.');
  const settings = checkSettings(input.settings);
  const ownerId = house ? null : actor.userId;
  if (await nameTaken(db, actor, ownerId, input.name)) throw new ServiceError(409, `There is already a preset called ${input.name}.`);
  const row = await db.transaction(async (tx) => {
    if (input.isDefault) {
      const moved = await tx
        .update(presets)
        .set({ isDefault: false, updatedAt: new Date() })
        .where(and(eq(presets.shopId, actor.shopId), isNull(presets.ownerId), eq(presets.isDefault, true)))
        .returning({ id: presets.id });
      await auditMany(
        tx,
        moved.flatMap((m) => changeEvents(actor, m.id, { isDefault: true }, { isDefault: false })),
      );
    }
    const [created] = await tx
      .insert(presets)
      .values({ shopId: actor.shopId, ownerId, name: input.name, settings, isDefault: Boolean(input.isDefault) })
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'preset.created', created!.id, { name: created!.name, house, isDefault: created!.isDefault });
    return created!;
  });
  return view(row);
}

async function visibleRow(actor: Actor, id: string): Promise<Preset> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such preset.');
  const [row] = await db
    .select()
    .from(presets)
    .where(and(eq(presets.id, id), visibleTo(actor)));
  if (!row) throw new ServiceError(404, 'No such preset.');
  return row;
}

type FieldValue = string | boolean | null;

/** Each field of a preset as its history names it (a key of PRESET_FIELDS). */
function fieldsOf(row: Pick<Preset, 'name' | 'settings' | 'isDefault'>): Record<string, FieldValue> {
  const out: Record<string, FieldValue> = { name: row.name, finish: row.settings.finish, unit: row.settings.unit, isDefault: row.isDefault };
  for (const k of Object.keys(PRESET_LENGTHS) as PresetLength[]) out[k] = row.settings[k] ?? null;
  return out;
}

/** One `preset.changed` event per field whose value moved (who and when come with the event). */
function changeEvents(actor: Actor, id: string, before: Record<string, FieldValue>, after: Record<string, FieldValue>) {
  return Object.keys(after)
    .filter((field) => before[field] !== after[field])
    .map((field) => ({
      shopId: actor.shopId,
      actorId: actor.userId,
      action: 'preset.changed',
      subject: id,
      detail: { field, old: before[field], new: after[field] },
    }));
}

/**
 * Renames a preset, changes its settings, or makes a house preset the one default. Each value that
 * moved is kept in the preset's history (who, when, old → new); fittings keep pointing at it by id.
 */
export async function updatePreset(actor: Actor, id: string, input: z.output<typeof presetUpdateInput>): Promise<PresetView> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such preset.');
  const settings = input.settings ? checkSettings(input.settings) : undefined;
  const row = await db.transaction(async (tx) => {
    // Read under the row lock, so the history's "old" is what this edit replaced.
    const [before] = await tx
      .select()
      .from(presets)
      .where(and(eq(presets.id, id), visibleTo(actor)))
      .for('update');
    if (!before) throw new ServiceError(404, 'No such preset.');
    if (input.isDefault && before.ownerId !== null) throw new ServiceError(422, 'Only a house preset can be the default.');
    if (input.name && (await nameTaken(tx, actor, before.ownerId, input.name, id))) {
      throw new ServiceError(409, `There is already a preset called ${input.name}.`);
    }
    const events: Parameters<typeof auditMany>[1] = [];
    if (input.isDefault && !before.isDefault) {
      const moved = await tx
        .update(presets)
        .set({ isDefault: false, updatedAt: new Date() })
        .where(and(eq(presets.shopId, actor.shopId), isNull(presets.ownerId), eq(presets.isDefault, true), ne(presets.id, id)))
        .returning({ id: presets.id });
      for (const m of moved) events.push(...changeEvents(actor, m.id, { isDefault: true }, { isDefault: false }));
    }
    const [updated] = await tx
      .update(presets)
      .set({ name: input.name, settings, isDefault: input.isDefault, updatedAt: new Date() })
      .where(and(eq(presets.id, id), eq(presets.shopId, actor.shopId)))
      .returning();
    if (updated!.name !== before.name) {
      // Fittings show the name through the id; the name they keep is for after a removal, kept current.
      await tx
        .update(measurements)
        .set({ preset: updated!.name })
        .where(and(eq(measurements.presetId, id), eq(measurements.shopId, actor.shopId)));
    }
    events.push(...changeEvents(actor, id, fieldsOf(before), fieldsOf(updated!)));
    await auditMany(tx, events);
    return updated!;
  });
  return view(row);
}

/** A preset's kept edits, newest first (its creation last); 404 for a preset the actor cannot see. */
export async function presetHistory(actor: Actor, id: string): Promise<PresetChange[]> {
  const row = await visibleRow(actor, id);
  const entries = await auditOf(actor.shopId, [row.id], ['preset.created', 'preset.changed']);
  return entries.map((e) => {
    const d = e.detail;
    const created = e.action === 'preset.created';
    return {
      id: e.id,
      at: e.at,
      actorName: e.actorName,
      field: created ? 'created' : String(d.field),
      old: created ? null : ((d.old ?? null) as FieldValue),
      new: created ? String(d.name) : ((d.new ?? null) as FieldValue),
    };
  });
}

/**
 * The preset a fitting may record: a house preset of the actor's shop or the actor's own, else
 * null (another shop's, someone else's, removed, not an id): a stranger's id is never usable.
 */
export async function usablePreset(tx: Db, actor: Actor, id: string): Promise<{ id: string; name: string } | null> {
  if (!isUuid(id)) return null;
  // Held until the fitting's transaction ends: a removal at the same moment waits, never a broken link.
  const [row] = await tx
    .select({ id: presets.id, name: presets.name })
    .from(presets)
    .where(and(eq(presets.id, id), visibleTo(actor)))
    .for('share');
  return row ?? null;
}

/** Removes a preset; removing the house default leaves the shop without one until the lead picks another. */
export async function deletePreset(actor: Actor, id: string): Promise<{ id: string; deleted: true }> {
  const row = await visibleRow(actor, id);
  await db.transaction(async (tx) => {
    await tx.delete(presets).where(and(eq(presets.id, id), eq(presets.shopId, actor.shopId)));
    await audit(tx, actor.shopId, actor.userId, 'preset.deleted', id, { name: row.name, house: row.ownerId === null });
  });
  return { id, deleted: true };
}

/**
 * A new shop's house presets: the usual cuff depths (1¼ trim, 1½ classic, 1¾ wide: common practice,
 * no source; TRADE.md) and two metric ones, the classic cuff as the default.
 */
export const STARTER_HOUSE_PRESETS: { name: string; isDefault?: boolean; settings: PresetSettings }[] = [
  { name: 'Trim cuff', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/4', turnUnder: '1/2' } },
  { name: 'Classic cuff', isDefault: true, settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2', turnUnder: '1/2' } },
  { name: 'Wide cuff', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 3/4', turnUnder: '1/2' } },
  { name: 'Metric cuff 35', settings: { finish: 'cuff', unit: 'mm', cuffDepth: '35', turnUnder: '12' } },
  { name: 'Metric cuff 40', settings: { finish: 'cuff', unit: 'mm', cuffDepth: '40', turnUnder: '12' } },
];

/** Gives a shop the starter house presets (demo seed). */
export async function seedHousePresets(shopId: string): Promise<void> {
  await db
    .insert(presets)
    .values(STARTER_HOUSE_PRESETS.map((p) => ({ shopId, ownerId: null, name: p.name, settings: p.settings, isDefault: Boolean(p.isDefault) })));
}
