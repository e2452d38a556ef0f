// One plausible value for every field of the fitting registry (lengths in inches), as a tailor would type
// it: a cuffed leg with a gentle taper (figures from TRADE.md's usual ranges, else common practice,
// no source). The registry tests require one here for every field.
import type { FieldKey } from '@/lib/shared/fitting/kinds';

/** A sample typed value for every registry field. */
export const FITTING_VALUES: Record<FieldKey, string> = {
  backPin: '31 1/2',
  frontPin: '31 1/4',
  cuffDepth: '1 1/2',
  hemSection: '1 1/2',
  slope: '1/2',
  hemAllowance: '1 1/2',
  turnUnder: '1/2',
  // TRADE.md: tack about 1/8 to 3/16 in below the cuff top.
  tackBelowTop: '3/16',
  available: '6',
  oldCrease: '2',
  widthAtEdge: '8',
  widthAbove: '8 3/4',
  heightAbove: '12',
  widthAtCut: '8 1/8',
  seamAllowance: '1/2',
  // Jeans kept on their factory hem (fitted on the 'original' finish): 2 in off, a 5/8 in factory hem,
  // joined with 3/8 in each side (common practice (no source); docs/KINDS.md).
  shortenBy: '2',
  factoryHem: '5/8',
  joinSeam: '3/8',
  // Invented wearer: taken in 1 in, waist 34 in, seat 40 in, 8 in apart (common practice, no source).
  waistChange: '-1',
  waistGirth: '34',
  seatGirth: '40',
  waistToSeat: '8',
  // Unwashed cloth on a hem: the shop's own 6 % (invented), shrinking over a 30 in inseam (common practice, no source).
  shrinkCloth: 'other',
  shrinkPercent: '6',
  lengthToMark: '30',
};
