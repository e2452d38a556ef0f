// react-pdf documents to PDF bytes: each document's node tree is made straight from its elements
// (pdf-node-tree.ts, no React root kept between documents), laid out and drawn with pdfkit as
// react-pdf's own toBuffer does. Documents are laid out one at a time. Server only.
import { Font } from '@react-pdf/renderer';
import layoutDocument, { type SafeDocumentNode } from '@react-pdf/layout';
import renderPdfLayout from '@react-pdf/render';
import PDFDocument from 'pdfkit';
import type { DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { documentNode } from './pdf-node-tree';

let queue: Promise<unknown> = Promise.resolve();

async function layOut(doc: ReactElement<DocumentProps>): Promise<{ props: DocumentProps; layout: SafeDocumentNode }> {
  const document = documentNode(doc);
  // The types name one argument; react-pdf itself passes its font store as the second.
  const layoutWithFonts = layoutDocument as unknown as (doc: never, fonts: typeof Font) => Promise<SafeDocumentNode>;
  const layout = await layoutWithFonts(document as never, Font);
  return { props: document.props as DocumentProps, layout };
}

/** A laid-out document's pages, and a way to lay out another document's pages. */
export type Relayout = (layout: SafeDocumentNode, layOut: (doc: ReactElement<DocumentProps>) => Promise<SafeDocumentNode>) => Promise<SafeDocumentNode>;

// A pdfkit document as react-pdf's own toBuffer makes it (@react-pdf/renderer 4.9's render), from
// every Document prop it reads: a prop left out here would silently drop from the PDF (the author).
function newPdf(props: DocumentProps): { ctx: PdfCtx; stream: NodeJS.ReadableStream } {
  const { pdfVersion, conformance, language, pageLayout, pageMode, title, author, subject, keywords } = props;
  const { creator = 'react-pdf', producer = 'react-pdf', creationDate = new Date(), modificationDate, ownerPassword, userPassword, permissions } = props;
  const info = Object.fromEntries(
    Object.entries({
      Title: title,
      Author: author,
      Subject: subject,
      Keywords: keywords,
      Creator: creator,
      Producer: producer,
      CreationDate: creationDate,
      ModificationDate: modificationDate,
    }).filter(([, v]) => v !== undefined),
  );
  const Ctor = PDFDocument as unknown as new (options: object) => PdfCtx & { _root: { data: Record<string, unknown> } };
  const ctx = new Ctor({
    compress: true,
    subset: conformance,
    pdfVersion: pdfVersion || (conformance ? (conformance.startsWith('PDF/A-1') ? '1.4' : '1.7') : undefined),
    lang: language,
    displayTitle: true,
    autoFirstPage: false,
    ownerPassword,
    userPassword,
    permissions,
    pageLayout,
    info,
  });
  if (pageMode) ctx._root.data.PageMode = pageMode.charAt(0).toUpperCase() + pageMode.slice(1);
  return { ctx, stream: ctx as unknown as NodeJS.ReadableStream };
}

interface PdfCtx {
  end(): unknown;
}

// Draws laid-out pages onto a document that stays open: react-pdf's render ends the document
// after the pages it is given, so its end is held back until the last part.
function drawOpen(ctx: PdfCtx, layout: SafeDocumentNode): void {
  const end = ctx.end;
  ctx.end = () => ctx;
  try {
    renderPdfLayout(ctx as never, layout);
  } finally {
    ctx.end = end;
  }
}

// One turn: documents are laid out and drawn one at a time (the layout's memos are shared);
// calls made meanwhile wait for it.
function turn<T>(work: () => Promise<T>): Promise<T> {
  const next = queue.then(work);
  queue = next.catch(() => undefined);
  return next;
}

/** One part of a PDF drawn in parts: a document to lay out, and what to change in its layout before drawing. */
export interface PdfPart {
  doc: ReactElement<DocumentProps>;
  adjust?: Relayout;
}

// An open PDF: what pdfkit wrote is taken as it comes, and the end is waited for.
function openPdf(props: DocumentProps) {
  const { ctx, stream } = newPdf(props);
  let pending: Buffer[] = [];
  let failed: unknown = null;
  stream.on('data', (chunk: Buffer) => pending.push(chunk));
  const ended = new Promise<void>((resolve, reject) => {
    stream.on('end', resolve);
    stream.on('error', (e) => reject((failed = e)));
  });
  ended.catch(() => undefined);
  // The stream hands on what pdfkit wrote within a tick or so.
  const take = async () => {
    await new Promise((resolve) => setImmediate(resolve));
    if (failed) throw failed;
    const out = Buffer.concat(pending);
    pending = [];
    return out;
  };
  return { ctx, ended, take };
}

/**
 * Draws parts (documents laid out one at a time, each in its own turn) as the pages
 * of ONE PDF, yielding its bytes as each part is drawn: a big batch never holds more than one
 * part's layout, and its fonts are subset once over every page, as if drawn in one document.
 * The document's title and info come from `props`, or else from the first part's Document.
 */
export async function* renderPdfParts(parts: Iterable<PdfPart>, props?: DocumentProps): AsyncGenerator<Buffer> {
  let pdf = props ? openPdf(props) : null;
  const each = parts[Symbol.iterator]();
  for (let next = each.next(); !next.done; ) {
    const { doc, adjust } = next.value;
    await turn(async () => {
      const first = await layOut(doc);
      const layout = adjust ? await adjust(first.layout, async (other) => (await layOut(other)).layout) : first.layout;
      pdf ??= openPdf(first.props);
      drawOpen(pdf.ctx, layout);
    });
    next = each.next();
    // pdfkit writes a page when the next one begins: what is out so far goes now, unless this was
    // the last part (then it goes with the end, one wait for the stream instead of two).
    if (next.done) break;
    const out = await pdf!.take();
    if (out.length > 0) yield out;
  }
  if (!pdf) throw new Error('A PDF needs a part or its document props.');
  pdf.ctx.end();
  await pdf.ended;
  yield await pdf.take();
}

/** A PDF drawn in pieces, as one buffer once its last piece is out. */
export async function wholePdf(pieces: AsyncIterable<Buffer>): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of pieces) chunks.push(chunk);
  return Buffer.concat(chunks);
}

/** Renders a react-pdf document to PDF bytes; calls made meanwhile wait their turn. */
export function renderPdf(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  return wholePdf(renderPdfParts([{ doc }]));
}
