// Location and other camera metadata out of a HEIC/HEIF still, without decoding the picture (this
// server's sharp cannot). In HEIF, EXIF and XMP are items of the file's `meta` box: `iinf` names
// them (type `Exif`, or `mime` with the XMP content type) and `iloc` says where their bytes lie.
// Those bytes are overwritten with zeros in place, so every offset in the file stays true and the
// picture items are untouched (ISO/IEC 23008-12 and ISO/IEC 14496-12 box layouts, from memory).

const XMP_TYPE = 'application/rdf+xml';

interface Box {
  type: string;
  /** where the box's content starts (after size and type) */
  start: number;
  end: number;
}

class Malformed extends Error {}

function readBoxes(b: Uint8Array, from: number, to: number): Box[] {
  const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
  const boxes: Box[] = [];
  let at = from;
  while (at < to) {
    if (to - at < 8) throw new Malformed('box header cut short');
    let size = view.getUint32(at);
    const type = String.fromCharCode(...b.subarray(at + 4, at + 8));
    let start = at + 8;
    if (size === 1) {
      if (to - at < 16) throw new Malformed('large box header cut short');
      size = Number(view.getBigUint64(at + 8));
      start = at + 16;
    } else if (size === 0) {
      size = to - at;
    }
    const end = at + size;
    if (size < start - at || end > to) throw new Malformed(`box ${type} runs past its parent`);
    boxes.push({ type, start, end });
    at = end;
  }
  return boxes;
}

/** A cursor over a box's content. */
class Reader {
  private readonly view: DataView;
  constructor(
    private readonly b: Uint8Array,
    public at: number,
    private readonly end: number,
  ) {
    this.view = new DataView(b.buffer, b.byteOffset, b.byteLength);
  }
  private need(n: number) {
    if (this.at + n > this.end) throw new Malformed('field runs past its box');
  }
  uint(bytes: number): number {
    this.need(bytes);
    let v: number;
    if (bytes === 0) v = 0;
    else if (bytes === 1) v = this.view.getUint8(this.at);
    else if (bytes === 2) v = this.view.getUint16(this.at);
    else if (bytes === 4) v = this.view.getUint32(this.at);
    else if (bytes === 8) v = Number(this.view.getBigUint64(this.at));
    else throw new Malformed(`field of ${bytes} bytes`);
    this.at += bytes;
    return v;
  }
  skip(bytes: number): void {
    this.need(bytes);
    this.at += bytes;
  }
  fourcc(): string {
    this.need(4);
    const s = String.fromCharCode(...this.b.subarray(this.at, this.at + 4));
    this.at += 4;
    return s;
  }
  cstring(): string {
    let stop = this.at;
    while (stop < this.end && this.b[stop] !== 0) stop++;
    const s = new TextDecoder().decode(this.b.subarray(this.at, stop));
    this.at = Math.min(stop + 1, this.end);
    return s;
  }
}

/** The ids of the items that hold EXIF or XMP, read from `iinf`. */
function metadataItems(b: Uint8Array, iinf: Box): Set<number> {
  const r = new Reader(b, iinf.start, iinf.end);
  const version = r.uint(1);
  r.skip(3);
  r.uint(version === 0 ? 2 : 4);
  const ids = new Set<number>();
  for (const infe of readBoxes(b, r.at, iinf.end)) {
    if (infe.type !== 'infe') continue;
    const e = new Reader(b, infe.start, infe.end);
    const v = e.uint(1);
    e.skip(3);
    if (v >= 2) {
      const id = e.uint(v === 2 ? 2 : 4);
      e.uint(2);
      const type = e.fourcc();
      e.cstring();
      if (type === 'Exif' || (type === 'mime' && e.cstring() === XMP_TYPE)) ids.add(id);
    } else {
      const id = e.uint(2);
      e.uint(2);
      e.cstring();
      if (e.cstring() === XMP_TYPE) ids.add(id);
    }
  }
  return ids;
}

/** One item's place as `iloc` gives it: how it is built (0 file, 1 idat, 2 other items) and its extents. */
interface ItemPlace {
  id: number;
  method: number;
  base: number;
  extents: { offset: number; length: number }[];
}

/** Every item's place, read from `iloc`. */
function itemPlaces(b: Uint8Array, iloc: Box): ItemPlace[] {
  const r = new Reader(b, iloc.start, iloc.end);
  const version = r.uint(1);
  r.skip(3);
  const sizes = r.uint(1);
  const more = r.uint(1);
  const [offsetSize, lengthSize, baseSize] = [sizes >> 4, sizes & 15, more >> 4];
  const indexSize = version === 1 || version === 2 ? more & 15 : 0;
  const count = r.uint(version < 2 ? 2 : 4);
  const places: ItemPlace[] = [];
  for (let i = 0; i < count; i++) {
    const id = r.uint(version < 2 ? 2 : 4);
    const method = version === 1 || version === 2 ? r.uint(2) & 15 : 0;
    r.uint(2);
    const base = r.uint(baseSize);
    const extents = [];
    for (let x = r.uint(2); x > 0; x--) {
      r.uint(indexSize);
      extents.push({ offset: r.uint(offsetSize), length: r.uint(lengthSize) });
    }
    places.push({ id, method, base, extents });
  }
  return places;
}

/** Zeroes the bytes of the given items where `iloc` puts them (in the file or in `idat`). */
function blankItems(out: Uint8Array, iloc: Box, idat: Box | undefined, ids: Set<number>): number {
  let blanked = 0;
  for (const { id, method, base, extents } of itemPlaces(out, iloc)) {
    if (!ids.has(id)) continue;
    for (const { offset, length } of extents) {
      // Length 0 ("the rest of the container") and items built from other items are not ours to guess at.
      if (length === 0 || method > 1 || (method === 1 && !idat)) throw new Malformed('metadata item laid out in a way not handled');
      const from = method === 1 ? idat!.start + base + offset : base + offset;
      const limit = method === 1 ? idat!.end : out.byteLength;
      if (from + length > limit) throw new Malformed('metadata item runs past the file');
      out.fill(0, from, from + length);
      blanked++;
    }
  }
  return blanked;
}

// Item types that are a picture in a HEIC still: an HEVC image, or a grid/overlay/derived one.
const IMAGE_ITEMS = new Set(['hvc1', 'grid', 'iovl', 'iden']);

/** Every item's id and type, read from `iinf`. */
function itemTypes(b: Uint8Array, iinf: Box): Map<number, string> {
  const r = new Reader(b, iinf.start, iinf.end);
  const version = r.uint(1);
  r.skip(3);
  r.uint(version === 0 ? 2 : 4);
  const types = new Map<number, string>();
  for (const infe of readBoxes(b, r.at, iinf.end)) {
    if (infe.type !== 'infe') continue;
    const e = new Reader(b, infe.start, infe.end);
    const v = e.uint(1);
    e.skip(3);
    // Versions 0 and 1 name no item type: they predate images as items.
    if (v < 2) continue;
    const id = e.uint(v === 2 ? 2 : 4);
    e.uint(2);
    types.set(id, e.fourcc());
  }
  return types;
}

/** What reading a HEIC's boxes proved: it holds a picture, this wide and high (the largest `ispe`). */
export interface HeifImage {
  width: number;
  height: number;
}

/**
 * The picture a HEIC file declares, or null unless its boxes say it is one: `ftyp` first, a `meta`
 * whose handler is 'pict', a primary item (`pitm`) that `iinf` types as an image and `iloc` places
 * inside the file, and its size in an `ispe` property. A HEIC header before anything else is not.
 */
export function readHeifImage(bytes: Uint8Array): HeifImage | null {
  try {
    const top = readBoxes(bytes, 0, bytes.byteLength);
    if (top[0]?.type !== 'ftyp') return null;
    const meta = top.find((box) => box.type === 'meta');
    if (!meta) return null;
    const children = readBoxes(bytes, meta.start + 4, meta.end);
    const find = (type: string) => children.find((c) => c.type === type);
    const [hdlr, pitm, iinf, iloc, iprp] = ['hdlr', 'pitm', 'iinf', 'iloc', 'iprp'].map(find);
    if (!hdlr || !pitm || !iinf || !iloc || !iprp) return null;
    const h = new Reader(bytes, hdlr.start, hdlr.end);
    h.skip(8); // version, flags, pre_defined
    if (h.fourcc() !== 'pict') return null;
    const p = new Reader(bytes, pitm.start, pitm.end);
    const primary = p.uint(1) === 0 ? (p.skip(3), p.uint(2)) : (p.skip(3), p.uint(4));
    if (!IMAGE_ITEMS.has(itemTypes(bytes, iinf).get(primary) ?? '')) return null;
    const place = itemPlaces(bytes, iloc).find((pl) => pl.id === primary);
    if (!place || place.extents.length === 0) return null;
    const idat = find('idat');
    for (const { offset, length } of place.extents) {
      if (place.method > 1 || (place.method === 1 && !idat)) return null;
      const from = place.method === 1 ? idat!.start + place.base + offset : place.base + offset;
      const limit = place.method === 1 ? idat!.end : bytes.byteLength;
      if (length === 0 || from + length > limit) return null;
    }
    const ipco = readBoxes(bytes, iprp.start, iprp.end).find((c) => c.type === 'ipco');
    if (!ipco) return null;
    let best: HeifImage | null = null;
    for (const prop of readBoxes(bytes, ipco.start, ipco.end)) {
      if (prop.type !== 'ispe') continue;
      const r = new Reader(bytes, prop.start, prop.end);
      r.skip(4);
      const size = { width: r.uint(4), height: r.uint(4) };
      if (!best || size.width * size.height > best.width * best.height) best = size;
    }
    return best && best.width > 0 && best.height > 0 ? best : null;
  } catch (e) {
    if (e instanceof Malformed || e instanceof RangeError) return null;
    throw e;
  }
}

/** What stripping a HEIF found: the copy with EXIF and XMP zeroed, and how many extents it blanked. */
export interface HeifStripped {
  bytes: Uint8Array;
  blanked: number;
}

/** A copy of the HEIF with its EXIF and XMP items zeroed; null when its boxes cannot be read. */
export function stripHeifMetadata(bytes: Uint8Array): HeifStripped | null {
  try {
    const out = new Uint8Array(bytes);
    const meta = readBoxes(out, 0, out.byteLength).find((box) => box.type === 'meta');
    if (!meta) return { bytes: out, blanked: 0 };
    // meta is a full box: version and flags come before its children.
    const children = readBoxes(out, meta.start + 4, meta.end);
    const iinf = children.find((c) => c.type === 'iinf');
    const iloc = children.find((c) => c.type === 'iloc');
    if (!iinf || !iloc) return { bytes: out, blanked: 0 };
    const ids = metadataItems(out, iinf);
    if (ids.size === 0) return { bytes: out, blanked: 0 };
    return {
      bytes: out,
      blanked: blankItems(
        out,
        iloc,
        children.find((c) => c.type === 'idat'),
        ids,
      ),
    };
  } catch (e) {
    if (e instanceof Malformed || e instanceof RangeError) return null;
    throw e;
  }
}
