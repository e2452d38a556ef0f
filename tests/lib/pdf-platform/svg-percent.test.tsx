// Our patch of @react-pdf/layout reads an SVG prop's name before its value: only the props that
// take a percent of the drawing (x, y, width, height and their kin) are read as percents, as
// before, and any other (a path's `d`, the QR code's 1,500 characters) passes untouched.
import { Document, type DocumentProps, Page, Path, Rect, Svg } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { describe, expect, it } from 'vitest';
import { laidOutDocument } from './laid-out';

interface Laid {
  type?: string;
  props?: Record<string, unknown>;
  children?: Laid[];
}
const find = (node: Laid, type: string): Laid[] => [...(node.type === type ? [node] : []), ...(node.children ?? []).flatMap((c) => find(c, type))];

const laidOut = async (doc: ReactElement<DocumentProps>) => (await laidOutDocument(doc)) as unknown as Laid;

describe('SVG props in percent', () => {
  it('reads x, y, width and height in percent of the drawing, and leaves a path as written', async () => {
    const d = 'M0 0h1v1h-1z'.repeat(200);
    const layout = await laidOut(
      <Document>
        <Page size={{ width: 200, height: 100 }}>
          <Svg width={80} height={40} viewBox="0 0 80 40">
            <Rect x="50%" y="25%" width="25%" height="50%" fill="#000000" />
            <Path d={d} fill="#000000" />
          </Svg>
        </Page>
      </Document>,
    );
    // 50 % of 80 = 40, 25 % of 40 = 10, 25 % of 80 = 20, 50 % of 40 = 20 (arithmetic).
    const [rect] = find(layout, 'RECT');
    expect(rect!.props).toMatchObject({ x: 40, y: 10, width: 20, height: 20 });
    const [path] = find(layout, 'PATH');
    expect(path!.props!.d).toBe(d);
  });
});
