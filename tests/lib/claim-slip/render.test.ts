// The claim slip read back with poppler: one A6 page carrying the ticket number, the customer,
// the garments, the due date, each line and the money, in the shop's currency.
import { describe, expect, it } from 'vitest';
import { renderClaimSlip } from '@/lib/claim-slip/render';
import type { ClaimSlipData } from '@/lib/claim-slip/types';
import { flatText, layoutText, pageInfo, pdfFile } from '../cut-sheet/poppler';

// Invented shop, customer and prices.
const SLIP: ClaimSlipData = {
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

describe('claim slip', () => {
  it('is one A6 page (105 × 148 mm = 297.64 × 419.53 pt at 72 pt to 25.4 mm)', async () => {
    const info = pageInfo(pdfFile(await renderClaimSlip(SLIP)));
    expect(info.pages).toBe(1);
    expect(info.width).toBeCloseTo(297.64, 1);
    expect(info.height).toBeCloseTo(419.53, 1);
  });

  it('carries the ticket number, customer, garments, due date and every amount', async () => {
    const file = pdfFile(await renderClaimSlip(SLIP));
    const text = flatText(file);
    for (const words of ['PH 1007', 'Perrin Loame', '1. Charcoal flannel', '2. Brown moleskin', 'Ready by 2026-12-08', 'Hours: Tue–Fri 9:00–18:00']) {
      expect(text).toContain(words);
    }
    const rows = layoutText(file);
    expect(rows).toMatch(/Cuff from a plain hem\s+€24\.00/);
    expect(rows).toMatch(/Regular customer \(second pair\)\s+-€4\.00/);
    expect(rows).toMatch(/Total\s+€20\.00/);
    expect(rows).toMatch(/Paid\s+€5\.00/);
    expect(rows).toMatch(/Balance due\s+€15\.00/);
  });

  it('says the shop will let the customer know when no date is set', async () => {
    const text = flatText(pdfFile(await renderClaimSlip({ ...SLIP, dueOn: null })));
    expect(text).toContain('Ready by we will let you know');
  });
});
