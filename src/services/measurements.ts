// Fitting measurements per leg: read with the engine's parser on save, kept as typed plus exact
// mm, and every changed value recorded in the audit history (who, when, old and new).
import { and, asc, eq, inArray } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { measurements, presets, user } from '@/db/schema';
import {
  isAllowanceError,
  parseLength,
  validateCuffInput,
  validateHemInput,
  validateHemTaperInput,
  validateOriginalHemInput,
  validateShrinkInput,
  validateTaperInput,
} from '@/lib/allowance';
import { isLengthField } from '@/lib/shared/fitting/kinds';
import { legShrinkInput } from '@/lib/shared/fitting/shrink-input';
import { legHemTaperRequest, legMainRequest, legOriginalHemInput, legTaperRequest } from '@/lib/shared/leg-plan';
import { ORIGINAL_HEM_KEYS } from '@/lib/shared/fitting/plan-lengths';
import type { Actor } from '@/lib/server/api';
import type { FittingView } from '@/lib/shared/bench-types';
import {
  LEG_LENGTH_LABELS,
  LEG_LENGTHS,
  LEGS,
  type Leg,
  type LegLength,
  type Measurements,
  type SavedLeg,
  type SavedLength,
} from '@/lib/shared/measurement-request';
import { auditMany, auditOf } from './audit';
import { lockGarment, visibleGarment } from './garments';
import { ServiceError } from './errors';
import { usablePreset } from './presets';
import { benchSettings } from './shop-settings';
import { scaleUnit } from '@/lib/shared/bench-requests';
import { savedTexts } from '@/lib/server/fitting/saved-leg';
import { waistNoteOf } from '@/lib/server/fitting/waist-note';
import { type WaistOrder, waistFirstRefusal } from '@/lib/shared/waist-order';

/** Both legs' lengths read exactly, or a message for each field that could not be read. */
export type ReadLengths = { ok: true; legs: Record<Leg, Partial<Record<LegLength, SavedLength>>> } | { ok: false; issues: Record<string, string> };

// The engine's names of the kept factory hem's lengths, back to the form's.
const fromEngine: Record<string, string> = Object.fromEntries(Object.entries(ORIGINAL_HEM_KEYS).map(([form, engine]) => [engine, form]));

/**
 * What the engine would refuse in each leg's plans (cuff or hem, and the taper check), keyed by the
 * form's paths: a fitting that cannot be planned is not saved, so its sheet can always be printed.
 * A width at the cutting line is used only on a pair let down first, and the existing finish can be
 * changed after the fitting: the taper is checked both with it and without it.
 */
export function planIssues(input: Measurements): Record<string, string> {
  const issues: Record<string, string> = {};
  for (const leg of LEGS) {
    const typed = input.legs[leg];
    const checks: [object | null, (i: unknown) => { field?: string; message: string }[]][] = [];
    const main = legMainRequest(typed, input.unit);
    if (main) checks.push([main, main.kind === 'hem' ? validateHemInput : validateCuffInput]);
    checks.push([legOriginalHemInput(typed, input.unit), validateOriginalHemInput]);
    for (const letDown of typed.widthAtCut.trim() ? [false, true] : [false]) {
      checks.push([legTaperRequest(typed, input.unit, 8, { letDown }), validateTaperInput]);
      checks.push([legHemTaperRequest(typed, input.unit, 8, { letDown }), validateHemTaperInput]);
    }
    // Unwashed cloth on a hem: the engine's shrink check (its names: cloth, lengthToMark falls back to the pin).
    const shrink = legShrinkInput(typed, typed.finish, input.unit);
    // The shop's own percent counts only with 'other': kept beside a preset it would say a figure the sheet does not use.
    if (shrink && shrink.cloth !== 'other' && typed.shrinkPercent.trim())
      issues[`legs.${leg}.shrinkPercent`] = `${LEG_LENGTH_LABELS.shrinkPercent}: only with “Other”; clear it, or choose Other.`;
    if (shrink)
      for (const e of validateShrinkInput(shrink)) {
        const field =
          e.field === 'cloth' ? 'shrinkCloth' : e.field === 'lengthToMark' && !typed.lengthToMark.trim() && typed.backPin.trim() ? 'backPin' : e.field;
        const named = field && (LEG_LENGTHS as readonly string[]).includes(field) ? (field as LegLength) : 'shrinkCloth';
        const key = `legs.${leg}.${named}`;
        if (!(key in issues)) issues[key] = `${LEG_LENGTH_LABELS[named]}: ${e.message}`;
      }
    for (const [request, validate] of checks) {
      if (!request) continue;
      for (const e of validate(request)) {
        // The engine's names back to the form's (the join's seam allowance); fields not on the form
        // (unit, precision) fall back to the finish's first length: the cuff depth, or the shortening.
        const named = typed.finish === 'original' ? (fromEngine[e.field ?? ''] ?? e.field) : e.field;
        const field = named && (LEG_LENGTHS as readonly string[]).includes(named) ? named : typed.finish === 'original' ? 'shortenBy' : 'cuffDepth';
        const key = `legs.${leg}.${field}`;
        if (!(key in issues)) issues[key] = e.message;
      }
    }
  }
  return issues;
}

/** Reads every length typed for both legs with parseLength, then checks the legs' plans; the issue keys are the form's paths. */
export function readLengths(input: Measurements): ReadLengths {
  const issues: Record<string, string> = {};
  const legs = { left: {}, right: {} } as Record<Leg, Partial<Record<LegLength, SavedLength>>>;
  for (const leg of LEGS) {
    for (const field of LEG_LENGTHS) {
      const text = input.legs[leg][field].trim();
      if (text === '') continue;
      // A choice or percent is kept as its text (no mm): the plan checks below read it.
      if (!isLengthField(field)) {
        legs[leg][field] = { text };
        continue;
      }
      try {
        legs[leg][field] = { text, mm: parseLength(text, input.unit).mm };
      } catch (e) {
        if (!isAllowanceError(e)) throw e;
        issues[`legs.${leg}.${field}`] = e.message;
      }
    }
  }
  if (Object.keys(issues).length === 0) Object.assign(issues, planIssues(input));
  return Object.keys(issues).length ? { ok: false, issues } : { ok: true, legs };
}

/** Both legs' saved measurements of a garment (none until the first fitting is saved), through `q` (a transaction's own). */
export async function legsOf(garmentId: string, q: Db = db): Promise<SavedLeg[]> {
  return (await legsOfGarments([garmentId], q)).get(garmentId) ?? [];
}

/** The saved legs of several garments in one query, by garment id (absent until a fitting is saved), through `q`. */
export async function legsOfGarments(garmentIds: string[], q: Db = db): Promise<Map<string, SavedLeg[]>> {
  const byGarment = new Map<string, SavedLeg[]>();
  if (garmentIds.length === 0) return byGarment;
  // The preset is read through its id, and only within the fitting's own shop: a rename shows at
  // once, and an id from elsewhere (never accepted on save) could not show another shop's name.
  const rows = await q
    .select({ m: measurements, takenBy: user.name, presetId: presets.id, presetName: presets.name })
    .from(measurements)
    .leftJoin(user, eq(user.id, measurements.takenById))
    .leftJoin(presets, and(eq(presets.id, measurements.presetId), eq(presets.shopId, measurements.shopId)))
    .where(inArray(measurements.garmentId, garmentIds))
    .orderBy(asc(measurements.leg));
  for (const { m, takenBy, presetId, presetName } of rows) {
    const legs = byGarment.get(m.garmentId) ?? [];
    legs.push({
      leg: m.leg,
      unit: m.unit,
      finish: m.finish,
      preset: presetName ?? m.preset,
      presetId,
      values: m.values as SavedLeg['values'],
      takenAt: m.takenAt.toISOString(),
      takenBy,
    });
    byGarment.set(m.garmentId, legs);
  }
  return byGarment;
}

/**
 * The preset a leg records, by id: the one it already had (kept even if it is a colleague's own),
 * or a new one only if the actor may use it (the shop's house presets, their own); any other id is
 * refused alike, so another shop's ids cannot be told apart from made-up ones. With no id, only a
 * removed preset's name already on the leg stays.
 */
async function presetOfLeg(
  tx: Db,
  actor: Actor,
  leg: Leg,
  typed: Measurements['legs'][Leg],
  was: SavedLeg | undefined,
): Promise<{ id: string | null; name: string | null }> {
  if (typed.presetId === '') return { id: null, name: !was?.presetId && was?.preset && was.preset === typed.preset ? was.preset : null };
  if (was?.presetId === typed.presetId) return { id: was.presetId, name: was.preset };
  const p = await usablePreset(tx, actor, typed.presetId);
  if (!p) throw new ServiceError(422, `The ${leg} leg's preset is not one you can use here: choose one from the list.`);
  return p;
}

/** In a shop that alters the waist first, a leg with a waist change still to do has no pin yet: the pin's refusal per leg, or null. */
export function waistFirstIssues(input: Measurements, order: WaistOrder): Record<string, string> | null {
  if (order !== 'waist-first') return null;
  const issues: Record<string, string> = {};
  for (const leg of LEGS) {
    const typed = input.legs[leg];
    if (typed.waistChange.trim() && typed.backPin.trim()) issues[`legs.${leg}.backPin`] = waistFirstRefusal(leg);
  }
  return Object.keys(issues).length ? issues : null;
}

/** Saves both legs; each value that changed becomes one audit event. Answers the fitting as saved. */
export async function saveMeasurements(
  actor: Actor,
  garmentId: string,
  input: Measurements,
  read: Record<Leg, Partial<Record<LegLength, SavedLength>>>,
): Promise<FittingView> {
  await visibleGarment(actor, garmentId);
  // The shop's order matters only when a waist change is typed: no settings read on every other save.
  if (LEGS.some((l) => input.legs[l].waistChange.trim())) {
    const refused = waistFirstIssues(input, (await benchSettings(actor.shopId)).waistOrder);
    if (refused) throw new ServiceError(422, Object.values(refused)[0]!, refused);
  }
  const events: Parameters<typeof auditMany>[1] = [];
  const change = (leg: Leg, field: string, old: string | null, now: string | null) => {
    if ((old ?? '') !== (now ?? '')) {
      events.push({
        shopId: actor.shopId,
        actorId: actor.userId,
        action: 'measurement.changed',
        subject: garmentId,
        detail: { leg, field, old: old || null, new: now || null, unit: input.unit },
      });
    }
  };
  // The garment is locked before the old values are read: a save at the same moment waits, and
  // then records its changes from what this one wrote, not from what both saw before.
  await db.transaction(async (tx) => {
    await lockGarment(tx, actor.shopId, garmentId);
    const before = new Map((await legsOf(garmentId, tx)).map((l) => [l.leg, l]));
    for (const leg of LEGS) {
      const was = before.get(leg);
      const typed = input.legs[leg];
      const preset = await presetOfLeg(tx, actor, leg, typed, was);
      change(leg, 'finish', was?.finish ?? null, typed.finish);
      change(leg, 'preset', was?.preset ?? null, preset.name);
      if (was && was.unit !== input.unit) change(leg, 'unit', was.unit, input.unit);
      for (const field of LEG_LENGTHS) change(leg, field, was?.values[field]?.text ?? null, read[leg][field]?.text ?? null);
      const row = {
        unit: input.unit,
        finish: typed.finish,
        preset: preset.name,
        presetId: preset.id,
        values: read[leg],
        takenById: actor.userId,
        takenAt: new Date(),
      };
      await tx
        .insert(measurements)
        .values({ shopId: actor.shopId, garmentId, leg, ...row })
        .onConflictDoUpdate({ target: [measurements.garmentId, measurements.leg], set: row });
    }
    await auditMany(tx, events);
  });
  return fittingOf(actor, garmentId);
}

// The pending waist change's note per leg, in the shop's scale, as the cut sheet prints it.
async function waistNotes(shopId: string, legs: SavedLeg[]): Promise<Pick<FittingView, 'waist'>> {
  if (!legs.some((l) => l.values.waistChange?.text?.trim())) return {};
  const settings = await benchSettings(shopId);
  const { unit, precision } = scaleUnit(settings.scale);
  const waist: NonNullable<FittingView['waist']> = {};
  for (const l of legs) {
    const note = waistNoteOf(savedTexts(l, unit), unit, precision, settings.waistOrder);
    if (note) waist[l.leg] = note;
  }
  return { waist };
}

/** A garment's fitting as its page shows it: both legs and the history of changes, newest first. */
export async function fittingOf(actor: Actor, garmentId: string): Promise<FittingView> {
  const g = await visibleGarment(actor, garmentId);
  const legs = await legsOf(g.id);
  return { legs, history: await auditOf(actor.shopId, [g.id]), ...(await waistNotes(actor.shopId, legs)) };
}
