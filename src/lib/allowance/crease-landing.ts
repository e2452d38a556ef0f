import Fraction from 'fraction.js';
import type { CuffLinePositions } from './cuff-lines';
import { type LenMaker, mmNumber } from './len';
import type { CreaseLanding, CreasePlace } from './types';

/** What crease landing needs of a plan. */
export interface CreaseContext {
  cuffDepth: Fraction;
  lines: CuffLinePositions;
  /** a crease this close to a new fold is taken by the fold */
  onFoldWithin: Fraction;
  len: LenMaker;
}

const ZERO = new Fraction(0);

function min(a: Fraction, b: Fraction): Fraction {
  return a.compare(b) <= 0 ? a : b;
}

/** Follow an old crease (mm below the mark, negative above) through the cuff's folds. */
export function creaseLanding(crease: Fraction, ctx: CreaseContext): CreaseLanding {
  const { cuffDepth: d, lines, onFoldWithin, len } = ctx;
  const land = (place: CreasePlace, height: Fraction, message: string): CreaseLanding => ({
    place,
    heightAboveEdge: len(height),
    visible: place === 'leg-visible' || place === 'cuff-face',
    message,
  });
  const folds: [Fraction, Fraction, string][] = [
    [lines.finishedEdge, ZERO, 'finished edge'],
    [lines.cuffTop, d, 'cuff top'],
    [lines.innerFold, ZERO, 'inner fold'],
  ];
  const c = mmNumber(crease);
  const near = mmNumber(onFoldWithin) + 1e-6;
  for (const [at, height, name] of folds) {
    // The exact test runs only when the numbers say the crease is near this fold.
    if (Math.abs(c - mmNumber(at)) <= near && crease.sub(at).abs().compare(onFoldWithin) <= 0) {
      return land('on-fold', height, `The old crease falls on the new ${name}: the new fold takes it, so it will not show.`);
    }
  }
  if (crease.s < 0n) {
    const h = crease.neg();
    const at = len(h).text;
    if (h.compare(d) >= 0) {
      return land(
        'leg-visible',
        h,
        `The old hem crease will show on the leg, ${at} above the finished edge, ${len(h.sub(d)).text} above the cuff top. Press or steam it out before finishing, or choose a cuff depth that covers it.`,
      );
    }
    return land('behind-cuff', h, `The old crease lies on the leg behind the cuff, ${at} above the finished edge: the cuff hides it.`);
  }
  if (crease.compare(lines.cuffTop) <= 0) {
    const h = min(crease, d);
    return land('behind-cuff', h, `The old crease lies under the cuff face, ${len(h).text} above the finished edge: hidden.`);
  }
  if (crease.compare(lines.innerFold) <= 0) {
    const h = min(lines.innerFold.sub(crease), d);
    return land(
      'cuff-face',
      h,
      `The old crease will show on the face of the cuff, ${len(h).text} above the finished edge. Press or steam it out, or change the cuff depth so it falls on a fold.`,
    );
  }
  const h = crease.sub(lines.innerFold);
  if (crease.compare(lines.cut) <= 0) {
    return land('inside', h, `The old crease ends up inside the leg, ${len(h).text} above the finished edge: hidden.`);
  }
  return land('cut-away', h, `The old crease lies ${len(crease.sub(lines.cut)).text} below the cutting line and is cut away.`);
}
