// For the "same PDF with and without a speed patch" tests: each sheet printed alone and the first
// ten as one batch, as comparable PDF objects, and the check that two such prints are the same.
import { expect } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { comparable } from '../cut-sheet/pdf-objects';

/** Each sheet's PDF objects printed alone, and the first ten's printed as one batch. */
export interface Printed {
  alone: string[][];
  batch: string[];
}

/** Prints each sheet alone, then the first ten as one batch. */
export async function printedObjects(sheets: CutSheetData[]): Promise<Printed> {
  const alone: string[][] = [];
  for (const s of sheets) alone.push(comparable(await renderCutSheet(s)));
  return { alone, batch: comparable(await renderCutSheets(sheets.slice(0, 10))) };
}

/** Expects two prints of the same sheets to match object for object, overfull sheets among them. */
export function expectSamePrints(a: Printed, b: Printed): void {
  expect(b.alone.filter((o) => o.filter((x) => x.includes('/Type /Page\n')).length > 1).length).toBeGreaterThan(0);
  for (let i = 0; i < a.alone.length; i++) expect(a.alone[i], `sheet ${i}`).toEqual(b.alone[i]);
  expect(a.batch).toEqual(b.batch);
}
