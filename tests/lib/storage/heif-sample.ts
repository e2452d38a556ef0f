// A small, well-formed HEIF built by hand for the photo tests: the boxes a phone writes around a
// still (ftyp, meta with hdlr/iinf/iloc, mdat), an EXIF item that carries a GPS block and an XMP
// item. The "picture" is placeholder bytes: nothing here decodes HEVC, the server included.
import sharp from 'sharp';

const enc = (s: string) => Buffer.from(s, 'latin1');
const u16 = (n: number) => Buffer.from([n >> 8, n & 255]);
const u32 = (n: number) => {
  const b = Buffer.alloc(4);
  b.writeUInt32BE(n);
  return b;
};
const box = (type: string, ...parts: Buffer[]) => {
  const body = Buffer.concat(parts);
  return Buffer.concat([u32(body.length + 8), enc(type), body]);
};
const fullBox = (type: string, version: number, ...parts: Buffer[]) => box(type, Buffer.from([version, 0, 0, 0]), ...parts);
const infe = (id: number, type: string, contentType?: string) =>
  fullBox('infe', 2, u16(id), u16(0), enc(type), Buffer.from([0]), ...(contentType ? [enc(contentType), Buffer.from([0])] : []));

/** The words the sample's XMP carries, to look for after stripping. */
export const SAMPLE_XMP_MARK = 'exif:GPSLatitude="51,30.0N"';
/** The camera maker the sample's EXIF names, to look for after stripping. */
export const SAMPLE_EXIF_MAKE = 'Invented Camera Co';
/** The placeholder picture bytes, which must come through untouched. */
export const SAMPLE_PICTURE = Buffer.from('HEVC-PICTURE-DATA-'.repeat(8), 'latin1');

/** An EXIF block (as sharp's metadata() gives it: "Exif\0\0" then TIFF) with a GPS IFD. */
export async function gpsExif(): Promise<Buffer> {
  const jpeg = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#777' } })
    .jpeg()
    .withExif({
      IFD0: { Make: SAMPLE_EXIF_MAKE },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer();
  return (await sharp(jpeg).metadata()).exif!;
}

/** A HEIC still with EXIF (GPS) and XMP items, their bytes in mdat where iloc says, its picture
 * declared `size` pixels (ispe; 4032 × 3024 as a 12 MP phone camera writes). */
export async function sampleHeif(size = { width: 4032, height: 3024 }): Promise<Buffer> {
  const exif = Buffer.concat([u32(6), await gpsExif()]);
  const xmp = enc(
    `<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"><rdf:Description xmlns:exif="http://ns.adobe.com/exif/1.0/" ${SAMPLE_XMP_MARK}/></rdf:RDF></x:xmpmeta>`,
  );
  const ftyp = box('ftyp', enc('heic'), u32(0), enc('mif1heic'));
  const items = [SAMPLE_PICTURE, exif, xmp];
  const build = (mdatAt: number) => {
    let at = mdatAt + 8;
    const locs = items.map((data, i) => {
      // iloc v0, offset and length 4 bytes, no base offset: id, data_reference_index, extent_count, offset, length.
      const entry = Buffer.concat([u16(i + 1), u16(0), u16(1), u32(at), u32(data.length)]);
      at += data.length;
      return entry;
    });
    const meta = fullBox(
      'meta',
      0,
      fullBox('hdlr', 0, u32(0), enc('pict'), Buffer.alloc(12), Buffer.from([0])),
      fullBox('pitm', 0, u16(1)),
      fullBox('iinf', 0, u16(3), infe(1, 'hvc1'), infe(2, 'Exif'), infe(3, 'mime', 'application/rdf+xml')),
      fullBox('iloc', 0, Buffer.from([0x44, 0x00]), u16(items.length), ...locs),
      // The picture's properties: its size (ispe), tied to item 1 by ipma (one property, essential).
      box(
        'iprp',
        box('ipco', fullBox('ispe', 0, u32(size.width), u32(size.height))),
        fullBox('ipma', 0, u32(1), u16(1), Buffer.from([1]), Buffer.from([0x81])),
      ),
    );
    return meta;
  };
  // The offsets depend on meta's size, which does not depend on them: build once to measure.
  const meta = build(ftyp.length + build(0).length);
  return Buffer.concat([ftyp, meta, box('mdat', ...items)]);
}
