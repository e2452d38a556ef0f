// The claim slip as a react-pdf page (A6): ticket number large, garments, due date, money.
import { Document, Page, StyleSheet, Text, View, type DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { FAMILY } from '@/lib/cut-sheet/fonts';
import { formatMoney } from '@/lib/pricing/money';
import type { ClaimSlipData } from './types';
import { ticketLabel } from '@/lib/ticket-number';

/** A6 in points (105 × 148 mm). */
export const SLIP_PT = { width: 297.64, height: 419.53 } as const;

const s = StyleSheet.create({
  page: { fontFamily: FAMILY, fontSize: 9, color: '#111111', padding: 18 },
  shop: { fontSize: 12, fontWeight: 800 },
  soft: { fontSize: 8, color: '#555555' },
  kicker: { fontSize: 8, fontWeight: 700, letterSpacing: 1.5, color: '#555555', marginTop: 10 },
  number: { fontSize: 30, fontWeight: 800 },
  row: { flexDirection: 'row', justifyContent: 'space-between', paddingVertical: 1.5 },
  rule: { borderTopWidth: 0.75, borderTopColor: '#999999', marginTop: 6, paddingTop: 4 },
  strong: { fontWeight: 700 },
  big: { fontSize: 14, fontWeight: 800 },
});

/** The slip's document; `family` comes from typeset(data) (Inter alone for Latin-only text). */
export function claimSlipDocument(d: ClaimSlipData, family: string | string[] = FAMILY): ReactElement<DocumentProps> {
  const money = (n: number) => formatMoney(n, d.currency);
  return (
    <Document title={`Claim slip ${ticketLabel(d.ticketNumber, d.shopName)}`} author={d.shopName}>
      <Page size={[SLIP_PT.width, SLIP_PT.height]} style={family === FAMILY ? s.page : [s.page, { fontFamily: family }]}>
        <Text style={s.shop}>{d.shopName}</Text>
        {d.location ? <Text style={s.soft}>{d.location}</Text> : null}
        {d.hours ? <Text style={s.soft}>Hours: {d.hours}</Text> : null}
        <Text style={s.kicker}>CLAIM SLIP</Text>
        <Text style={s.number}>{ticketLabel(d.ticketNumber, d.shopName)}</Text>
        {d.customerName ? <Text style={s.strong}>{d.customerName}</Text> : null}
        <View style={s.rule}>
          <View style={s.row}>
            <Text>Received</Text>
            <Text style={s.strong}>{d.receivedOn}</Text>
          </View>
          <View style={s.row}>
            <Text>Ready by</Text>
            <Text style={s.strong}>{d.dueOn ?? 'we will let you know'}</Text>
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
    </Document>
  );
}
