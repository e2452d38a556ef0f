// One react-pdf root for the whole process, documents rendered through it one at a time.
// react-pdf's renderToBuffer makes a new React root for every document and never lets go of it
// (React keeps each in its list of scheduled roots, with the whole document tree): a server that
// printed a few thousand sheets would run out of memory, and the growing heap slowed every render.
// A shared root has one trap: a component that throws while drawing does not make the update
// throw (React reports it and keeps the last tree), so toBuffer would print the PREVIOUS document.
// Each document is therefore stamped, and refused unless the root holds that very stamp. Server only.
import { pdf } from '@react-pdf/renderer';
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

/** Renders a react-pdf document to PDF bytes; calls made meanwhile wait their turn. */
export function renderPdf(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  const next = queue.then(() => render(doc));
  queue = next.catch(() => undefined);
  return next;
}
