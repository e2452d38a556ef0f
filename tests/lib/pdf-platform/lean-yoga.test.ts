// The lean yoga pass (our patch of @react-pdf/layout) leaves out the yoga calls that change
// nothing: it must build the same layout as the pass without it, every node's box equal and the
// same PDF objects for many generated sheets (overfull ones split from their layout among them)
// and a batch, with about half the calls into yoga; and it is turned off with a log line when
// react-pdf's layout or yoga-layout is another version, or the layout lacks it.
import * as reactPdfLayout from '@react-pdf/layout';
import type { SafeDocumentNode } from '@react-pdf/layout';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { Align, FlexDirection, Justify, loadYoga, Wrap } from 'yoga-layout/load';
import { cutSheetDocument } from '@/lib/server/cut-sheet/CutSheet';
import { typeset } from '@/lib/server/cut-sheet/fonts';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { leanYoga } from '@/lib/server/pdf-platform/lean-yoga';
import { installedVersion } from '@/lib/server/pdf-platform/versions';
import { generatedSheets } from './generated-sheets';
import { laidOutDocument } from './laid-out';
import { expectSamePrints, type Printed, printedObjects } from './printed-objects';

const SHEETS = generatedSheets(24, 4242);

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

interface Laid {
  type?: string;
  box?: object;
  children?: Laid[];
}
// Every node's type and box, depth first.
const boxes = (node: Laid, out: string[] = []): string[] => {
  out.push(`${node.type}:${JSON.stringify(node.box ?? null)}`);
  for (const c of node.children ?? []) boxes(c, out);
  return out;
};

// The laid-out document of one sheet, as the renderer lays it out before drawing.
async function laidOut(i: number): Promise<{ layout: SafeDocumentNode; boxes: string[] }> {
  const { family, print } = await typeset([[SHEETS[i]!], []]);
  const layout = await laidOutDocument(cutSheetDocument(print([SHEETS[i]!]), false, [], family));
  return { layout, boxes: boxes(layout as Laid) };
}

// Calls into yoga's nodes while `work` runs, counted on the node class react-pdf's yoga makes.
async function yogaCalls(work: () => Promise<unknown>): Promise<number> {
  const { layout } = await laidOut(0);
  const yoga = (layout as unknown as { yoga: { node: { create: () => object } } }).yoga;
  const probe = yoga.node.create() as { free: () => void };
  const proto = Object.getPrototypeOf(probe) as Record<string, unknown>;
  probe.free();
  const Node = proto.constructor as unknown as Record<string, unknown>;
  let calls = 0;
  const undo: (() => void)[] = [];
  const wrap = (target: Record<string, unknown>, key: string) => {
    const f = target[key] as (...a: unknown[]) => unknown;
    target[key] = function (this: unknown, ...a: unknown[]) {
      calls++;
      return f.apply(this, a);
    };
    undo.push(() => {
      target[key] = f;
    });
  };
  for (const k of Object.getOwnPropertyNames(proto)) if (k !== 'constructor' && typeof proto[k] === 'function') wrap(proto, k);
  for (const k of ['createWithConfig', 'destroy']) wrap(Node, k);
  try {
    await work();
  } finally {
    for (const u of undo.reverse()) u();
  }
  return calls;
}

describe('the lean yoga pass', () => {
  it('is installed with the other patches over the layout and yoga versions it was written for', () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'lean-yoga')).toMatchObject({ on: true, installed: '5.2.0' });
    expect(installedVersion('yoga-layout', '@react-pdf/layout')).toBe('3.2.1');
  });

  it('lays every node of every generated sheet out in the same box as the pass without it, with about half the yoga calls', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    const lean: string[][] = [];
    for (let i = 0; i < SHEETS.length; i++) lean.push((await laidOut(i)).boxes);
    const leanCalls = await yogaCalls(() => renderCutSheet(SHEETS[1]!));
    const undo = leanYoga();
    undo();
    const own: string[][] = [];
    let ownCalls: number;
    try {
      for (let i = 0; i < SHEETS.length; i++) own.push((await laidOut(i)).boxes);
      ownCalls = await yogaCalls(() => renderCutSheet(SHEETS[1]!));
    } finally {
      leanYoga();
    }
    for (let i = 0; i < SHEETS.length; i++) {
      expect(lean[i]!.length, `sheet ${i}`).toBeGreaterThan(50);
      expect(lean[i], `sheet ${i}`).toEqual(own[i]);
    }
    expect(leanCalls).toBeLessThan(ownCalls! * 0.6);
  }, 120_000);

  it("leaves align-content auto unset because yoga lays it out as flex-start, a new node's own value (random wrapped trees)", async () => {
    // react-pdf gives every node align-content auto where its style names none; the lean pass sets
    // neither that nor the default, so the two must lay out alike, multi-line wraps included.
    const yoga = await loadYoga();
    const config = yoga.Config.create();
    config.setPointScaleFactor(0);
    const probe = yoga.Node.create(config);
    expect(probe.getAlignContent()).toBe(Align.FlexStart);
    probe.free();
    const item = fc.record({
      w: fc.integer({ min: 1, max: 150 }),
      h: fc.integer({ min: 1, max: 150 }),
      grow: fc.constantFrom(0, 1),
      shrink: fc.constantFrom(0, 1),
      self: fc.constantFrom(Align.Auto, Align.FlexStart, Align.Center, Align.Stretch, Align.FlexEnd),
    });
    const tree = fc.record({
      direction: fc.constantFrom(FlexDirection.Row, FlexDirection.Column, FlexDirection.RowReverse),
      wrap: fc.constantFrom(Wrap.Wrap, Wrap.NoWrap, Wrap.WrapReverse),
      height: fc.option(fc.integer({ min: 10, max: 400 }), { nil: null }),
      width: fc.integer({ min: 10, max: 400 }),
      justify: fc.constantFrom(Justify.FlexStart, Justify.Center, Justify.SpaceBetween),
      items: fc.array(item, { minLength: 1, maxLength: 12 }),
      nested: fc.boolean(),
    });
    type Tree = typeof tree extends fc.Arbitrary<infer T> ? T : never;
    // Every box of the tree laid out, with align-content left as made or set to `align` on each node.
    const boxesOf = (t: Tree, align: Align | null): number[] => {
      const root = yoga.Node.create(config);
      root.setWidth(t.width);
      if (t.height !== null) root.setHeight(t.height);
      root.setFlexDirection(t.direction);
      root.setFlexWrap(t.wrap);
      root.setJustifyContent(t.justify);
      if (align !== null) root.setAlignContent(align);
      t.items.forEach((it, i) => {
        const child = yoga.Node.create(config);
        child.setWidth(it.w);
        child.setHeight(it.h);
        child.setFlexGrow(it.grow);
        child.setFlexShrink(it.shrink);
        child.setAlignSelf(it.self);
        if (align !== null) child.setAlignContent(align);
        if (t.nested) {
          const inner = yoga.Node.create(config);
          inner.setWidth(it.w / 2);
          inner.setHeight(it.h / 2);
          child.setFlexWrap(Wrap.Wrap);
          child.insertChild(inner, 0);
        }
        root.insertChild(child, i);
      });
      root.calculateLayout(undefined, undefined);
      const out: number[] = [];
      const read = (n: typeof root) => {
        const l = n.getComputedLayout();
        out.push(l.left, l.top, l.width, l.height);
        for (let i = 0; i < n.getChildCount(); i++) read(n.getChild(i));
      };
      read(root);
      root.freeRecursive();
      return out;
    };
    fc.assert(
      fc.property(tree, (t) => {
        expect(boxesOf(t, Align.Auto)).toEqual(boxesOf(t, null));
      }),
      { numRuns: 3000 },
    );
    // The check can tell: centred lines of a wrap land elsewhere.
    const two: Tree = {
      direction: FlexDirection.Row,
      wrap: Wrap.Wrap,
      height: 300,
      width: 100,
      justify: Justify.FlexStart,
      nested: false,
      items: [60, 60].map((w) => ({ w, h: 20, grow: 0, shrink: 0, self: Align.Auto })),
    };
    expect(boxesOf(two, Align.Center)).not.toEqual(boxesOf(two, null));
  });

  it('gives every generated sheet and a batch the same PDF objects as the pass without it', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    const lean = await printedObjects(SHEETS);
    const undo = leanYoga();
    undo();
    let own: Printed;
    try {
      own = await printedObjects(SHEETS);
    } finally {
      leanYoga();
    }
    // Overfull sheets (two pages and more) are among them.
    expectSamePrints(lean, own);
  }, 120_000);

  it('is turned off with one log line when yoga-layout is another version, the other patches kept', () => {
    uninstallPdfPlatform();
    const lines: string[] = [];
    const status = installPdfPlatform({
      setting: 'on',
      log: (l) => lines.push(l),
      versions: (pkg, via) => (pkg === 'yoga-layout' ? '3.3.0' : installedVersion(pkg, via)),
    });
    expect(lines).toEqual(['pdf-platform: lean-yoga skipped: written for yoga-layout 3.2.1, installed 3.3.0']);
    expect(status.filter((s) => !s.on).map((s) => s.name)).toEqual(['lean-yoga']);
    uninstallPdfPlatform();
    const other: string[] = [];
    installPdfPlatform({
      setting: 'on',
      log: (l) => other.push(l),
      versions: (pkg, via) => (pkg === 'yoga-layout' ? null : installedVersion(pkg, via)),
    });
    expect(other).toEqual(['pdf-platform: lean-yoga skipped: written for yoga-layout 3.2.1, installed not found']);
    uninstallPdfPlatform();
    installPdfPlatform();
  });

  it('is refused at install with a log line when the layout package lacks it', () => {
    const { setLeanYoga: _left, ...unpatched } = reactPdfLayout as Record<string, unknown>;
    expect(() => leanYoga(unpatched)).toThrow(/setLeanYoga.*not applied/);
    const patch = PDF_PATCHES.find((p) => p.name === 'lean-yoga')!;
    uninstallPdfPlatform();
    const lines: string[] = [];
    const status = installPdfPlatform({
      setting: 'on',
      log: (l) => lines.push(l),
      patches: [{ ...patch, install: () => leanYoga(unpatched) }],
    });
    expect(status).toMatchObject([{ name: 'lean-yoga', on: false }]);
    expect(lines).toEqual([expect.stringMatching(/^pdf-platform: lean-yoga skipped: .*setLeanYoga/)]);
  });
});
