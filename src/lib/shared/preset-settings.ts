// What a preset holds and what the presets API accepts, checked the same way in the islands and on
// the server. Only the shape is checked here: what a length means is the engine's call (server).
import { z } from 'zod';
import { text } from './text';
import { FIELD, FIELD_KEYS, PART_IDS, presetFieldsOf, type Part, type PresetFieldKey } from './fitting/kinds';

const MAX_TEXT = 40;

function length(what: string) {
  return text({ error: `${what}: type a length such as 1 1/2 or 38.` })
    .trim()
    .max(MAX_TEXT, `${what} is too long: type a length such as 1 1/2.`)
    .transform((v) => (v === '' ? undefined : v))
    .optional();
}

const PRESET_KEYS = FIELD_KEYS.filter((k) => FIELD[k].preset) as PresetFieldKey[];

/** The lengths a preset can carry, with the words shown for each (from the fitting registry). */
export const PRESET_LENGTHS = Object.fromEntries(PRESET_KEYS.map((k) => [k, FIELD[k].shortLabel ?? FIELD[k].label])) as Record<PresetFieldKey, string>;

/** A preset's length field name. */
export type PresetLength = PresetFieldKey;

/** Which lengths each part uses (a cuff is hemmed level: no slope). */
export const LENGTHS_OF: Record<Part, PresetLength[]> = { cuff: presetFieldsOf('cuff'), hem: presetFieldsOf('hem') };

/** The settings a preset fills into a leg's plan; lengths as typed, in the preset's unit. */
export const presetSettings = z.object({
  finish: z.enum(PART_IDS, { error: 'Choose a cuff or a plain hem.' }),
  unit: z.enum(['in', 'cm', 'mm'], { error: 'Choose inches, cm or mm.' }),
  ...(Object.fromEntries(PRESET_KEYS.map((k) => [k, length(PRESET_LENGTHS[k])])) as Record<PresetLength, ReturnType<typeof length>>),
});

/** Preset settings as checked (blank lengths dropped). */
export type PresetSettings = z.output<typeof presetSettings>;

const name = text({ error: 'Give the preset a name.' }).trim().min(1, 'Give the preset a name.').max(60, 'Keep the name under 60 characters.');

/** POST /api/presets: a new house preset (lead) or one of your own. */
export const presetCreateInput = z.object({
  name,
  scope: z.enum(['house', 'personal'], { error: 'Say whether it is a house preset or your own.' }).default('personal'),
  isDefault: z.boolean().optional(),
  settings: presetSettings,
});

/** PATCH /api/presets/[id]: rename, change the settings, or make it the house default. */
export const presetUpdateInput = z
  .object({ name, isDefault: z.literal(true, { error: 'Only true: make another preset the default to move it.' }), settings: presetSettings })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send a name, settings or isDefault.');

/** A preset as the API returns it. */
export interface PresetView {
  id: string;
  name: string;
  house: boolean;
  isDefault: boolean;
  settings: PresetSettings;
}

/** The fields of a preset whose edits are kept in its history (old → new). */
export const PRESET_FIELDS: Record<string, string> = { name: 'Name', finish: 'Finish', unit: 'Unit', isDefault: 'House default', ...PRESET_LENGTHS };

/** One kept edit of a preset: who changed which field, when, from what to what. */
export interface PresetChange {
  id: string;
  at: string;
  actorName: string | null;
  /** a key of PRESET_FIELDS, or 'created' for the first entry */
  field: string;
  old: string | boolean | null;
  new: string | boolean | null;
}
