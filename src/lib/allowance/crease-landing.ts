import type { CuffLinePositions } from './cuff-lines';
import { type Exact, ZERO } from './exact';
import type { LenMaker } from './len';
import type { CreaseLanding, CreasePlace, Len } from './types';

/** What crease landing needs of a plan: exact lengths, with their nearest numbers for quick comparisons. */
export interface CreaseContext {
  cuffDepth: Exact;
  cuffDepthMm: number;
  lines: CuffLinePositions;
  /** the lines' mm as numbers, top to bottom */
  linesMm: readonly number[];
  /** a crease this close to a new fold is taken by the fold */
  onFoldWithin: Exact;
  onFoldWithinMm: number;
  /** a crease on the leg within this of the cuff top's height may show at its edge */
  nearCuffTop: Exact;
  len: LenMaker;
}

// Shown wherever a crease will or may show: pressing out is not a promise (common practice, no source).
const TELL = 'Tell the customer it may not press out.';

function land(place: CreasePlace, height: Len, message: string): CreaseLanding {
  return { place, heightAboveEdge: height, visible: place === 'leg-visible' || place === 'at-cuff-top' || place === 'cuff-face', message };
}

// The exact test runs only when the numbers say the crease is near the fold.
function onFold(crease: Exact, c: number, at: Exact, atMm: number, ctx: CreaseContext): boolean {
  return Math.abs(c - atMm) <= ctx.onFoldWithinMm + 1e-6 && crease.sub(at).abs().compare(ctx.onFoldWithin) <= 0;
}

/** Follow an old crease (mm below the mark, negative above) through the cuff's folds. */
export function creaseLanding(crease: Exact, ctx: CreaseContext): CreaseLanding {
  const { cuffDepth: d, lines, linesMm, len } = ctx;
  const c = crease.valueOf();
  const fold = onFold(crease, c, lines.finishedEdge, 0, ctx)
    ? 'finished edge'
    : onFold(crease, c, lines.cuffTop, linesMm[1]!, ctx)
      ? 'cuff top'
      : onFold(crease, c, lines.innerFold, linesMm[2]!, ctx)
        ? 'inner fold'
        : null;
  if (fold !== null) {
    return land('on-fold', len(fold === 'cuff top' ? d : ZERO), `The old crease falls on the new ${fold}: the new fold takes it, so it will not show.`);
  }
  if (c < 0) {
    // On the leg the height is −crease. Near the cuff top's height the verdict is "may show", with
    // the tolerance stated, so 1/16 in either way cannot flip "hidden" to "will show" unannounced.
    const at = len(crease, true);
    if (crease.add(d).abs().compare(ctx.nearCuffTop) <= 0) {
      return land(
        'at-cuff-top',
        at,
        `The old hem crease lies on the leg ${at.text} above the finished edge, within ${len(ctx.nearCuffTop).text} of the cuff top: it may show at the cuff's edge. Press or steam it out before finishing. ${TELL}`,
      );
    }
    if (crease.compare(d.neg()) <= 0) {
      return land(
        'leg-visible',
        at,
        `The old hem crease will show on the leg, ${at.text} above the finished edge, ${len(crease.add(d), true).text} above the cuff top. Press or steam it out before finishing, or choose a cuff depth that covers it. ${TELL}`,
      );
    }
    return land('behind-cuff', at, `The old crease lies on the leg behind the cuff, ${at.text} above the finished edge: the cuff hides it.`);
  }
  if (crease.compare(lines.cuffTop) <= 0) {
    // With a turn of cloth the first section is longer than the cuff is high; the cuff top caps it.
    const h = len(crease.compare(d) <= 0 ? crease : d);
    return land('behind-cuff', h, `The old crease lies under the cuff face, ${h.text} above the finished edge: hidden.`);
  }
  if (crease.compare(lines.innerFold) <= 0) {
    const up = lines.innerFold.sub(crease);
    const h = len(up.compare(d) <= 0 ? up : d);
    return land(
      'cuff-face',
      h,
      `The old crease will show on the face of the cuff, ${h.text} above the finished edge. Press it out, or change the cuff depth so it falls on a fold. ${TELL}`,
    );
  }
  const h = len(crease.sub(lines.innerFold));
  if (crease.compare(lines.cut) <= 0) {
    return land('inside', h, `The old crease ends up inside the leg, ${h.text} above the finished edge: hidden.`);
  }
  return land('cut-away', h, `The old crease lies ${len(crease.sub(lines.cut)).text} below the cutting line and is cut away.`);
}
