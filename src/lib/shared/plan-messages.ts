// The words and bounds of a plan request, without zod: the server's schema (plan-request.ts) and
// the public calculator's own check in the browser (plan-check.ts) are both built from these, so
// their messages cannot drift apart (tests/lib/plan-check.test.ts compares them).

/** Largest length accepted as a number: beyond it, a slip of the keyboard, never a trouser. */
export const MAX_LENGTH_NUMBER = 100_000;
/** Longest length accepted as text (after trimming). */
export const MAX_LENGTH_TEXT = 40;

/** The name each length of a plan request goes by in messages. */
export const PLAN_FIELD_NAMES = {
  cuffDepth: 'Cuff depth',
  hemSection: 'Third section',
  turnUnder: 'Turn-under',
  available: 'Cloth below the mark',
  clothThickness: 'Turn of cloth',
  oldCrease: 'Old crease',
  slope: 'Slope',
  hemAllowance: 'Hem allowance',
  widthAtEdge: 'Width at the finished edge',
  widthAbove: 'Width higher up',
  heightAbove: 'Height above the edge',
  seamAllowance: 'Seam allowance',
  tolerance: 'Tolerance',
  widthAtCut: 'Width at the cutting line',
  edgeBelowMark: 'Finished edge below the mark',
} as const;

/** One length of a plan request, by its key. */
export type PlanField = keyof typeof PLAN_FIELD_NAMES;

/** Each kind's lengths in the schema's order (messages come in this order), and those it cannot do without. */
export const PLAN_FIELDS = {
  cuff: { fields: ['cuffDepth', 'hemSection', 'turnUnder', 'available', 'clothThickness', 'oldCrease', 'slope'], required: ['cuffDepth'] },
  // edgeBelowMark: the bench's shrink allowance for unwashed cloth (the calculator does not send it).
  hem: { fields: ['hemAllowance', 'turnUnder', 'available', 'slope', 'edgeBelowMark'], required: [] },
  taper: {
    fields: ['cuffDepth', 'hemSection', 'widthAtEdge', 'widthAbove', 'heightAbove', 'seamAllowance', 'tolerance', 'clothThickness', 'widthAtCut', 'oldCrease'],
    required: ['cuffDepth', 'widthAtEdge', 'widthAbove', 'heightAbove'],
  },
  // A plain hem's taper check (the bench's; the calculator does not send it).
  'hem-taper': {
    fields: ['hemAllowance', 'widthAtEdge', 'widthAbove', 'heightAbove', 'widthAtCut', 'seamAllowance', 'tolerance', 'edgeBelowMark'],
    required: ['widthAtEdge', 'widthAbove', 'heightAbove'],
  },
} as const satisfies Record<string, { fields: readonly PlanField[]; required: readonly PlanField[] }>;

/** The kinds of plan: a cuff, a plain hem, a taper check under a cuff or under a plain hem. */
export type PlanKind = keyof typeof PLAN_FIELDS;

/** The messages about one length, named as `what` ("Cuff depth"). */
export function lengthMessages(what: string) {
  return {
    /** blank where a length is needed */
    enter: `Enter the ${what.toLowerCase()}.`,
    /** a number beyond ±MAX_LENGTH_NUMBER */
    farTooLarge: `${what} is far too large to be a length.`,
    /** text longer than MAX_LENGTH_TEXT */
    tooLong: `${what} is too long: type a length such as 1 1/2.`,
    /** neither text nor a finite number */
    notALength: `${what}: type a length such as 1 1/2 or 38.`,
  };
}

/** When the unit is not one of in, cm, mm. */
export const UNIT_MESSAGE = 'Choose inches, cm or mm.';
/** When inch precision is not 8, 16 or 32. */
export const PRECISION_MESSAGE = 'Show inches to 1/8, 1/16 or 1/32.';
/** When the kind is not cuff, hem or taper. */
export const KIND_MESSAGE = 'Choose a cuff, a plain hem or a taper check.';
/** When the body is not an object with a kind. */
export const SHAPE_MESSAGE = 'Send the plan as an object with a kind (cuff, hem, taper or hem-taper), a unit and the lengths.';
