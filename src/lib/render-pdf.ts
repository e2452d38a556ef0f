// One react-pdf root for the whole process, documents rendered through it one at a time.
// react-pdf's renderToBuffer makes a new React root for every document and never lets go of it
// (React keeps each in its list of scheduled roots, with the whole document tree): a server that
// printed a few thousand sheets would run out of memory, and the growing heap slowed every render.
// A shared root has one trap: a component that throws while drawing does not make the update
// throw (React reports it and keeps the last tree), so toBuffer would print the PREVIOUS document.
// Each document is therefore stamped, and refused unless the root holds that very stamp. Server only.
import { Font, pdf } from '@react-pdf/renderer';
import layoutDocument, { type SafeDocumentNode } from '@react-pdf/layout';
import renderPdfLayout from '@react-pdf/render';
import PDFDocument from 'pdfkit';
import type { DocumentProps } from '@react-pdf/renderer';
import { cloneElement, type ReactElement } from 'react';

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

async function renderLaidOut(doc: ReactElement<DocumentProps>, adjust: Relayout): Promise<Buffer> {
  const first = await layOut(doc);
  const layout = await adjust(first.layout, async (other) => (await layOut(other)).layout);
  const { title, creator = 'react-pdf', producer = 'react-pdf' } = first.props;
  // As react-pdf's own toBuffer makes it, for the props our documents use.
  const info = Object.fromEntries(Object.entries({ Title: title, Creator: creator, Producer: producer, CreationDate: new Date() }).filter(([, v]) => v !== undefined));
  const Ctor = PDFDocument as unknown as new (options: object) => unknown;
  const ctx = new Ctor({ compress: true, displayTitle: true, autoFirstPage: false, info });
  const stream = renderPdfLayout(ctx as never, layout) as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  return new Promise((resolve, reject) => {
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('end', () => resolve(Buffer.concat(chunks)));
    stream.on('error', reject);
  });
}

/** Lays a document out, lets `adjust` replace pages (laying out others through the same root), then draws it once: one PDF, one turn. */
export function renderPdfRelaid(doc: ReactElement<DocumentProps>, adjust: Relayout): Promise<Buffer> {
  const next = queue.then(() => renderLaidOut(doc, adjust));
  queue = next.catch(() => undefined);
  return next;
}

/** Renders a react-pdf document to PDF bytes; calls made meanwhile wait their turn. */
export function renderPdf(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  const next = queue.then(() => render(doc));
  queue = next.catch(() => undefined);
  return next;
}
