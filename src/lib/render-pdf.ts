// One react-pdf root for the whole process, documents rendered through it one at a time.
// react-pdf's renderToBuffer makes a new React root for every document and never lets go of it
// (React keeps each in its list of scheduled roots, with the whole document tree): a server that
// printed a few thousand sheets would run out of memory, and the growing heap slowed every render.
// Server only.
import { pdf } from '@react-pdf/renderer';
import type { DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';

type Instance = ReturnType<typeof pdf>;

let instance: Instance | null = null;
let queue: Promise<unknown> = Promise.resolve();

async function render(doc: ReactElement<DocumentProps>): Promise<Buffer> {
  instance ??= pdf();
  // The update commits at once, and toBuffer takes the committed document before it awaits.
  instance.updateContainer(doc);
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
