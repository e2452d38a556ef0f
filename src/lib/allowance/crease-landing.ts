import type { CuffLinePositions } from './cuff-lines';
import { type Exact, ZERO } from './exact';
import type { LenMaker, RatioLenMaker } from './len';
import type { CreaseLanding, CreasePlace, Len, PlanWarning } from './types';

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

function land(place: CreasePlace, height: Len, message: string, values: Record<string, string>): CreaseLanding {
  return { place, heightAboveEdge: height, visible: place === 'leg-visible' || place === 'at-cuff-top' || place === 'cuff-face', message, values };
}

// The exact test runs only when the numbers say the crease is near the fold.
function onFold(crease: Exact, c: number, at: Exact, atMm: number, ctx: CreaseContext): boolean {
  return Math.abs(c - atMm) <= ctx.onFoldWithinMm + 1e-6 && crease.sub(at).abs().compare(ctx.onFoldWithin) <= 0;
}

// Each verdict in English with its figures (the catalog's crease.<place> renders the same from them),
// shared by the Exact and the integer landing so both say the same.
const say = {
  onFold: (h: Len, fold: string): CreaseLanding =>
    land('on-fold', h, `The old crease falls on the new ${fold}: the new fold takes it, so it will not show.`, {
      fold: fold === 'finished edge' ? 'edge' : fold === 'cuff top' ? 'top' : 'inner',
    }),
  atCuffTop: (h: Len, near: string): CreaseLanding =>
    land(
      'at-cuff-top',
      h,
      `The old hem crease lies on the leg ${h.text} above the finished edge, within ${near} of the cuff top: it may show at the cuff's edge. Press or steam it out before finishing. ${TELL}`,
      { at: h.text, near },
    ),
  legVisible: (h: Len, aboveTop: string): CreaseLanding =>
    land(
      'leg-visible',
      h,
      `The old hem crease will show on the leg, ${h.text} above the finished edge, ${aboveTop} above the cuff top. Press or steam it out before finishing, or choose a cuff depth that covers it. ${TELL}`,
      { at: h.text, aboveTop },
    ),
  behindLeg: (h: Len): CreaseLanding =>
    land('behind-cuff', h, `The old crease lies on the leg behind the cuff, ${h.text} above the finished edge: the cuff hides it.`, {
      at: h.text,
      under: 'leg',
    }),
  underFace: (h: Len): CreaseLanding =>
    land('behind-cuff', h, `The old crease lies under the cuff face, ${h.text} above the finished edge: hidden.`, { at: h.text, under: 'face' }),
  cuffFace: (h: Len): CreaseLanding =>
    land(
      'cuff-face',
      h,
      `The old crease will show on the face of the cuff, ${h.text} above the finished edge. Press it out, or change the cuff depth so it falls on a fold. ${TELL}`,
      { at: h.text },
    ),
  inside: (h: Len): CreaseLanding => land('inside', h, `The old crease ends up inside the leg, ${h.text} above the finished edge: hidden.`, { at: h.text }),
  cutAway: (h: Len, below: string): CreaseLanding => land('cut-away', h, `The old crease lies ${below} below the cutting line and is cut away.`, { below }),
};

/** The warning of a visible landing: its place, then its values in their order (as { place, ...values }, spelled out). */
export function creaseWarning(landing: CreaseLanding): PlanWarning {
  const { place, values: v } = landing;
  const values: Record<string, string> =
    place === 'at-cuff-top' ? { place, at: v.at!, near: v.near! } : place === 'leg-visible' ? { place, at: v.at!, aboveTop: v.aboveTop! } : { place, ...v };
  return { code: 'old-crease-visible', message: landing.message, values };
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
  if (fold !== null) return say.onFold(len(fold === 'cuff top' ? d : ZERO), fold);
  if (c < 0) {
    // On the leg the height is −crease. Near the cuff top's height the verdict is "may show", with
    // the tolerance stated, so 1/16 in either way cannot flip "hidden" to "will show" unannounced.
    const at = len(crease, true);
    // crease + d: how far the crease lies below the cuff top's height (negative above it); once.
    const fromTop = crease.add(d);
    if (fromTop.abs().compare(ctx.nearCuffTop) <= 0) return say.atCuffTop(at, len(ctx.nearCuffTop).text);
    if (fromTop.sign() <= 0) return say.legVisible(at, len(fromTop, true).text);
    return say.behindLeg(at);
  }
  if (crease.compare(lines.cuffTop) <= 0) {
    // With a turn of cloth the first section is longer than the cuff is high; the cuff top caps it.
    return say.underFace(len(crease.compare(d) <= 0 ? crease : d));
  }
  if (crease.compare(lines.innerFold) <= 0) {
    const up = lines.innerFold.sub(crease);
    return say.cuffFace(len(up.compare(d) <= 0 ? up : d));
  }
  const h = len(crease.sub(lines.innerFold));
  if (crease.compare(lines.cut) <= 0) return say.inside(h);
  return say.cutAway(h, len(crease.sub(lines.cut)).text);
}

/** What creaseLanding needs, as integers over one denominator D mm (see quickCreaseLanding). */
export interface QuickCreaseContext {
  /** cuff depth, and the cuff top, inner fold and cut below the mark */
  d: number;
  cuffTop: number;
  innerFold: number;
  cut: number;
  onFoldWithin: number;
  nearCuffTop: number;
  D: number;
  ratio: RatioLenMaker;
}

// |c − at| ≤ within.
function within(c: number, at: number, w: number): boolean {
  return (c < at ? at - c : c - at) <= w;
}

/** creaseLanding on integers over one denominator (each verdict and Len the same): the crease is c/D mm below the mark. */
export function quickCreaseLanding(c: number, ctx: QuickCreaseContext): CreaseLanding {
  const { d, cuffTop, innerFold, cut, onFoldWithin: w, D, ratio } = ctx;
  const fold = within(c, 0, w) ? 'finished edge' : within(c, cuffTop, w) ? 'cuff top' : within(c, innerFold, w) ? 'inner fold' : null;
  if (fold !== null) return say.onFold(ratio(fold === 'cuff top' ? d : 0, D), fold);
  if (c < 0) {
    const at = ratio(-c, D);
    const fromTop = c + d;
    if ((fromTop < 0 ? -fromTop : fromTop) <= ctx.nearCuffTop) return say.atCuffTop(at, ratio(ctx.nearCuffTop, D).text);
    if (fromTop <= 0) return say.legVisible(at, ratio(-fromTop, D).text);
    return say.behindLeg(at);
  }
  if (c <= cuffTop) {
    // biome-ignore lint/complexity/useMathMinMax: integers on the hot path, compared in place
    return say.underFace(ratio(c <= d ? c : d, D));
  }
  if (c <= innerFold) {
    const up = innerFold - c;
    // biome-ignore lint/complexity/useMathMinMax: integers on the hot path, compared in place
    return say.cuffFace(ratio(up <= d ? up : d, D));
  }
  const h = ratio(c - innerFold, D);
  if (c <= cut) return say.inside(h);
  return say.cutAway(h, ratio(c - cut, D).text);
}
