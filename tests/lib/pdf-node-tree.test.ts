// Our documents' node trees made without React's reconciler are the very trees react-pdf's own
// renderer commits for them (its createInstance, createTextInstance and appendChild through React
// 19's reconciler), and they print the same PDF objects (bar the date) as react-pdf's renderToBuffer:
// every kind of cut sheet (generated ones of every sort, overfull ones with a page of strip, a
// sleeve sheet, a skipped-garments page), a claim slip and a receipt. Invented shop and customers.
import { Document, Page, pdf, renderToBuffer, Text, View, type DocumentProps } from '@react-pdf/renderer';
import { createElement, Fragment, useState, type ReactElement } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { claimSlipDocument } from '@/lib/server/claim-slip/ClaimSlip';
import { cutSheetDocument } from '@/lib/server/cut-sheet/CutSheet';
import { typeset } from '@/lib/server/cut-sheet/fonts';
import { documentNode } from '@/lib/server/pdf-node-tree';
import { receiptDocument } from '@/lib/server/receipt/Receipt';
import type { ReceiptData } from '@/lib/server/receipt/types';
import { renderPdf } from '@/lib/server/render-pdf';
import { SLEEVE_ADAPTER } from '@/lib/shared/fitting/sleeve-fitting';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { comparable } from './cut-sheet/pdf-objects';
import { SHOP } from './cut-sheet/sheets';
import { SLIP } from './claim-slip/slip';
import { generatedSheets } from './pdf-platform/generated-sheets';

const RECEIPT: ReceiptData = {
  shopName: 'Pinmark & Hem',
  location: '7 Bobbin Row, Wickhollow',
  hours: 'Tue–Fri 9:00–18:00',
  ticketNumber: 'PH 1007',
  customerName: 'Perrin Loame',
  printedAt: 'Tue 8 Dec 16:05',
  payment: { how: 'Card', at: 'Tue 8 Dec 16:04', amountMinor: 1500, takenBy: 'Sam Ortiz' },
  lines: SLIP.lines,
  currency: 'EUR',
  total: 2000,
  payments: [
    { how: 'Cash', at: 'Tue 1 Dec 10:12', amountMinor: 500 },
    { how: 'Card', at: 'Tue 8 Dec 16:04', amountMinor: 1500 },
  ],
  refunds: [],
  paid: 2000,
  refunded: 0,
  due: 0,
  credit: 0,
};

const SLEEVES: CutSheetData = {
  ...SHOP,
  garment: 'Charcoal jacket',
  unit: 'in',
  precision: 8,
  legs: [],
  kindSheet: { kind: 'sleeves', plan: SLEEVE_ADAPTER.plan({ shortenBy: '1', buttonholes: 'decorative', ventLength: '4 1/2' }, 'in', 8) },
};

// Each document as the services build it: typeset first (a font stack where the text needs one).
// Built once for both comparisons.
let built: Promise<[string, ReactElement<DocumentProps>][]> | null = null;
const documents = () => (built ??= buildDocuments());

async function buildDocuments(): Promise<[string, ReactElement<DocumentProps>][]> {
  const sheets = [...generatedSheets(16, 4410), SLEEVES];
  const out: [string, ReactElement<DocumentProps>][] = [];
  for (const [i, d] of sheets.entries()) {
    const { family, print } = await typeset([[d], []]);
    out.push([`sheet ${i}`, cutSheetDocument(print([d]), false, [], family)]);
    out.push([`sheet ${i} wrapped`, cutSheetDocument(print([d]), true, [], family)]);
  }
  const { family, print } = await typeset([sheets.slice(0, 5), ['T-204 Olive chinos', 'T-207 Тёмные брюки']]);
  out.push([
    'batch with skipped garments',
    cutSheetDocument(print(sheets.slice(0, 5)), [false, true], print(['T-204 Olive chinos', 'T-207 Тёмные брюки']), family),
  ]);
  const slip = await typeset(SLIP);
  out.push(['claim slip', claimSlipDocument(slip.print(SLIP), slip.family, { slips: 2, tags: 2 })]);
  const receipt = await typeset(RECEIPT);
  out.push(['receipt', receiptDocument(receipt.print(RECEIPT), receipt.family)]);
  return out;
}

// The tree react-pdf's reconciler commits for a document, on a root of its own.
function reconciled(element: ReactElement): unknown {
  const root = pdf();
  root.updateContainer(element);
  return (root.container as { document: unknown }).document;
}

// A tree with each function prop (the QR code's paint, made afresh by each render) given as its
// source and what it carries (the code it draws): two renders of one document compare equal.
function drawn(value: unknown): unknown {
  if (typeof value === 'function') return { source: String(value), ...value };
  if (Array.isArray(value)) return value.map(drawn);
  if (typeof value === 'object' && value !== null) return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, drawn(v)]));
  return value;
}

describe('document node trees without the reconciler', () => {
  it("are react-pdf's own committed trees, node for node, for every kind of document we print", async () => {
    const all = await documents();
    expect(all.length).toBe(2 * 17 + 3);
    for (const [name, element] of all) expect(drawn(documentNode(element)), name).toEqual(drawn(reconciled(element)));
    // The sheets with a link carry their QR code's paint, and it rides on the comparison.
    expect(JSON.stringify(drawn(documentNode(all[0]![1])))).toContain('"rects"');
  });

  it('print the same PDF objects as react-pdf renderToBuffer', async () => {
    const all = await documents();
    for (const [name, element] of all.filter((_, i) => i % 3 === 0 || i >= all.length - 3))
      expect(comparable(await renderPdf(element)), name).toEqual(comparable(await renderToBuffer(element as never)));
  }, 120_000);

  it('read children as React does: nothing for null, false and empty strings, numbers as text, arrays and fragments flattened', () => {
    const Part = ({ n }: { n: number }) =>
      createElement(Fragment, null, [createElement(Text, { key: 'a' }, 'n = ', n, '', null, false), [createElement(View, { key: 'b' })]]);
    const element = createElement(Document, null, createElement(Page, { size: 'A6' }, createElement(Part, { n: 7 }), undefined, true));
    const tree = documentNode(element);
    expect(tree).toEqual(reconciled(element));
    const page = tree.children[0] as { children: { type: string; children: unknown[] }[] };
    expect(page.children.map((c) => c.type)).toEqual(['TEXT', 'VIEW']);
    expect(page.children[0]!.children).toEqual([
      { type: 'TEXT_INSTANCE', value: 'n = ' },
      { type: 'TEXT_INSTANCE', value: '7' },
    ]);
  });

  it('drops text outside a Text with the same warning as react-pdf', () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined);
    try {
      const element = createElement(Document, null, createElement(Page, null, createElement(View, null, 'loose words')));
      expect(documentNode(element)).toEqual(reconciled(element));
      expect(warn).toHaveBeenCalledWith("Invalid 'loose words' string child outside <Text> component");
    } finally {
      warn.mockRestore();
    }
  });

  it('refuses what only React could render: hooks fail loudly, class components and render props are named', () => {
    const WithHook = () => createElement(Text, null, useState('x')[0]);
    const quiet = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      expect(() => documentNode(createElement(Document, null, createElement(Page, null, createElement(WithHook))))).toThrow();
    } finally {
      quiet.mockRestore();
    }
    function Old() {}
    Old.prototype.isReactComponent = {};
    expect(() => documentNode(createElement(Document, null, createElement(Old as never)))).toThrow(/plain function components/);
    expect(() => documentNode(createElement(Document, null, createElement(Page, null, createElement(Text, { render: () => 'x' } as never))))).toThrow(
      /'render' function props/,
    );
    expect(() => documentNode(createElement(Page))).toThrow(/one <Document>/);
  });
});
