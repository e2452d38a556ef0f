import { AllowanceError } from './allowance-error';
import { readTaperInput, taperShapeError } from './check-taper';
import { readCuffInput } from './plan-cuff';
import { hemTaperShapeError, readHemTaperInput } from './hem-taper';
import { readHemInput } from './plan-hem';
import { InputReader } from './read-input';
import type { CuffInput, HemInput, HemTaperInput, TaperInput } from './types';

/** Read an input with a collecting reader: every field's refusal, or the one thrown before any field. */
export function collect<T>(input: unknown, read: (input: T, r: InputReader) => unknown): AllowanceError[] {
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

/** Every problem with a taper input, one AllowanceError per field (empty when checkTaper will accept it). */
export function validateTaperInput(input: unknown): AllowanceError[] {
  return collect<TaperInput>(input, (i, r) => {
    const v = readTaperInput(i, r);
    // The widths' shape is only judged once every field could be read.
    const shape = r.errors.length === 0 ? taperShapeError(v) : null;
    if (shape) r.errors.push(shape);
  });
}

/** Every problem with a taper check under a plain hem, one AllowanceError per field (empty when checkHemTaper will accept it). */
export function validateHemTaperInput(input: unknown): AllowanceError[] {
  return collect<HemTaperInput>(input, (i, r) => {
    const v = readHemTaperInput(i, r);
    const shape = r.errors.length === 0 ? hemTaperShapeError(v) : null;
    if (shape) r.errors.push(shape);
  });
}
