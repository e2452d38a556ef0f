import Fraction from 'fraction.js';
import type { Precision, Unit } from './types';

/** Millimetres in one inch, exactly (1 in = 25.4 mm = 127/5 mm). */
export const MM_PER_INCH = new Fraction(127, 5);

const MM_PER_CM = new Fraction(10);
const MM_PER_MM = new Fraction(1);

/** Every unit a plan can be entered in. */
export const UNITS: readonly Unit[] = ['in', 'cm', 'mm'];

/** True for 'in', 'cm' and 'mm'. */
export function isUnit(u: unknown): u is Unit {
  return u === 'in' || u === 'cm' || u === 'mm';
}

/** Millimetres in one of the unit, exactly. */
export function mmPerUnit(unit: Unit): Fraction {
  return unit === 'in' ? MM_PER_INCH : unit === 'cm' ? MM_PER_CM : MM_PER_MM;
}

/** Millimetres in one of the unit as a ratio of integers [a, b] = a/b mm. */
export function mmPerUnitRatio(unit: Unit): [number, number] {
  return unit === 'in' ? [127, 5] : unit === 'cm' ? [10, 1] : [1, 1];
}

/** True for 8, 16 and 32. */
export function isPrecision(p: unknown): p is Precision {
  return p === 8 || p === 16 || p === 32;
}

/** True for the metric units (cm, mm), which share metric defaults. */
export function isMetric(unit: Unit): boolean {
  return unit !== 'in';
}

/** Millimetres as inches (a number, for drawing; display goes through formatLength). */
export function toInches(mm: number): number {
  return mm / 25.4;
}

/** Millimetres as a number in the given unit (for drawing; display goes through formatLength). */
export function mmToUnit(mm: number, unit: Unit): number {
  return unit === 'in' ? mm / 25.4 : unit === 'cm' ? mm / 10 : mm;
}
