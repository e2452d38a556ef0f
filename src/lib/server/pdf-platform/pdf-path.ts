// pdfkit reads an SVG path by building a string a character at a time for every number, an array
// for each number read and one for each command, then writes each command with its own call. A
// sheet's QR code was one such path of some three hundred rectangles, about 1,500 of its 4,000
// content lines and a twelfth of what it allocated; it is drawn as rectangles now (CutSheet.tsx),
// and this serves the chalk guide's rulers and the leg drawings' lines. A path made only of
// straight lines (M, L, H, V, Z, absolute or relative) is read here in one pass with pdfkit's
// exact grammar (its number reading, commas, where a malformed path stops) and the same
// arithmetic, and its lines are written in one go: the content stream gets the same bytes. Any
// other path (curves, arcs, a number pdfkit would refuse) goes to pdfkit's own reader.
import PDFDocument from 'pdfkit';
import { override } from './override';

interface PathDoc {
  addContent: (data: string) => unknown;
  path: (d: string) => unknown;
}

// pdfkit's PDFObject.number, which pdfkit does not export; null where pdfkit would throw.
function number(n: number): number | null {
  return n > -1e21 && n < 1e21 ? Math.round(n * 1e6) / 1e6 : null;
}

// Arguments per command letter, as pdfkit's parser counts them.
const PARAMETERS: Record<string, number> = {
  A: 7,
  a: 7,
  C: 6,
  c: 6,
  H: 1,
  h: 1,
  L: 2,
  l: 2,
  M: 2,
  m: 2,
  Q: 4,
  q: 4,
  S: 4,
  s: 4,
  T: 2,
  t: 2,
  V: 1,
  v: 1,
  Z: 0,
  z: 0,
};
const CURVES = /[AaCcQqSsTt]/;
const isWsp = (code: number) => code === 0x20 || code === 0x9 || code === 0xd || code === 0xa;
const isDigit = (code: number) => code >= 48 && code <= 57;

/** pdfkit's readNumber: the index of the number's last character and its value, or null where it reads none. */
function readNumber(s: string, cursor: number): [end: number, value: number] | null {
  let i = cursor;
  // 0 none, 1 sign, 2 whole, 3 decimal point, 4 decimal, 5 e, 6 exponent sign, 7 exponent
  let state = 0;
  for (; i < s.length; i += 1) {
    const c = s.charCodeAt(i);
    if (c === 43 || c === 45) {
      if (state === 0) {
        state = 1;
        continue;
      }
      if (state === 5) {
        state = 6;
        continue;
      }
    }
    if (isDigit(c)) {
      if (state <= 2) {
        state = 2;
        continue;
      }
      if (state === 3 || state === 4) {
        state = 4;
        continue;
      }
      if (state >= 5) {
        state = 7;
        continue;
      }
    }
    if (c === 46 && state <= 2) {
      state = 3;
      continue;
    }
    if ((c === 69 || c === 101) && state >= 2 && state <= 4) {
      state = 5;
      continue;
    }
    break;
  }
  const value = Number.parseFloat(s.slice(cursor, i));
  return Number.isNaN(value) ? null : [i - 1, value];
}

/** The content lines pdfkit writes for a path of straight lines, or null for a path pdfkit must read itself. */
export function straightPathLines(path: string): string[] | null {
  if (CURVES.test(path)) return null;
  const lines: string[] = [];
  let cx = 0;
  let cy = 0;
  let sx = 0;
  let sy = 0;
  let ok = true;
  const point = (op: string) => {
    const x = number(cx);
    const y = number(cy);
    if (x === null || y === null) ok = false;
    else lines.push(`${x} ${y} ${op}`);
  };
  // What pdfkit's runner does for one complete command.
  const run = (command: string, a0: number, a1: number) => {
    switch (command) {
      case 'M':
      case 'm':
        if (command === 'M') {
          cx = a0;
          cy = a1;
        } else {
          cx += a0;
          cy += a1;
        }
        sx = cx;
        sy = cy;
        point('m');
        return;
      case 'L':
        cx = a0;
        cy = a1;
        break;
      case 'l':
        cx += a0;
        cy += a1;
        break;
      case 'H':
        cx = a0;
        break;
      case 'h':
        cx += a0;
        break;
      case 'V':
        cy = a0;
        break;
      case 'v':
        cy += a0;
        break;
      default:
        // Z, z
        lines.push('h');
        cx = sx;
        cy = sy;
        return;
    }
    point('l');
  };
  // pdfkit's parse, command by command as they complete.
  let command: string | null = null;
  let count = 0;
  let want = 0;
  let a0 = 0;
  let a1 = 0;
  let canHaveComma = false;
  let hadComma = false;
  for (let i = 0; i < path.length && ok; i += 1) {
    const code = path.charCodeAt(i);
    if (isWsp(code)) continue;
    const c = path.charAt(i);
    if (canHaveComma && c === ',') {
      if (hadComma) break;
      hadComma = true;
      continue;
    }
    if (Object.hasOwn(PARAMETERS, c)) {
      if (hadComma) break;
      if (command === null) {
        if (c !== 'M' && c !== 'm') break;
      } else if (count !== 0) break;
      command = c;
      count = 0;
      want = PARAMETERS[c]!;
      canHaveComma = false;
      if (want === 0) run(command, 0, 0);
      continue;
    }
    if (command === null) break;
    const read = readNumber(path, i);
    if (read === null) break;
    if (count === 0) a0 = read[1];
    else a1 = read[1];
    count += 1;
    canHaveComma = true;
    hadComma = false;
    i = read[0];
    if (count === want) {
      run(command, a0, a1);
      if (command === 'M') command = 'L';
      if (command === 'm') command = 'l';
      count = 0;
    }
  }
  return ok ? lines : null;
}

/** Makes pdfkit draw paths of straight lines without its parser's arrays, writing the same lines; returns how to undo it. */
export function straightPathsFast(): () => void {
  const proto = PDFDocument.prototype as unknown as PathDoc;
  const own = proto.path;
  return override(proto, 'path', function (this: PathDoc, d: string) {
    const lines = typeof d === 'string' ? straightPathLines(d) : null;
    if (lines === null) return own.call(this, d);
    // One write of the lines joined: the stream holds each line and its newline, as before.
    if (lines.length > 0) this.addContent(lines.join('\n'));
    return this;
  });
}
