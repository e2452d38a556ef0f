// What the counter's A6 papers share (the claim slip and the payment receipt): the page size and
// one set of styles, so both read as one shop's stationery.
import { StyleSheet, type Page } from '@react-pdf/renderer';
import type { ComponentProps } from 'react';
import { FAMILY } from '@/lib/server/cut-sheet/fonts';

/** A6 in points (105 × 148 mm). */
export const SLIP_PT = { width: 297.64, height: 419.53 } as const;

/** react-pdf's own style type, as its Page takes it (the package does not export it by name). */
export type Style = Exclude<NonNullable<ComponentProps<typeof Page>['style']>, readonly unknown[]>;

/** The counter papers' styles: the page, the shop's name, soft print, headings, rows and rules. */
export const slipStyles = StyleSheet.create({
  page: { fontFamily: FAMILY, fontSize: 9, color: '#111111', padding: 18 },
  shop: { fontSize: 12, fontWeight: 800 },
  soft: { fontSize: 8, color: '#555555' },
  kicker: { fontSize: 8, fontWeight: 700, letterSpacing: 1.5, color: '#555555', marginTop: 10 },
  row: { flexDirection: 'row', justifyContent: 'space-between', paddingVertical: 1.5 },
  rule: { borderTopWidth: 0.75, borderTopColor: '#999999', marginTop: 6, paddingTop: 4 },
  strong: { fontWeight: 700 },
  big: { fontSize: 14, fontWeight: 800 },
});
