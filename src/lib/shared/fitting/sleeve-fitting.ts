// Jacket and coat sleeves (kind 'sleeves'): how much shorter, the hem, the buttons and buttonholes,
// the vent and the lining, as the bench types them; the adapter hands them to shortenSleeve.
import { type AllowanceError, shortenSleeve, type SleeveInput, type SleevePlan, validateSleeveInput } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import { choiceOf, type KindAdapter, type KindField, type KindTexts } from './kind-fields';

/** The buttonholes on the vent, as the engine takes them; no buttonholes first (the engine's default). */
export const SLEEVE_BUTTONHOLES = ['none', 'decorative', 'working'] as const;

// The optional lengths, each the engine's input key and the form's (blank: the engine's default).
const LENGTHS = [
  'hemDepth',
  'bottomButtonAboveEdge',
  'buttonSpacing',
  'ventLength',
  'ventTopMargin',
  'workingButtonholeSlack',
  'liningFoldNow',
  'liningPleatNow',
  'liningFoldAboveEdge',
  'liningEasePleat',
] as const satisfies readonly (keyof SleeveInput)[];

/** The sleeve's fields, in the form's order (the keys are the engine's). */
export const SLEEVE_FIELDS: readonly KindField[] = [
  { key: 'shortenBy', type: 'length', group: 'hem' },
  { key: 'hemDepth', type: 'length', group: 'hem' },
  { key: 'buttonholes', type: 'choice', options: SLEEVE_BUTTONHOLES, group: 'buttons' },
  { key: 'buttons', type: 'number', group: 'buttons' },
  { key: 'bottomButtonAboveEdge', type: 'length', group: 'buttons' },
  { key: 'buttonSpacing', type: 'length', group: 'buttons' },
  { key: 'workingButtonholeSlack', type: 'length', group: 'buttons', showIf: { key: 'buttonholes', in: ['working'] } },
  { key: 'ventLength', type: 'length', group: 'vent' },
  { key: 'ventTopMargin', type: 'length', group: 'vent' },
  { key: 'liningFoldNow', type: 'length', group: 'lining' },
  { key: 'liningPleatNow', type: 'length', group: 'lining' },
  { key: 'liningFoldAboveEdge', type: 'length', group: 'lining' },
  { key: 'liningEasePleat', type: 'length', group: 'lining' },
];

/** The sleeves' plan: the engine's input as typed (the sheet prints from both) and its plan. */
export interface SleeveFitting {
  input: SleeveInput;
  plan: SleevePlan;
}

const blank = (v: string | undefined) => !v || v.trim() === '';

/** The sleeve engine's input from the typed fields: only what was typed (a blank is the engine's default, not a refusal). */
export function sleeveInput(texts: KindTexts, unit: Unit, precision: Precision = 8): SleeveInput {
  const input: SleeveInput = {
    unit,
    precision,
    shortenBy: texts.shortenBy ?? '',
    buttonholes: choiceOf(SLEEVE_FIELDS, texts, 'buttonholes') as SleeveInput['buttonholes'],
  };
  if (!blank(texts.buttons)) input.buttons = texts.buttons!.trim();
  for (const key of LENGTHS) if (!blank(texts[key])) input[key] = texts[key];
  // The shop's slack is asked only with working buttonholes: hidden, it is not read.
  if (input.buttonholes !== 'working') delete input.workingButtonholeSlack;
  return input;
}

const KEYS: ReadonlySet<string> = new Set(SLEEVE_FIELDS.map((f) => f.key));

/** The sleeves' plug into the app: their fields and the engine. */
export const SLEEVE_ADAPTER: KindAdapter<SleeveFitting> = {
  kind: 'sleeves',
  fields: SLEEVE_FIELDS,
  refusals(texts, unit) {
    // The engine names the form's own keys; the buttons reaching past the vent are the vent's.
    return validateSleeveInput(sleeveInput(texts, unit)).map((error: AllowanceError) => ({
      field: KEYS.has(error.field ?? '') ? error.field! : 'shortenBy',
      error,
    }));
  },
  plan(texts, unit, precision) {
    const input = sleeveInput(texts, unit, precision);
    return { input, plan: shortenSleeve(input) };
  },
};
