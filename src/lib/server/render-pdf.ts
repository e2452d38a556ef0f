// One react-pdf root for the whole process, documents rendered through it one at a time.
// react-pdf's renderToBuffer makes a new React root for every document and never lets go of it
// (React keeps each in its list of scheduled roots, with the whole document tree): a server that
// printed a few thousand sheets would run out of memory, and the growing heap slowed every render.
// A shared root has one trap: a component that throws while drawing does not make the update
// throw (React reports it and keeps the last tree), so toBuffer would print the PREVIOUS document.
// Each document is therefore stamped, and refused unless the root holds that very stamp. Server only.
import { Document, Font, pdf } from '@react-pdf/renderer';
import layoutDocument, { type SafeDocumentNode } from '@react-pdf/layout';
import renderPdfLayout from '@react-pdf/render';
import PDFDocument from 'pdfkit';
import type { DocumentProps } from '@react-pdf/renderer';
import { cloneElement, createElement, type ReactElement } from 'react';

type Instance = ReturnType<typeof pdf>;

let instance: Instance | null = null;
let queue: Promise<unknown> = Promise.resolve();

async function render(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  instance ??= pdf();
  // A fresh callback as the stamp this document, and no other, carries (the renderer compares
  // other props by content, so a new Date or title could look unchanged and not be committed).
  const stamp = () => undefined;
  // The update commits at once, and toBuffer takes the committed document before it awaits.
  instance.updateContainer(cloneElement(doc, { onRender: stamp }));
  const committed = (instance.container as { document?: { props?: DocumentProps } | null }).document;
  if (committed?.props?.onRender !== stamp) throw new Error('The PDF could not be drawn: a part of the document failed (see the log).');
  const stream = await instance.toBuffer();
  const chunks: Buffer[] = [];
  return new Promise((resolve, reject) => {
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('end', () => resolve(Buffer.concat(chunks)));
    stream.on('error', reject);
  });
}

// Commits a document to the root, refusing it unless the root holds that very document.
function commit(doc: ReactElement<DocumentProps>): DocumentProps {
  instance ??= pdf();
  const stamp = () => undefined;
  instance.updateContainer(cloneElement(doc, { onRender: stamp }));
  const committed = (instance.container as { document?: { props?: DocumentProps } | null }).document;
  if (committed?.props?.onRender !== stamp) throw new Error('The PDF could not be drawn: a part of the document failed (see the log).');
  return committed.props;
}

async function layOut(doc: ReactElement<DocumentProps>): Promise<{ props: DocumentProps; layout: SafeDocumentNode }> {
  const props = commit(doc);
  // The laid-out tree is a new one: the root may take the next document while this one waits to be drawn.
  // The types name one argument; react-pdf itself passes its font store as the second.
  const layoutWithFonts = layoutDocument as unknown as (doc: never, fonts: typeof Font) => Promise<SafeDocumentNode>;
  const layout = await layoutWithFonts((instance!.container as { document: never }).document, Font);
  return { props, layout };
}

/** A laid-out document's pages, and a way to lay out another document's pages through the same root. */
export type Relayout = (layout: SafeDocumentNode, layOut: (doc: ReactElement<DocumentProps>) => Promise<SafeDocumentNode>) => Promise<SafeDocumentNode>;

// A pdfkit document as react-pdf's own toBuffer makes it, for the props our documents use.
function newPdf(props: DocumentProps): { ctx: PdfCtx; stream: NodeJS.ReadableStream } {
  const { title, creator = 'react-pdf', producer = 'react-pdf' } = props;
  const info = Object.fromEntries(
    Object.entries({ Title: title, Creator: creator, Producer: producer, CreationDate: new Date() }).filter(([, v]) => v !== undefined),
  );
  const Ctor = PDFDocument as unknown as new (options: object) => PdfCtx;
  const ctx = new Ctor({ compress: true, displayTitle: true, autoFirstPage: false, info });
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

async function renderLaidOut(doc: ReactElement<DocumentProps>, adjust: Relayout): Promise<Buffer> {
  const first = await layOut(doc);
  const layout = await adjust(first.layout, async (other) => (await layOut(other)).layout);
  const { ctx, stream } = newPdf(first.props);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('end', () => resolve(Buffer.concat(chunks)));
    stream.on('error', reject);
  });
  renderPdfLayout(ctx as never, layout);
  return done;
}

// One turn of the shared root: calls made meanwhile wait for it.
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

/**
 * Draws parts (documents laid out one at a time, each in its own turn of the root) as the pages
 * of ONE PDF, yielding its bytes as each part is drawn: a big batch never holds more than one
 * part's layout, and its fonts are subset once over every page, as if drawn in one document.
 * The document's title and info come from `props`. After the last part the root lets go of it.
 */
export async function* renderPdfParts(parts: Iterable<PdfPart>, props: DocumentProps): AsyncGenerator<Buffer> {
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
  let released = false;
  try {
    for (const { doc, adjust } of parts) {
      await turn(async () => {
        const first = await layOut(doc);
        const layout = adjust ? await adjust(first.layout, async (other) => (await layOut(other)).layout) : first.layout;
        drawOpen(ctx, layout);
      });
      // pdfkit writes a page when the next one begins: what is out so far goes now.
      const out = await take();
      if (out.length > 0) yield out;
    }
    ctx.end();
    await ended;
    await turn(release);
    released = true;
    yield await take();
  } finally {
    // A reader that stopped part way (a closed connection) lets go of the parts too.
    if (!released) void turn(release);
  }
}

// The root keeps the last document committed (and React the one before): an empty document in
// their place, so a batch's last part is not held until the next render.
async function release(): Promise<void> {
  if (!instance) return;
  instance.updateContainer(createElement(Document));
  instance.updateContainer(createElement(Document));
}

/** Lays a document out, lets `adjust` replace pages (laying out others through the same root), then draws it once: one PDF, one turn. */
export function renderPdfRelaid(doc: ReactElement<DocumentProps>, adjust: Relayout): Promise<Buffer> {
  return turn(() => renderLaidOut(doc, adjust));
}

/** Renders a react-pdf document to PDF bytes; calls made meanwhile wait their turn. */
export function renderPdf(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  return turn(() => render(doc));
}
