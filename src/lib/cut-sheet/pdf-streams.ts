// How pdfkit compresses the streams of a PDF as each one is finished. At zlib's default level the
// page's content stream (about 50 kB of drawing commands) takes a millisecond or two, a tenth of a
// sheet; the fastest level takes a fifth of that for a stream about 2 kB larger. A stream whose
// bytes were compressed before (a kept font subset) is given that compressed form instead.
import { deflateSync } from 'node:zlib';

interface Reference {
  buffer: Uint8Array[];
  compress: boolean;
  data: Record<string, unknown>;
  finalize: () => void;
}

/** zlib level for the streams written afresh for every sheet. */
export const STREAM_LEVEL = 1;

const known = new WeakMap<Uint8Array, Uint8Array>();
let patched = false;

/** Remembers the compressed form of an exact byte array (by identity) for any stream that is just that array. */
export function useDeflated(bytes: Uint8Array, packed: Uint8Array): void {
  known.set(bytes, packed);
}

/** Makes pdfkit's references (found through any one of them) compress fast, or reuse a known form. */
export function compressStreamsFast(anyReference: object): void {
  if (patched) return;
  patched = true;
  const proto = Object.getPrototypeOf(anyReference) as Reference;
  const finalize = proto.finalize;
  proto.finalize = function (this: Reference) {
    if (this.compress && this.buffer.length > 0) {
      const only = this.buffer.length === 1 ? this.buffer[0]! : undefined;
      const packed = (only && known.get(only)) ?? deflateSync(only ?? Buffer.concat(this.buffer), { level: STREAM_LEVEL });
      // Marked as compressed already, so pdfkit writes the bytes as they are.
      this.buffer = [packed];
      this.compress = false;
      this.data.Filter = 'FlateDecode';
    }
    finalize.call(this);
  };
}
