// House presets (kept by the lead) and each person's own: named settings that fill a leg's plan.
import { and, asc, desc, eq, isNull, ne, or, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { presets, type Preset } from '@/db/schema';
import type { Actor } from '@/lib/api';
import { isAllowanceError, parseLength, validateCuffInput, validateHemInput } from '@/lib/allowance';
import { LENGTHS_OF, PRESET_LENGTHS, type PresetSettings, type PresetView, type presetCreateInput, type presetUpdateInput } from '@/lib/preset-settings';
import { ServiceError } from './errors';
import { audit } from './audit';
import { isUuid } from './garments';


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
  const rows = await db
    .select()
    .from(presets)
    .where(visibleTo(actor))
    .orderBy(sql`${presets.ownerId} is not null`, desc(presets.isDefault), asc(presets.name));
  return rows.map(view);
}

/** 'house' or 'own' for a preset the actor can see, or null (someone else's, another shop's, no such id). */
export async function presetScope(actor: Actor, id: string): Promise<'house' | 'own' | null> {
  if (!isUuid(id)) return null;
  const [row] = await db.select({ ownerId: presets.ownerId }).from(presets).where(and(eq(presets.id, id), visibleTo(actor)));
  if (!row) return null;
  return row.ownerId === null ? 'house' : 'own';
}

async function nameTaken(actor: Actor, ownerId: string | null, name: string, except?: string) {
  const [row] = await db
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
  if (await nameTaken(actor, ownerId, input.name)) throw new ServiceError(409, `There is already a preset called ${input.name}.`);
  const row = await db.transaction(async (tx) => {
    if (input.isDefault) await tx.update(presets).set({ isDefault: false }).where(and(eq(presets.shopId, actor.shopId), isNull(presets.ownerId)));
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
  const [row] = await db.select().from(presets).where(and(eq(presets.id, id), visibleTo(actor)));
  if (!row) throw new ServiceError(404, 'No such preset.');
  return row;
}

/** Renames a preset, changes its settings, or makes a house preset the one default. */
export async function updatePreset(actor: Actor, id: string, input: z.output<typeof presetUpdateInput>): Promise<PresetView> {
  const before = await visibleRow(actor, id);
  if (input.isDefault && before.ownerId !== null) throw new ServiceError(422, 'Only a house preset can be the default.');
  const settings = input.settings ? checkSettings(input.settings) : undefined;
  if (input.name && (await nameTaken(actor, before.ownerId, input.name, id))) {
    throw new ServiceError(409, `There is already a preset called ${input.name}.`);
  }
  const row = await db.transaction(async (tx) => {
    if (input.isDefault) {
      await tx.update(presets).set({ isDefault: false }).where(and(eq(presets.shopId, actor.shopId), isNull(presets.ownerId), ne(presets.id, id)));
    }
    const [updated] = await tx
      .update(presets)
      .set({ name: input.name, settings, isDefault: input.isDefault, updatedAt: new Date() })
      .where(and(eq(presets.id, id), eq(presets.shopId, actor.shopId)))
      .returning();
    const changed = Object.keys(input).filter((k) => input[k as keyof typeof input] !== undefined);
    await audit(tx, actor.shopId, actor.userId, input.isDefault ? 'preset.default-set' : 'preset.updated', id, { name: updated!.name, changed });
    return updated!;
  });
  return view(row);
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
  await db.insert(presets).values(STARTER_HOUSE_PRESETS.map((p) => ({ shopId, ownerId: null, name: p.name, settings: p.settings, isDefault: Boolean(p.isDefault) })));
}
