// The one fitting vocabulary: garment kinds → parts → finishes → fields. Every list of a fitting's
// fields (the zod shapes, the form's groups, presets, history, the sheet, the engine's inputs) is
// derived from here, so a new length is one entry. Plain data, no imports: server and islands share it.
// Labels and hints are English here, in this one place, keyed by field, for a message catalog to take over.

/** How a field is measured: a length along the leg, a width laid flat, a count, a percent, or one of a list (`options`). */
export type UnitKind = 'length' | 'width' | 'count' | 'percent' | 'choice';

/** One option of a choice field: the value stored and its words on screen. */
export interface FieldOption {
  value: string;
  label: string;
}

/** A finish a leg can be given (the value stored in measurements.finish). */
export type Finish = 'cuff' | 'plain' | 'slope' | 'original';

/** What the finish makes, as the engine plans it and the presets, pricing and sheet name it. */
export type Part = 'cuff' | 'hem';

/** Which of the engine's plans a field feeds, and how: needed, optional, or only on a pair let down first. */
export type PlanUse = 'required' | 'optional' | 'letDown';

/** The engine's plans a leg can get: its cuff or hem, the taper check under either, and jeans keeping the factory hem (its own taper check inside). */
export type EnginePlan = 'cuff' | 'hem' | 'taper' | 'hemTaper' | 'originalHem';

/** One field a fitting records for a leg. */
export interface FittingField {
  /** the key in the form, the API, measurements.values (jsonb) and the engine's input */
  key: string;
  label: string;
  /** the shorter words a preset list uses (default: label) */
  shortLabel?: string;
  hint?: string;
  /** the hint on the preset form, where it differs (a preset is no one leg) */
  presetHint?: string;
  unit: UnitKind;
  /** a choice field's options, in the order offered (blank, not listed, is "none") */
  options?: readonly FieldOption[];
  /** the finishes whose form asks for it */
  finishes: readonly Finish[];
  /** the form's group it sits in */
  group: GroupId;
  /** the engine's plans it feeds, under the same key (none: recorded and printed as a note) */
  engine: Partial<Record<EnginePlan, PlanUse>>;
  /** a preset may hold it */
  preset: boolean;
  /** printed on the cut sheet: through the plan's figures ('plan'), as a recorded line ('listed'), in a worked note of its own ('note': the shrink lines), or not */
  printed: 'plan' | 'listed' | 'note' | false;
  /** asked only when the pair is let down first */
  letDownOnly?: boolean;
}

/** The groups of the bench form, in order. */
export const GROUPS = {
  pins: 'Pins',
  part: '', // titled by the part: "Cuff" or "Hem"
  cloth: 'Cloth',
  taper: 'Taper check (flat widths)',
  waist: 'Pending waist change',
  shrink: 'Unwashed cloth',
} as const;
/** A group of the bench form. */
export type GroupId = keyof typeof GROUPS;

const ALL: readonly Finish[] = ['cuff', 'plain', 'slope', 'original'];
// The finishes that fold the leg's own cloth up: the kept factory hem has no turn-under, cloth check or let-out.
const FOLDED: readonly Finish[] = ['cuff', 'plain', 'slope'];
const HEMS: readonly Finish[] = ['plain', 'slope'];

/** Trousers: every field a leg's fitting records, in the order the form asks for them. */
const TROUSER_FIELDS = [
  {
    key: 'backPin',
    label: 'Pin at the back (finished length)',
    hint: 'Measured the shop’s way, e.g. along the inseam to the pin.',
    unit: 'length',
    finishes: ALL,
    group: 'pins',
    engine: {},
    preset: false,
    printed: 'plan',
  },
  {
    key: 'frontPin',
    label: 'Front pin',
    hint: 'Optional. Recorded; a cuff is still hemmed level.',
    unit: 'length',
    finishes: ALL,
    group: 'pins',
    engine: {},
    preset: false,
    printed: false,
  },
  {
    key: 'cuffDepth',
    label: 'Cuff depth',
    presetHint: 'Finished height of the cuff, e.g. 1 1/2 or 38',
    // The form adds the usual depths from the engine's defaults (not imported here: no engine in this file).
    unit: 'length',
    finishes: ['cuff'],
    group: 'part',
    engine: { cuff: 'required', taper: 'required' },
    preset: true,
    printed: 'plan',
  },
  {
    key: 'hemSection',
    label: 'Third section',
    hint: 'Blank: the same as the cuff depth.',
    presetHint: 'Blank: same as the cuff depth',
    unit: 'length',
    finishes: ['cuff'],
    group: 'part',
    engine: { cuff: 'optional', taper: 'optional' },
    preset: true,
    printed: 'plan',
  },
  {
    key: 'slope',
    label: 'Slope (lower at the back)',
    shortLabel: 'Slope',
    hint: 'How much lower the back sits; often about 1/2 in.',
    presetHint: 'How much lower at the back than the front. Blank: level',
    unit: 'length',
    finishes: ['slope'],
    group: 'part',
    engine: { hem: 'optional' },
    preset: true,
    printed: 'plan',
  },
  {
    key: 'hemAllowance',
    label: 'Hem allowance',
    hint: 'Blank: 1 1/2 in (40 mm).',
    presetHint: 'Cloth below the finished edge, turn-under included. Blank: the usual',
    unit: 'length',
    finishes: HEMS,
    group: 'part',
    engine: { hem: 'optional', hemTaper: 'optional' },
    preset: true,
    printed: 'plan',
  },
  {
    key: 'turnUnder',
    label: 'Turn-under',
    hint: 'Blank: the usual.',
    presetHint: 'Blank: the usual (1/2 in or 12 mm on a cuff, 1/4 in or 6 mm on a hem)',
    unit: 'length',
    finishes: FOLDED,
    group: 'part',
    engine: { cuff: 'optional', hem: 'optional' },
    preset: true,
    printed: 'plan',
  },
  {
    // The sheet gives the usual range (1/8 to 3/16 in below the top, TRADE.md); the fitter may choose
    // one figure (lower on a heavy cloth, or where the customer wants no tack showing at the lip), and
    // the bench needs that figure where it tacks, not the range.
    key: 'tackBelowTop',
    label: 'Tack below the cuff top',
    hint: 'Where the seam tacks go, below the cuff top. Blank: the usual, a little below the top.',
    unit: 'length',
    finishes: ['cuff'],
    group: 'part',
    engine: {},
    preset: true,
    printed: 'listed',
  },
  {
    // Jeans keeping the factory hem (planOriginalHem): the lines are measured from the pin mark, so
    // the one length that says how much comes off is the present edge's distance below it.
    key: 'shortenBy',
    label: 'Present edge below the pin mark',
    shortLabel: 'Shorten by',
    hint: 'How much shorter: from the pin mark down to the factory-finished edge.',
    unit: 'length',
    finishes: ['original'],
    group: 'part',
    engine: { originalHem: 'required' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'factoryHem',
    label: 'Factory hem depth',
    hint: 'From the edge up to the top of the hem’s stitching, e.g. 5/8.',
    unit: 'length',
    finishes: ['original'],
    group: 'part',
    engine: { originalHem: 'required' },
    preset: false,
    printed: 'plan',
  },
  {
    // The engine calls it seamAllowance; the key differs from the let-out seam allowance of the
    // taper check (a width at the leg seams), which is another length (see ORIGINAL_HEM_KEYS).
    key: 'joinSeam',
    label: 'Seam allowance at the join',
    hint: 'Taken from each piece where the band is sewn back on. Blank: 3/8 in (10 mm).',
    unit: 'length',
    finishes: ['original'],
    group: 'part',
    engine: { originalHem: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'available',
    label: 'Cloth below the mark',
    hint: 'From the pin mark to the raw edge, once the old hem is let down.',
    unit: 'length',
    finishes: FOLDED,
    group: 'cloth',
    engine: { cuff: 'optional', hem: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'oldCrease',
    label: 'Old crease below the mark',
    hint: 'Where the old hem fold is, below the mark (negative above).',
    unit: 'length',
    finishes: ['cuff'],
    group: 'cloth',
    engine: { cuff: 'optional', taper: 'letDown' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'widthAtEdge',
    label: 'Width at the finished edge (flat)',
    unit: 'width',
    finishes: ALL,
    group: 'taper',
    engine: { taper: 'required', hemTaper: 'required', originalHem: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'widthAbove',
    label: 'Width higher up (flat)',
    unit: 'width',
    finishes: ALL,
    group: 'taper',
    engine: { taper: 'required', hemTaper: 'required', originalHem: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    key: 'heightAbove',
    label: 'Height of that width above the edge',
    hint: 'Where the higher width was taken, above the finished edge.',
    unit: 'length',
    finishes: ALL,
    group: 'taper',
    engine: { taper: 'required', hemTaper: 'required', originalHem: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    // Asked after the three widths on a pair let down first (the old hem often flares below its fold).
    key: 'widthAtCut',
    label: 'Width at the cutting line (flat)',
    hint: 'Let down first: the old hem often flares below its fold, so measure flat where you will cut. Blank: the taper followed down.',
    unit: 'width',
    finishes: FOLDED,
    group: 'taper',
    engine: { taper: 'letDown', hemTaper: 'letDown' },
    preset: false,
    printed: 'plan',
    letDownOnly: true,
  },
  {
    key: 'seamAllowance',
    label: 'Seam allowance at each seam',
    hint: 'Left on each side of each leg seam, to let out.',
    unit: 'width',
    finishes: FOLDED,
    group: 'taper',
    engine: { taper: 'optional', hemTaper: 'optional' },
    preset: false,
    printed: 'plan',
  },
  {
    // A waist change waiting on the same trousers moves where they sit, so the pin mark moves with it
    // (waistMovesHem, rule 'girth-slope': from the wearer's waist and seat girths and the depth between).
    key: 'waistChange',
    label: 'Pending waist change',
    hint: 'Still to do at the waistband: negative taken in (e.g. -1), positive let out. Blank: none.',
    unit: 'length',
    finishes: ALL,
    group: 'waist',
    engine: {},
    preset: false,
    printed: 'listed',
  },
  {
    key: 'waistGirth',
    label: 'Waist girth (body, where the band sits)',
    shortLabel: 'Waist girth',
    unit: 'length',
    finishes: ALL,
    group: 'waist',
    engine: {},
    preset: false,
    printed: 'listed',
  },
  {
    key: 'seatGirth',
    label: 'Seat girth (body)',
    shortLabel: 'Seat girth',
    unit: 'length',
    finishes: ALL,
    group: 'waist',
    engine: {},
    preset: false,
    printed: 'listed',
  },
  {
    key: 'waistToSeat',
    label: 'Waist to seat (down the body)',
    shortLabel: 'Waist to seat',
    hint: 'From where the band sits down to the fullest part of the seat.',
    unit: 'length',
    finishes: ALL,
    group: 'waist',
    engine: {},
    preset: false,
    printed: 'listed',
  },
  // Shrinkage (issue 17, shrinkAllowance): plain and sloped hems only. A cuff folds three layers of
  // the same cloth whose depths shrink too, which the engine does not plan; the kept factory hem has
  // no hem allowance to cut (its band is sewn back on at lines from the join). Both are washed first.
  {
    key: 'shrinkCloth',
    label: 'Cloth not yet washed',
    hint: 'Blank: washed already, or not to be washed. The hem is left long enough to shrink to the pin.',
    unit: 'choice',
    options: [
      { value: 'raw-denim', label: 'Raw denim' },
      { value: 'preshrunk-denim', label: 'Pre-shrunk denim' },
      { value: 'unwashed-cotton', label: 'Unwashed cotton' },
      { value: 'prewashed', label: 'Prewashed (no shrinkage)' },
      { value: 'other', label: 'Other (the shop’s own percent)' },
    ],
    finishes: HEMS,
    group: 'shrink',
    engine: {},
    preset: false,
    printed: 'note',
  },
  {
    key: 'shrinkPercent',
    label: 'Shop’s own shrinkage',
    hint: 'Only for “Other”: expected shrinkage in length at the first wash, in percent, e.g. 6.',
    unit: 'percent',
    finishes: HEMS,
    group: 'shrink',
    engine: {},
    preset: false,
    printed: 'note',
  },
  {
    key: 'lengthToMark',
    label: 'Length that shrinks to the mark',
    hint: 'e.g. the inseam from the crotch to the pin mark. Blank: the back pin.',
    unit: 'length',
    finishes: HEMS,
    group: 'shrink',
    engine: {},
    preset: false,
    printed: 'note',
  },
] as const satisfies readonly FittingField[];

/** One garment kind: what it is called, its parts (what a finish makes) and its finishes, and its fields. */
export interface GarmentKind {
  label: string;
  /** each finish, in the order offered, with the part it makes, its label on screen and (when not the part's) its group's title */
  finishes: Record<Finish, { part: Part; label: string; group?: string }>;
  /** each part: its name when chosen (presets, intake, pricing) and its group's title on the bench form */
  parts: Record<Part, { label: string; group: string }>;
  fields: readonly FittingField[];
}

/** Every garment kind the shop can fit. Trousers now; another kind is another entry. */
export const KINDS = {
  trousers: {
    label: 'Trousers',
    finishes: {
      cuff: { part: 'cuff', label: 'Cuff' },
      plain: { part: 'hem', label: 'Plain hem' },
      slope: { part: 'hem', label: 'Plain, sloped' },
      // The factory hem is cut off and sewn back on above the new length: a hem the garment already had.
      original: { part: 'hem', label: 'Original hem, kept', group: 'Original hem' },
    },
    parts: { cuff: { label: 'Cuff', group: 'Cuff' }, hem: { label: 'Plain hem', group: 'Hem' } },
    fields: TROUSER_FIELDS,
  },
} as const satisfies Record<string, GarmentKind>;

/** A garment kind's key. */
export type KindId = keyof typeof KINDS;

/** A trouser leg's field key. */
export type FieldKey = (typeof TROUSER_FIELDS)[number]['key'];

/** A trouser field a preset may hold. */
export type PresetFieldKey = Extract<(typeof TROUSER_FIELDS)[number], { preset: true }>['key'];

/** Trousers' fields by key. */
export const FIELD: Record<FieldKey, FittingField> = Object.fromEntries(TROUSER_FIELDS.map((f) => [f.key, f])) as Record<FieldKey, FittingField>;

/** True when a field holds a length or width (read with the engine's parser, saved with its mm); false for a choice, percent or count. */
export function isLengthField(key: FieldKey): boolean {
  const unit = FIELD[key].unit;
  return unit === 'length' || unit === 'width';
}

/** A saved choice or percent in words ("Raw denim", "6 %"); a length or width comes back as typed. */
export function valueWords(key: FieldKey, text: string): string {
  const f = FIELD[key];
  if (f.unit === 'choice') return f.options?.find((o) => o.value === text)?.label ?? text;
  return f.unit === 'percent' ? `${text} %` : text;
}

/** Every field key of a trouser leg, in the form's order. */
export const FIELD_KEYS: readonly FieldKey[] = TROUSER_FIELDS.map((f) => f.key);

/** The finishes, in the order offered. */
export const FINISH_IDS = ['cuff', 'plain', 'slope', 'original'] as const satisfies readonly Finish[];

/** The parts (the engine's plans of a finish), in order. */
export const PART_IDS = ['cuff', 'hem'] as const satisfies readonly Part[];

/** Each part's name when chosen: "Cuff", "Plain hem". */
export const PART_LABELS: Record<Part, string> = { cuff: KINDS.trousers.parts.cuff.label, hem: KINDS.trousers.parts.hem.label };

/** What a finish makes: a cuff, or a hem (plain or sloped). */
export function partOf(finish: Finish): Part {
  return KINDS.trousers.finishes[finish].part;
}

/**
 * Reads a finish however it was stored: measurements hold cuff|plain|slope, garments and presets
 * cuff|hem (a hem with a slope given is a sloped hem). Unknown or empty: null.
 */
export function readFinish(stored: string | null | undefined, hasSlope = false): Finish | null {
  if (stored === 'cuff' || stored === 'plain' || stored === 'slope' || stored === 'original') return stored;
  if (stored === 'hem') return hasSlope ? 'slope' : 'plain';
  return null;
}

/** The group title of a finish's own fields on the bench form: "Cuff", "Hem", "Original hem". */
export function partGroupOf(finish: Finish): string {
  const f: { part: Part; group?: string } = KINDS.trousers.finishes[finish];
  return f.group ?? KINDS.trousers.parts[f.part].group;
}

/** The fields a finish's form asks for (a let-down pair also gets the let-down-only ones). */
export function fieldsOf(finish: Finish, letDown = false): FittingField[] {
  return TROUSER_FIELDS.filter((f) => (f.finishes as readonly Finish[]).includes(finish) && (letDown || !('letDownOnly' in f && f.letDownOnly)));
}

/** The fields a preset may hold, for a part (a cuff is hemmed level: slope is a hem's only). */
export function presetFieldsOf(part: Part): PresetFieldKey[] {
  return TROUSER_FIELDS.filter((f) => f.preset && (f.finishes as readonly Finish[]).some((x) => partOf(x) === part)).map((f) => f.key as PresetFieldKey);
}

/** The fields an engine plan takes, with how it takes each. */
export function engineFields(plan: EnginePlan): { key: FieldKey; use: PlanUse }[] {
  const out: { key: FieldKey; use: PlanUse }[] = [];
  for (const f of TROUSER_FIELDS) {
    const use = (f.engine as FittingField['engine'])[plan];
    if (use) out.push({ key: f.key, use });
  }
  return out;
}
