// What the shop says about working safely at the pressing table, once: the screens (home page,
// garment page) and the printed cut sheet read the same cautions. Plain data: no imports.

/** The heading over the cautions, on screen and (upper case) on the sheet. */
export const SAFETY_HEADING = 'Mind your hands';

/** Each caution: what it is about, the sentence on screen, and the shorter line printed on the sheet. */
export const SAFETY_NOTES = [
  {
    what: 'Iron and steam',
    screen: 'burn before you feel them. Rest the iron on its heel between strokes, and pull the plug before you fill or empty it.',
    sheet: 'Iron and steam burn: rest the iron on its heel; unplug it to fill or empty.',
  },
  {
    what: 'Shears, blades and seam rippers:',
    screen: 'cut away from yourself, close or cover them when you lay them down, and put spent blades in the sharps jar.',
    sheet: 'Shears, blades, seam rippers: cut away from you; close or cover them; spent blades in the sharps jar.',
  },
  {
    what: 'Needles and pins:',
    screen: 'count them out and count them back; a broken one goes straight in the sharps jar, never in the cloth.',
    sheet: 'Needles and pins: count them out and back; broken ones in the sharps jar.',
  },
] as const;

/** The last word, on screen: the shop's own practice and the local rules come before ours. */
export const SAFETY_DEFER = "This is how we work; your shop's own practice and the local rules come first.";
/** The last word, on the sheet. */
export const SAFETY_DEFER_SHEET = "Your shop's own practice and local rules come first.";
