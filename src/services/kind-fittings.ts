// The fitting of a garment fitted once, not per leg (a skirt or dress; later sleeves): read with the
// engine's parser and its kind's engine on save (nothing it would refuse is kept), stored as typed
// plus exact mm, and every changed value recorded in the audit history.
import { and, eq, inArray } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { kindFittings, user, type Garment } from '@/db/schema';
import { isAllowanceError, parseLength } from '@/lib/allowance';
import type { Unit } from '@/lib/allowance/types';
import type { Actor } from '@/lib/server/api';
import { kindOf, type WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';
import { adapterOf } from '@/lib/shared/fitting/kind-adapters';
import { savedKindTexts, type KindAdapter } from '@/lib/shared/fitting/kind-fields';
import type { KindFittingAnswer, KindFittingInput, KindFittingView, KindSavedLength } from '@/lib/shared/kind-fitting-request';
import { auditMany, auditOf } from './audit';
import { ServiceError } from './errors';
import { lockGarment, visibleGarment } from './garments';

/** A garment whose kind is fitted once, with its adapter; 404 outside the shop, 422 for trousers (fitted per leg). */
async function kindGarment(actor: Actor, garmentId: string): Promise<{ g: Garment; adapter: KindAdapter; kind: WholeGarmentKind }> {
  const g = await visibleGarment(actor, garmentId);
  const kind = kindOf(g.kind);
  const adapter = adapterOf(kind);
  if (!adapter || kind === 'trousers') throw new ServiceError(422, 'This garment is fitted per leg: save its fitting through its measurements.');
  return { g, adapter, kind };
}

/** Reads every length with the engine's parser, then the kind's engine over the whole: issues by the form's paths (`fields.<key>`), or what to keep. */
export function readKindFitting(
  adapter: KindAdapter,
  input: KindFittingInput,
): { ok: true; values: Record<string, KindSavedLength>; choices: Record<string, string> } | { ok: false; issues: Record<string, string> } {
  const issues: Record<string, string> = {};
  const values: Record<string, KindSavedLength> = {};
  const choices: Record<string, string> = {};
  const fields = input.fields as Record<string, string>;
  for (const f of adapter.fields) {
    const typed = (fields[f.key] ?? '').trim();
    if (typed === '') continue;
    if (f.type !== 'length') {
      choices[f.key] = typed;
      continue;
    }
    try {
      values[f.key] = { text: typed, mm: parseLength(typed, input.unit).mm };
    } catch (e) {
      if (!isAllowanceError(e)) throw e;
      issues[`fields.${f.key}`] = e.message;
    }
  }
  if (Object.keys(issues).length === 0) {
    for (const { field, error } of adapter.refusals(fields, input.unit)) {
      const key = `fields.${field}`;
      if (!(key in issues)) issues[key] = error.message;
    }
  }
  return Object.keys(issues).length ? { ok: false, issues } : { ok: true, values, choices };
}

/** The saved fittings of several garments in one query, by garment id, read within the shop (through `q`: a transaction's own). */
export async function kindFittingsOf(shopId: string, garmentIds: string[], q: Db = db): Promise<Map<string, KindFittingView>> {
  const out = new Map<string, KindFittingView>();
  if (garmentIds.length === 0) return out;
  const rows = await q
    .select({ f: kindFittings, takenBy: user.name })
    .from(kindFittings)
    .leftJoin(user, eq(user.id, kindFittings.takenById))
    .where(and(eq(kindFittings.shopId, shopId), inArray(kindFittings.garmentId, garmentIds)));
  for (const { f, takenBy } of rows) {
    out.set(f.garmentId, {
      kind: kindOf(f.kind) as WholeGarmentKind,
      unit: f.unit,
      values: f.values as Record<string, KindSavedLength>,
      choices: f.choices as Record<string, string>,
      takenAt: f.takenAt.toISOString(),
      takenBy,
    });
  }
  return out;
}

// A garment already found in the shop: its saved fitting, or the empty one before the first save.
async function viewOf(shopId: string, garmentId: string, kind: WholeGarmentKind, q: Db = db): Promise<KindFittingView> {
  return (await kindFittingsOf(shopId, [garmentId], q)).get(garmentId) ?? { kind, unit: null, values: {}, choices: {}, takenAt: null, takenBy: null };
}

// The fitting with the garment's history, as the route answers it.
async function answerOf(shopId: string, garmentId: string, kind: WholeGarmentKind): Promise<KindFittingAnswer> {
  return { ...(await viewOf(shopId, garmentId, kind)), history: await auditOf(shopId, [garmentId]) };
}

/** A garment's whole-garment fitting as its page shows it (empty until the first save), with the garment's history, newest first. */
export async function kindFittingOf(actor: Actor, garmentId: string): Promise<KindFittingAnswer> {
  const { g, kind } = await kindGarment(actor, garmentId);
  return answerOf(actor.shopId, g.id, kind);
}

/** Saves a garment's whole-garment fitting; refused (422, by field) when the kind differs or its engine would refuse it. */
export async function saveKindFitting(actor: Actor, garmentId: string, input: KindFittingInput): Promise<KindFittingAnswer> {
  const { g, adapter, kind } = await kindGarment(actor, garmentId);
  if (input.kind !== kind)
    throw new ServiceError(422, `This garment is a ${kind}, not a ${input.kind}: send its own fields.`, { kind: 'Not this garment’s kind.' });
  const read = readKindFitting(adapter, input);
  if (!read.ok) throw new ServiceError(422, 'Some measurements cannot be used.', read.issues);
  const now = { ...read.choices, ...Object.fromEntries(Object.entries(read.values).map(([k, v]) => [k, v.text])) };
  const row = { kind, unit: input.unit as Unit, values: read.values, choices: read.choices, takenById: actor.userId, takenAt: new Date() };
  // The garment is locked before the old values are read: a save at the same moment waits, and
  // then records its changes from what this one wrote, not from what both saw before.
  await db.transaction(async (tx) => {
    await lockGarment(tx, actor.shopId, g.id);
    const was = savedKindTexts(await viewOf(actor.shopId, g.id, kind, tx));
    const events: Parameters<typeof auditMany>[1] = [];
    for (const f of adapter.fields) {
      const old = was[f.key] ?? null;
      const next = now[f.key] ?? null;
      if ((old ?? '') !== (next ?? '')) {
        events.push({
          shopId: actor.shopId,
          actorId: actor.userId,
          action: 'kind-fitting.changed',
          subject: g.id,
          detail: { kind, field: f.key, old, new: next, unit: input.unit },
        });
      }
    }
    await tx
      .insert(kindFittings)
      .values({ shopId: actor.shopId, garmentId: g.id, ...row })
      .onConflictDoUpdate({ target: kindFittings.garmentId, set: row });
    await auditMany(tx, events);
  });
  return answerOf(actor.shopId, g.id, kind);
}
