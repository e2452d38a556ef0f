// How pdfkit writes the streams of a PDF. A page's content stream is some four thousand short
// drawing commands, each turned into its own byte array as it is written and joined at the end;
// they are kept as text instead and turned into bytes once (latin1: the same low byte of each
// character pdfkit keeps). At zlib's default level the content stream (about 50 kB) takes a
// millisecond or two to compress, a tenth of a sheet; the fastest level takes a fifth of that for
// a stream about 2 kB larger. A stream whose bytes were compressed before (a kept font subset) is
// given that compressed form instead.
import { deflateSync } from 'node:zlib';
import PDFDocument from 'pdfkit';
import { override } from './override';

interface Reference {
  buffer: Uint8Array[];
  compress: boolean;
  data: Record<string, unknown>;
  uncompressedLength: number;
  finalize: () => void;
  write: (chunk: string | Uint8Array) => void;
  /** Commands written as text since the last byte array, each ending in a newline. */
  pending?: string[];
}

/** zlib level for the streams written afresh for every sheet. */
const STREAM_LEVEL = 1;

const known = new WeakMap<Uint8Array, Uint8Array>();
let textKept = true;

/** Remembers the compressed form of an exact byte array (by identity) for any stream that is just that array. */
export function useDeflated(bytes: Uint8Array, packed: Uint8Array): void {
  known.set(bytes, packed);
}

/** Keeps written commands as text until the stream is finished (the default), or turns each into bytes as pdfkit does. */
export function keepStreamText(on: boolean): void {
  textKept = on;
}

function flushText(ref: Reference): void {
  if (!ref.pending?.length) return;
  ref.buffer.push(Buffer.from(ref.pending.join(''), 'latin1'));
  ref.pending = [];
}

/** Makes pdfkit's references write text in one go, compress fast, or reuse a known form; returns how to undo it. */
export function compressStreamsFast(): () => void {
  // pdfkit exports no reference class: a document's root is one of its references.
  const Ctor = PDFDocument as unknown as new (options: object) => { _root: object };
  const proto = Object.getPrototypeOf(new Ctor({ autoFirstPage: false })._root) as Reference;
  const write = proto.write;
  const undoWrite = override(proto, 'write', function (this: Reference, chunk: string | Uint8Array) {
    if (!textKept || typeof chunk !== 'string') {
      flushText(this);
      return write.call(this, chunk);
    }
    // What pdfkit's write records, without making the bytes yet.
    const line = `${chunk}\n`;
    this.uncompressedLength += line.length;
    this.data.Length = ((this.data.Length as number | undefined) ?? 0) + line.length;
    if (this.compress) this.data.Filter = 'FlateDecode';
    (this.pending ??= []).push(line);
  });
  const finalize = proto.finalize;
  const undoFinalize = override(proto, 'finalize', function (this: Reference) {
    flushText(this);
    if (this.compress && this.buffer.length > 0) {
      const only = this.buffer.length === 1 ? this.buffer[0]! : undefined;
      const packed = (only && known.get(only)) ?? deflateSync(only ?? Buffer.concat(this.buffer), { level: STREAM_LEVEL });
      // Marked as compressed already, so pdfkit writes the bytes as they are.
      this.buffer = [packed];
      this.compress = false;
      this.data.Filter = 'FlateDecode';
    }
    finalize.call(this);
  });
  return () => {
    undoFinalize();
    undoWrite();
  };
}
