// A payment receipt as a react-pdf page (A6, like the claim slip): the shop, the ticket, the
// payment it is for (how, when, taken by whom), the live lines, and the account as printed.
import { Document, Page, StyleSheet, Text, View, type DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { SLIP_PT, slipStyles, type Style } from '@/lib/server/claim-slip/slip-styles';
import { FAMILY } from '@/lib/server/cut-sheet/fonts';
import { formatMoney } from '@/lib/pricing/money';
import type { ReceiptData } from './types';

const s = { ...slipStyles, ...StyleSheet.create({ number: { fontSize: 18, fontWeight: 800 } }) };

/** The receipt's document; `family` comes from typeset(data) (Inter alone for Latin-only text). */
export function receiptDocument(d: ReceiptData, family: string | string[] = FAMILY): ReactElement<DocumentProps> {
  const money = (n: number) => formatMoney(n, d.currency);
  const row = (left: string, right: string, style: Style = {}) => (
    <View style={s.row}>
      <Text style={[{ flexShrink: 1, paddingRight: 6 }, style]}>{left}</Text>
      <Text style={style}>{right}</Text>
    </View>
  );
  return (
    <Document title={`Receipt ${d.ticketNumber}`} author={d.shopName}>
      <Page size={[SLIP_PT.width, SLIP_PT.height]} style={family === FAMILY ? s.page : [s.page, { fontFamily: family }]}>
        <Text style={s.shop}>{d.shopName}</Text>
        {d.location ? <Text style={s.soft}>{d.location}</Text> : null}
        {d.hours ? <Text style={s.soft}>Hours: {d.hours}</Text> : null}
        <Text style={s.kicker}>RECEIPT</Text>
        <Text style={s.number}>Ticket {d.ticketNumber}</Text>
        {d.customerName ? <Text style={s.strong}>{d.customerName}</Text> : null}
        <View style={s.rule}>
          {row('Received with thanks', money(d.payment.amountMinor), s.big)}
          <Text>
            By {d.payment.how}, {d.payment.at}
            {d.payment.takenBy ? `, taken by ${d.payment.takenBy}` : ''}
          </Text>
        </View>
        <View style={s.rule}>
          {d.lines.map((l, i) => (
            <View key={i}>{row(l.label, money(l.amountMinor))}</View>
          ))}
          <View style={s.rule}>{row('Total', money(d.total), s.strong)}</View>
          {d.payments.map((p, i) => (
            <View key={`p${i}`}>{row(`Paid ${p.at}, ${p.how}`, money(p.amountMinor))}</View>
          ))}
          {d.refunds.map((r, i) => (
            <View key={`r${i}`}>{row(`${r.how} ${r.at}`, money(-r.amountMinor))}</View>
          ))}
          <View style={s.rule}>{row('Balance due', money(d.due), s.big)}</View>
          {d.credit > 0 ? row('Owed to you', money(d.credit), s.strong) : null}
        </View>
        <Text style={[s.soft, { marginTop: 10 }]}>Account as printed {d.printedAt}. Keep this receipt with your claim slip.</Text>
      </Page>
    </Document>
  );
}
