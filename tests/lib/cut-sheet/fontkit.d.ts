// fontkit ships no types; the tests only open a font file with it, typing what they read.
declare module 'fontkit' {
  export function create(buffer: Buffer): unknown;
}
