// Validation of the newer kinds' inputs: every refusal at once, one per field, for forms.
import type { AllowanceError } from './allowance-error';
import { flaredHemShapeError, readFlaredHemInput } from './flared-hem';
import type { FlaredHemInput, LevelHemInput, OriginalHemInput, ShrinkInput, SleeveInput, WaistMoveInput } from './kind-types';
import { readShrinkInput } from './shrink-allowance';
import { readWaistMoveInput } from './waist-move';
import { readOriginalHemInput } from './original-hem';
import { readSleeveInput, sleeveShapeError } from './sleeve-shorten';
import { readLevelHemInput } from './level-hem';
import { collect } from './validate-input';

/** Every problem with a skirt hem input, one AllowanceError per field (empty when planFlaredHem will accept it). */
export function validateFlaredHemInput(input: unknown): AllowanceError[] {
  return collect<FlaredHemInput>(input, (i, r) => {
    const v = readFlaredHemInput(i, r);
    const shape = r.errors.length === 0 ? flaredHemShapeError(v) : null;
    if (shape) r.errors.push(shape);
  });
}

/** Every problem with a levelling input, one AllowanceError per field (empty when levelHem will accept it). */
export function validateLevelHemInput(input: unknown): AllowanceError[] {
  return collect<LevelHemInput>(input, readLevelHemInput);
}

/** Every problem with a sleeve input, one AllowanceError per field (empty when shortenSleeve will accept it). */
export function validateSleeveInput(input: unknown): AllowanceError[] {
  return collect<SleeveInput>(input, (i, r) => {
    const v = readSleeveInput(i, r);
    const shape = r.errors.length === 0 ? sleeveShapeError(v) : null;
    if (shape) r.errors.push(shape);
  });
}

/** Every problem with an original-hem input, one AllowanceError per field (empty when planOriginalHem will accept it). */
export function validateOriginalHemInput(input: unknown): AllowanceError[] {
  return collect<OriginalHemInput>(input, readOriginalHemInput);
}

/** Every problem with a waist move input, one AllowanceError per field (empty when waistMovesHem will accept it). */
export function validateWaistMoveInput(input: unknown): AllowanceError[] {
  return collect<WaistMoveInput>(input, readWaistMoveInput);
}

/** Every problem with a shrink input, one AllowanceError per field (empty when shrinkAllowance will accept it). */
export function validateShrinkInput(input: unknown): AllowanceError[] {
  return collect<ShrinkInput>(input, readShrinkInput);
}
