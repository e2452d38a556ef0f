// The claim slip as react-pdf pages (A6): ticket number large, garments, due date, money; then
// the tear-off garment tags (ticket number, garment, due date), four to a page, to pin on each pair.
import { Document, Page, StyleSheet, Text, View, type DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { FAMILY } from '@/lib/server/cut-sheet/fonts';
import { dueText } from '@/lib/shared/due-date';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { formatMoney } from '@/lib/pricing/money';
import { SLIP_PT, slipStyles, type Style } from './slip-styles';
import { DEFAULT_COPIES, type ClaimSlipData, type SlipCopies } from './types';

export { SLIP_PT };

/** Tear-off tags on one A6 page. */
export const TAGS_PER_PAGE = 4;

const s = {
  ...slipStyles,
  ...StyleSheet.create({
    number: { fontSize: 30, fontWeight: 800 },
    tagPage: { fontFamily: FAMILY, fontSize: 9, color: '#111111', paddingHorizontal: 18, paddingVertical: 8 },
    tag: { height: (SLIP_PT.height - 16) / TAGS_PER_PAGE, borderBottomWidth: 0.75, borderBottomColor: '#777777', borderStyle: 'dashed', paddingVertical: 6 },
    tagNumber: { fontSize: 22, fontWeight: 800 },
  }),
};

/** A date on the slip the way every screen says it ("Tue 8 Dec"). */
function day(iso: string): string {
  return dueText(iso);
}

function slipPage(d: ClaimSlipData, style: Style[], key: number): ReactElement {
  const money = (n: number) => formatMoney(n, d.currency);
  return (
    <Page key={`slip-${key}`} size={[SLIP_PT.width, SLIP_PT.height]} style={style}>
      <Text style={s.shop}>{d.shopName}</Text>
      {d.location ? <Text style={s.soft}>{d.location}</Text> : null}
      {d.hours ? <Text style={s.soft}>Hours: {d.hours}</Text> : null}
      <Text style={s.kicker}>CLAIM SLIP</Text>
      <Text style={s.number}>{ticketLabel(d.ticketNumber, d.shopName)}</Text>
      {d.customerName ? <Text style={s.strong}>{d.customerName}</Text> : null}
      <View style={s.rule}>
        <View style={s.row}>
          <Text>Received</Text>
          <Text style={s.strong}>{day(d.receivedOn)}</Text>
        </View>
        <View style={s.row}>
          <Text>Ready by</Text>
          <Text style={s.strong}>{d.dueOn ? day(d.dueOn) : 'we will let you know'}</Text>
        </View>
      </View>
      {d.garments.length > 0 ? (
        <View style={s.rule}>
          <Text style={s.strong}>Garments ({d.garments.length})</Text>
          {d.garments.map((g, i) => (
            <Text key={i}>
              {i + 1}. {g}
            </Text>
          ))}
        </View>
      ) : null}
      <View style={s.rule}>
        {d.lines.map((l, i) => (
          <View key={i} style={s.row}>
            <Text style={{ flexShrink: 1, paddingRight: 6 }}>{l.label}</Text>
            <Text>{money(l.amountMinor)}</Text>
          </View>
        ))}
        <View style={[s.row, s.rule]}>
          <Text style={s.strong}>Total</Text>
          <Text style={s.strong}>{money(d.total)}</Text>
        </View>
        <View style={s.row}>
          <Text>Paid</Text>
          <Text>{money(d.paid)}</Text>
        </View>
        <View style={s.row}>
          <Text style={s.big}>Balance due</Text>
          <Text style={s.big}>{money(d.due)}</Text>
        </View>
      </View>
      <Text style={[s.soft, { marginTop: 10 }]}>Keep this slip and bring it, or quote the ticket number, when you collect.</Text>
    </Page>
  );
}

/** The tags to print: each garment `tags` times, in garment order. */
export function tagsOf(d: ClaimSlipData, tags: number): { garment: string; index: number }[] {
  return d.garments.flatMap((garment, index) => Array.from({ length: tags }, () => ({ garment, index })));
}

function tagPages(d: ClaimSlipData, tags: number, style: Style[]): ReactElement[] {
  const all = tagsOf(d, tags);
  const pages: ReactElement[] = [];
  for (let start = 0; start < all.length; start += TAGS_PER_PAGE) {
    pages.push(
      <Page key={`tags-${start}`} size={[SLIP_PT.width, SLIP_PT.height]} style={style}>
        {all.slice(start, start + TAGS_PER_PAGE).map((t, i) => (
          <View key={i} style={s.tag} wrap={false}>
            <View style={s.row}>
              <Text style={s.tagNumber}>{ticketLabel(d.ticketNumber, d.shopName)}</Text>
              <Text style={s.soft}>
                Garment {t.index + 1} of {d.garments.length}
              </Text>
            </View>
            <Text style={s.strong}>{t.garment}</Text>
            <Text>Ready by {d.dueOn ? day(d.dueOn) : 'date to come'}</Text>
            <Text style={s.soft}>Tear along the dashes and pin to the garment.</Text>
          </View>
        ))}
      </Page>,
    );
  }
  return pages;
}

/** The slip's document: `copies.slips` slips, then `copies.tags` tags per garment; `family` comes from typeset(data). */
export function claimSlipDocument(d: ClaimSlipData, family: string | string[] = FAMILY, copies: SlipCopies = DEFAULT_COPIES): ReactElement<DocumentProps> {
  const font: Style = family === FAMILY ? {} : { fontFamily: family as Style['fontFamily'] };
  const slips = Array.from({ length: copies.slips }, (_, i) => slipPage(d, [s.page, font], i));
  return (
    <Document title={`Claim slip ${ticketLabel(d.ticketNumber, d.shopName)}`} author={d.shopName}>
      {slips}
      {tagPages(d, copies.tags, [s.tagPage, font])}
    </Document>
  );
}
