import { AllowanceError } from './allowance-error';
import { readTaperInput } from './check-taper';
import { readCuffInput } from './plan-cuff';
import { readHemInput } from './plan-hem';
import { InputReader } from './read-input';
import type { CuffInput, HemInput, TaperInput } from './types';

function collect<T>(input: unknown, read: (input: T, r: InputReader) => unknown): AllowanceError[] {
  try {
    const r = new InputReader(input, true);
    read(input as T, r);
    return r.errors;
  } catch (e) {
    if (e instanceof AllowanceError) return [e];
    throw e;
  }
}

/** Every problem with a cuff input, one AllowanceError per field (empty when planCuff will accept it). */
export function validateCuffInput(input: unknown): AllowanceError[] {
  return collect<CuffInput>(input, readCuffInput);
}

/** Every problem with a plain hem input, one AllowanceError per field (empty when planHem will accept it). */
export function validateHemInput(input: unknown): AllowanceError[] {
  return collect<HemInput>(input, readHemInput);
}

/** Every problem with a taper input, one AllowanceError per field (empty when the fields are sound). */
export function validateTaperInput(input: unknown): AllowanceError[] {
  return collect<TaperInput>(input, readTaperInput);
}
