// A claim slip's data for the PDF tests: invented shop, customer and prices.
import type { ClaimSlipData } from '@/lib/server/claim-slip/types';

/** Two garments, a line and a discount, part paid, in euros. */
export const SLIP: ClaimSlipData = {
  shopName: 'Pinmark & Hem',
  location: '7 Bobbin Row, Wickhollow',
  hours: 'Tue–Fri 9:00–18:00',
  ticketNumber: 1007,
  customerName: 'Perrin Loame',
  receivedOn: '2026-12-01',
  dueOn: '2026-12-08',
  garments: ['Charcoal flannel', 'Brown moleskin'],
  lines: [
    { label: 'Cuff from a plain hem', amountMinor: 2400 },
    { label: 'Regular customer (second pair)', amountMinor: -400 },
  ],
  currency: 'EUR',
  total: 2000,
  paid: 500,
  due: 1500,
};
