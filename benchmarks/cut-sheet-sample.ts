// The sheets the cut-sheet benchmarks render: sheet i is a different garment for every i in a
// run (ticket, garment, due date, assignee, cuff depth and cloth all vary), so the figures on it
// differ from sheet to sheet as they do in a shop's morning batch. Only the wording every sheet
// shares (steps, cautions, headings) repeats. Invented shop, staff and garments.
import { buildCutSheet } from '../src/lib/server/cut-sheet/build';

const GARMENTS = ['Navy wool flannel trousers', 'Grey worsted suit trousers', 'Tan cotton chinos', 'Charcoal tweed trousers', 'Olive moleskin trousers'];
const STAFF = ['Sam Ortiz', 'Priya Navarro', 'Jonah Whitcombe'];
const DAY_MS = 86_400_000;
const FIRST_DUE = Date.UTC(2025, 2, 3);

/** Cut sheet number i of a benchmark run, in fractional inches to 1/16. */
export function sampleSheet(i: number) {
  // 13 cuff depths (1 1/4 to 2 in by 1/16) and 41 cloth lengths: 533 different plans before one repeats.
  const depth = 20 + (i % 13);
  const cloth = 64 + (i % 41);
  return buildCutSheet(
    {
      shop: 'Hartley & Sons Alterations',
      ticket: String(1000 + i),
      garment: GARMENTS[i % GARMENTS.length]!,
      due: new Date(FIRST_DUE + (i % 60) * DAY_MS).toISOString().slice(0, 10),
      assignee: STAFF[i % STAFF.length]!,
      link: `https://cuffwright.example/garments/${1000 + i}`,
    },
    [{ side: 'left', finish: 'cuff', input: { unit: 'in', precision: 16, cuffDepth: `${depth}/16`, available: `${cloth}/16` } }],
  );
}

/**
 * Cut sheet number i of a pair of tapered legs cuffed: most are alike (one group on the sheet,
 * the usual page); every fourth pair differs left to right (widths, cloth, old creases on a
 * garment that came in cuffed), and its two groups make the page overfull: it spills onto a
 * second page (laid out again, see render.ts).
 */
export function taperedPairSheet(i: number) {
  const depth = 20 + (i % 13);
  const cloth = 72 + (i % 41);
  const overfull = i % 4 === 3;
  const leg = (side: 'left' | 'right') => {
    const differ = overfull && side === 'right';
    const edge = 118 + (i % 6) + (differ ? 2 : 0);
    return {
      side,
      finish: 'cuff' as const,
      input: {
        unit: 'in' as const,
        precision: 16 as const,
        cuffDepth: `${depth}/16`,
        available: `${cloth + (differ ? 3 : 0)}/16`,
        ...(overfull ? { oldCrease: `${24 + (i % 9) + (differ ? 2 : 0)}/16` } : {}),
      },
      taper: { widthAtEdge: `${edge}/16`, widthAbove: `${edge + 16 + (i % 5)}/16`, heightAbove: 6, seamAllowance: 1 },
    };
  };
  const data = buildCutSheet(
    {
      shop: 'Hartley & Sons Alterations',
      ticket: String(1000 + i),
      garment: GARMENTS[i % GARMENTS.length]!,
      due: new Date(FIRST_DUE + (i % 60) * DAY_MS).toISOString().slice(0, 10),
      assignee: STAFF[i % STAFF.length]!,
      link: `https://cuffwright.example/garments/${1000 + i}`,
    },
    [leg('left'), leg('right')],
  );
  return overfull ? { ...data, existingFinish: 'cuff' as const } : data;
}
