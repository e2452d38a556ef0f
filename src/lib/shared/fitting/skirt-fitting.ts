// Skirts and dresses (kind 'skirt'): the hem's round and flare, the depth wanted, and the levelling
// from the floor, as the bench types them; the adapter hands them to planFlaredHem and levelHem.
import {
  type AllowanceError,
  HEM_POINTS,
  levelHem,
  planFlaredHem,
  validateFlaredHemInput,
  validateLevelHemInput,
  type FlaredHemInput,
  type FlaredHemPlan,
  type HemPoint,
  type LevelHemInput,
  type LevelHemPlan,
} from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import { choiceOf, type KindAdapter, type KindField, type KindTexts } from './kind-fields';

/** How the flare is given: the engine's four ways (FlaredHemInput.flare). */
export const SKIRT_FLARES = ['straight', 'measured', 'circle', 'angle'] as const;

// Each place's pins and cloth side by side, place after place round the hem.
const pointFields = (): KindField[] =>
  HEM_POINTS.flatMap((p) => (['pin', 'cloth'] as const).map((prefix) => ({ key: `${prefix}-${p}`, type: 'length' as const, group: 'points', place: p })));

/** The skirt's fields, in the form's order. */
export const SKIRT_FIELDS: readonly KindField[] = [
  { key: 'hemRound', type: 'length', group: 'hem' },
  { key: 'flare', type: 'choice', options: SKIRT_FLARES, group: 'hem' },
  { key: 'upperRound', type: 'length', group: 'hem', showIf: { key: 'flare', in: ['measured'] } },
  { key: 'upperHeight', type: 'length', group: 'hem', showIf: { key: 'flare', in: ['measured'] } },
  { key: 'circleFraction', type: 'number', group: 'hem', showIf: { key: 'flare', in: ['circle'] } },
  { key: 'flareDegrees', type: 'number', group: 'hem', showIf: { key: 'flare', in: ['angle'] } },
  { key: 'hemDepth', type: 'length', group: 'hem' },
  { key: 'turnUnder', type: 'length', group: 'hem' },
  { key: 'markerHeight', type: 'length', group: 'level' },
  { key: 'hemFromFloor', type: 'length', group: 'level' },
  { key: 'shoesAtMarking', type: 'length', group: 'level' },
  { key: 'shoesToWear', type: 'length', group: 'level' },
  ...pointFields(),
];

/** The skirt's plan: the hem's finish, and (when the marker's line was taken) the new hem line round the hem. */
export interface SkirtPlan {
  flared: FlaredHemPlan;
  level: LevelHemPlan | null;
  /** cloth kept below the new hem line: the finished hem's depth plus the turn-under (what levelHem cuts below the line) */
  allowance: { depth: string; turnUnder: string };
}

const blank = (v: string | undefined) => !v || v.trim() === '';

/** The flared-hem engine's input from the typed fields. */
export function skirtFlaredInput(texts: KindTexts, unit: Unit, precision: Precision = 8): FlaredHemInput {
  const flare = choiceOf(SKIRT_FIELDS, texts, 'flare');
  const input: FlaredHemInput = {
    unit,
    precision,
    flare:
      flare === 'measured'
        ? { kind: 'measured', upperCircumference: texts.upperRound ?? '', heightAbove: texts.upperHeight ?? '' }
        : flare === 'circle'
          ? { kind: 'circle', fraction: texts.circleFraction ?? '' }
          : flare === 'angle'
            ? { kind: 'angle', degrees: texts.flareDegrees ?? '' }
            : { kind: 'straight' },
  };
  // Only what was typed: a blank optional length is the engine's default, not a refusal.
  if (!blank(texts.hemRound) || flare === 'measured' || flare === 'circle' || flare === 'angle') input.hemCircumference = texts.hemRound ?? '';
  if (!blank(texts.hemDepth)) input.hemDepth = texts.hemDepth;
  if (!blank(texts.turnUnder)) input.turnUnder = texts.turnUnder;
  return input;
}

/** True when any levelling field is typed: then the marker, the floor and a place round the hem are all needed. */
export function levelling(texts: KindTexts): boolean {
  return ['markerHeight', 'hemFromFloor', 'shoesAtMarking', 'shoesToWear', ...HEM_POINTS.flatMap((p) => [`pin-${p}`, `cloth-${p}`])].some(
    (k) => !blank(texts[k]),
  );
}

/** The levelling engine's input (the cloth kept below the new line given as one length), or null when nothing of it is typed. */
export function skirtLevelInput(texts: KindTexts, unit: Unit, below: string, precision: Precision = 8): LevelHemInput | null {
  if (!levelling(texts)) return null;
  const points = HEM_POINTS.filter((p) => !blank(texts[`pin-${p}`]) || !blank(texts[`cloth-${p}`])).map((at) => ({
    at,
    pinAboveEdge: texts[`pin-${at}`] ?? '',
    ...(blank(texts[`cloth-${at}`]) ? {} : { cloth: texts[`cloth-${at}`] }),
  }));
  const input: LevelHemInput = { unit, precision, markerHeight: texts.markerHeight ?? '', hemFromFloor: texts.hemFromFloor ?? '', hemDepth: below, points };
  if (!blank(texts.shoesAtMarking)) input.shoesAtMarking = texts.shoesAtMarking;
  if (!blank(texts.shoesToWear)) input.shoesToWear = texts.shoesToWear;
  return input;
}

// The engine's field names back to the form's keys.
const FLARED_FIELDS: Record<string, string> = {
  hemCircumference: 'hemRound',
  'flare.kind': 'flare',
  'flare.upperCircumference': 'upperRound',
  'flare.heightAbove': 'upperHeight',
  'flare.fraction': 'circleFraction',
  'flare.degrees': 'flareDegrees',
  hemDepth: 'hemDepth',
  turnUnder: 'turnUnder',
};

function levelField(field: string | undefined, input: LevelHemInput): string {
  const m = /^points\.(\d+)\.(\w+)$/.exec(field ?? '');
  if (m) {
    const at = input.points[Number(m[1])]?.at ?? HEM_POINTS[0];
    return `${m[2] === 'cloth' ? 'cloth' : 'pin'}-${at}`;
  }
  if (field === 'points') return `pin-${HEM_POINTS[0]}`;
  // The cloth below the line is worked out from the hem depth and turn-under.
  if (field === 'hemDepth') return 'hemDepth';
  return field && field in { markerHeight: 1, hemFromFloor: 1, shoesAtMarking: 1, shoesToWear: 1 } ? field : 'markerHeight';
}

// The cloth below the new line: the depth the hem is finished at (the engine may turn it narrower
// or roll it) plus the turn-under; a faced hem keeps the depth asked.
function allowanceOf(flared: FlaredHemPlan): SkirtPlan['allowance'] {
  return { depth: (flared.finishDepth ?? flared.hemDepth).text, turnUnder: flared.turnUnder.text };
}

/** The skirt's plug into the app: its fields and the two engines. */
export const SKIRT_ADAPTER: KindAdapter<SkirtPlan> = {
  kind: 'skirt',
  fields: SKIRT_FIELDS,
  refusals(texts, unit) {
    const out: { field: string; error: AllowanceError }[] = [];
    const flaredInput = skirtFlaredInput(texts, unit);
    for (const error of validateFlaredHemInput(flaredInput)) out.push({ field: FLARED_FIELDS[error.field ?? ''] ?? 'hemRound', error });
    if (out.length > 0) return out;
    const flared = planFlaredHem(flaredInput);
    const a = allowanceOf(flared);
    const level = skirtLevelInput(texts, unit, `${a.depth} + ${a.turnUnder}`);
    if (level) for (const error of validateLevelHemInput(level)) out.push({ field: levelField(error.field, level), error });
    return out;
  },
  plan(texts: KindTexts, unit: Unit, precision: Precision): SkirtPlan {
    const flared = planFlaredHem(skirtFlaredInput(texts, unit, precision));
    const allowance = allowanceOf(flared);
    const input = skirtLevelInput(texts, unit, `${allowance.depth} + ${allowance.turnUnder}`, precision);
    return { flared, level: input ? levelHem(input) : null, allowance };
  },
};

/** The places round the hem, as the form and the sheet list them. */
export const SKIRT_POINTS: readonly HemPoint[] = HEM_POINTS;
