// Sizes and colours of the sheet, in points (72 to the inch). Distances are read at arm's length,
// and nothing a person reads at the bench is set under READ_MIN (9 pt).
import { StyleSheet } from '@react-pdf/renderer';
import { FAMILY } from './fonts';
import { SHEET_FEATURES } from './shaping-features';

/** Ink colours: the cut red is dark enough to print as near-black in greyscale. */
export const INK = { text: '#111111', soft: '#555555', rule: '#999999', cut: '#b3121b', fill: '#f1efe9', warn: '#8a4b00' } as const;

/** Width of the right-hand column that holds the check ruler and the chalk guide. */
export const GUIDE_COLUMN = 162;

/** The least size of any text read at the bench (pressing table, arm's length). */
export const READ_MIN = 9;

/** The sheet's text styles. */
export const s = StyleSheet.create({
  page: { fontFamily: FAMILY, fontSize: READ_MIN, color: INK.text, padding: 28, fontFeatureSettings: SHEET_FEATURES },
  header: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'flex-start',
    borderBottomWidth: 2,
    borderBottomColor: INK.text,
    paddingBottom: 6,
    marginBottom: 8,
  },
  kicker: { fontSize: READ_MIN, fontWeight: 700, letterSpacing: 1.5, color: INK.soft },
  // One line each, whatever the shop typed: the header must not push the sheet off the page.
  title: { fontSize: 17, fontWeight: 800, maxLines: 1, textOverflow: 'ellipsis' },
  ticket: { fontSize: 20, fontWeight: 800 },
  meta: { fontSize: 11, fontWeight: 700, marginTop: 2, maxLines: 2, textOverflow: 'ellipsis' },
  note: { fontSize: READ_MIN, color: INK.soft },
  body: { flexDirection: 'row' },
  main: { paddingRight: 12 },
  side: { width: GUIDE_COLUMN, borderLeftWidth: 0.75, borderLeftColor: INK.rule, paddingLeft: 8 },
  legTitle: { fontSize: 12.5, fontWeight: 800 },
  legLabel: { fontSize: READ_MIN, fontWeight: 700, letterSpacing: 1.2, color: INK.soft },
  th: { fontSize: READ_MIN, fontWeight: 700, color: INK.soft },
  lineName: { fontSize: 10, fontWeight: 400 },
  lineNo: { fontSize: 10, fontWeight: 800 },
  value: { fontSize: 14, fontWeight: 700 },
  cutValue: { fontSize: 20, fontWeight: 800, color: INK.cut },
  cutCaption: { fontSize: READ_MIN, fontWeight: 700, color: INK.cut },
  badge: { fontSize: 10, fontWeight: 800, color: '#ffffff', backgroundColor: INK.text, paddingHorizontal: 4, paddingTop: 1.5, letterSpacing: 1 },
  small: { fontSize: READ_MIN },
  strong: { fontWeight: 700 },
  h2: { fontSize: 9.5, fontWeight: 800, letterSpacing: 0.5, marginTop: 4, marginBottom: 2 },
  step: { flexDirection: 'row', marginBottom: 0.5 },
  stepNo: { width: 13, fontWeight: 800 },
  stepText: { flex: 1 },
});
