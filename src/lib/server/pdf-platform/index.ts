// The PDF speed layer: every run-time patch of pdfkit's, fontkit's and react-pdf's internals, in
// one place, behind one install call. They change how fast a PDF is made, never what it shows
// (tests/lib/pdf-platform/same-output.test.ts), and they touch every PDF in the process, so each
// is installed only over the exact package version it was written for: another version (an
// upgrade) skips it with one log line and PDFs come out at the packages' own speed.
// PDF_SPEED_PATCHES=off installs none. Read from process.env, not astro:env: this runs in the
// sheet worker thread and in benchmarks too (the schema in astro.config.mjs still checks it).
import { keepCmaps } from './cmap-memo';
import { keepColors } from './pdf-colors';
import { straightPathsFast } from './pdf-path';
import { fastDimensions } from './fast-dimensions';
import { fastRuns } from './fast-runs';
import { leanAssets } from './lean-assets';
import { leanYoga } from './lean-yoga';
import { ltrBidiFast } from './ltr-bidi';
import { loadLoadedAtOnce, rememberResolvedFonts } from './font-load';
import { memoiseFace, type MemoFace } from './face-memo';
import { undoAll } from './override';
import { cacheFontObjects } from './pdf-font-cache';
import { compressStreamsFast } from './pdf-streams';
import { transformFast } from './pdf-transform';
import { memoiseShaping, type Shaper } from './shaping-memo';
import { keepSubsets, type Seed } from './subset-memo';
import { splitFromFirstLayout } from './split-laid-out';
import { keepStyles } from './style-memo';
import { keepTextLayouts } from './text-layout-memo';
import { installedVersion } from './versions';

export type { Seed } from './subset-memo';

/** A loaded fontkit face, as the patches see it. */
export type PlatformFace = MemoFace & Shaper & { createSubset: () => unknown };

/** How a face is adopted: `seed` makes its embedded fonts start with those glyphs (see subset-memo.ts). */
export interface FaceOptions {
  seed?: Seed;
}

/** Another package a patch relies on, at the version it was written for (as loaded by `via`). */
export interface AlsoWrittenFor {
  pkg: string;
  via: string;
  version: string;
}

/** One patch: the package it changes (as loaded by `via`), the version it was written for, and how to apply it. */
export interface PdfPatch {
  name: string;
  pkg: string;
  via: string;
  writtenFor: string;
  /** Other packages whose internals it relies on: any other version turns it off too. */
  also?: readonly AlsoWrittenFor[];
  /** Changes the package's shared objects (prototypes, hooks); returns how to undo it. */
  install?: () => () => void;
  /** Changes one loaded face; returns how to undo it. */
  face?: (face: PlatformFace, options: FaceOptions) => () => void;
}

/** The patches, in install order. A version bump means reading the package's changes, then the patch, then the tests. */
export const PDF_PATCHES: readonly PdfPatch[] = [
  { name: 'text-layout-memo', pkg: '@react-pdf/layout', via: '@react-pdf/renderer', writtenFor: '5.2.0', install: keepTextLayouts },
  { name: 'fast-dimensions', pkg: '@react-pdf/layout', via: '@react-pdf/renderer', writtenFor: '5.2.0', install: fastDimensions },
  { name: 'style-memo', pkg: '@react-pdf/layout', via: '@react-pdf/renderer', writtenFor: '5.2.0', install: keepStyles },
  {
    name: 'lean-yoga',
    pkg: '@react-pdf/layout',
    via: '@react-pdf/renderer',
    writtenFor: '5.2.0',
    also: [{ pkg: 'yoga-layout', via: '@react-pdf/layout', version: '3.2.1' }],
    install: leanYoga,
  },
  {
    name: 'ltr-bidi',
    pkg: '@react-pdf/layout',
    via: '@react-pdf/renderer',
    writtenFor: '5.2.0',
    also: [
      { pkg: '@react-pdf/textkit', via: '@react-pdf/layout', version: '7.0.1' },
      { pkg: 'bidi-js', via: '@react-pdf/textkit', version: '1.1.0' },
    ],
    install: ltrBidiFast,
  },
  { name: 'lean-assets', pkg: '@react-pdf/layout', via: '@react-pdf/renderer', writtenFor: '5.2.0', install: leanAssets },
  { name: 'split-laid-out', pkg: '@react-pdf/layout', via: '@react-pdf/renderer', writtenFor: '5.2.0', install: splitFromFirstLayout },
  { name: 'fast-runs', pkg: '@react-pdf/render', via: '@react-pdf/renderer', writtenFor: '4.7.0', install: fastRuns },
  { name: 'font-load', pkg: '@react-pdf/font', via: '@react-pdf/renderer', writtenFor: '4.1.2', install: loadLoadedAtOnce },
  { name: 'font-resolve-memo', pkg: '@react-pdf/font', via: '@react-pdf/renderer', writtenFor: '4.1.2', install: rememberResolvedFonts },
  { name: 'pdf-streams', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: compressStreamsFast },
  { name: 'pdf-transform', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: transformFast },
  { name: 'pdf-path', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: straightPathsFast },
  { name: 'pdf-colors', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: keepColors },
  { name: 'pdf-font-cache', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: cacheFontObjects },
  { name: 'cmap-memo', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', face: (face) => keepCmaps(face) },
  { name: 'subset-memo', pkg: 'fontkit', via: '@react-pdf/font', writtenFor: '2.0.4', face: (face, o) => keepSubsets(face, o.seed) },
  { name: 'shaping-memo', pkg: 'fontkit', via: '@react-pdf/font', writtenFor: '2.0.4', face: (face) => memoiseShaping(face) },
  { name: 'face-memo', pkg: 'fontkit', via: '@react-pdf/font', writtenFor: '2.0.4', face: (face) => memoiseFace(face) },
];

/** What became of one patch at install. */
export interface PatchStatus {
  name: string;
  pkg: string;
  writtenFor: string;
  installed: string | null;
  on: boolean;
  /** Why it is off (the logged line), when it is. */
  reason?: string;
}

/** Settings of one install: where the switch and versions come from, where lines are logged (defaults: process.env, package.json, console.warn). */
export interface InstallOptions {
  setting?: string | undefined;
  versions?: (pkg: string, via: string) => string | null;
  log?: (line: string) => void;
  patches?: readonly PdfPatch[];
}

interface Active {
  patch: PdfPatch;
  undo: (() => void)[];
}

let active: Active[] | null = null;
let statuses: PatchStatus[] = [];
const faces: { face: PlatformFace; options: FaceOptions }[] = [];

/** Installs every patch that fits the installed packages, once per process (or thread); returns what each became. */
export function installPdfPlatform(options: InstallOptions = {}): PatchStatus[] {
  if (active) return statuses;
  const { setting = process.env.PDF_SPEED_PATCHES, versions = installedVersion, log = (line: string) => console.warn(line), patches = PDF_PATCHES } = options;
  active = [];
  const off = setting?.trim().toLowerCase() === 'off';
  if (off) log('pdf-platform: PDF_SPEED_PATCHES=off, no speed patches installed');
  else if (setting !== undefined && !['', 'on'].includes(setting.trim().toLowerCase()))
    log(`pdf-platform: PDF_SPEED_PATCHES=${setting} is neither on nor off; taken as on`);
  statuses = patches.map((patch) => {
    const installed = versions(patch.pkg, patch.via);
    const status: PatchStatus = { name: patch.name, pkg: patch.pkg, writtenFor: patch.writtenFor, installed, on: false };
    if (off) return { ...status, reason: 'PDF_SPEED_PATCHES=off' };
    const wrong = [{ pkg: patch.pkg, via: patch.via, version: patch.writtenFor }, ...(patch.also ?? [])]
      .map((need) => ({ ...need, found: need.pkg === patch.pkg && need.via === patch.via ? installed : versions(need.pkg, need.via) }))
      .find((need) => need.found !== need.version);
    if (wrong) {
      const reason = `pdf-platform: ${patch.name} skipped: written for ${wrong.pkg} ${wrong.version}, installed ${wrong.found ?? 'not found'}`;
      log(reason);
      return { ...status, reason };
    }
    const undo: (() => void)[] = [];
    try {
      if (patch.install) undo.push(patch.install());
      for (const f of faces) if (patch.face) undo.push(patch.face(f.face, f.options));
    } catch (e) {
      undoAll(undo);
      const reason = `pdf-platform: ${patch.name} skipped: ${(e as Error).message}`;
      log(reason);
      return { ...status, reason };
    }
    active!.push({ patch, undo });
    return { ...status, on: true };
  });
  return statuses;
}

/** Takes every installed patch back out, last first (tests: the same documents without them); installPdfPlatform may run again. */
export function uninstallPdfPlatform(): void {
  if (!active) return;
  for (const a of active.reverse()) undoAll(a.undo);
  active = null;
  statuses = [];
}

/** Hands a loaded face to the installed patches (and to any installed later). */
export function adoptFace(face: PlatformFace, options: FaceOptions = {}): void {
  faces.push({ face, options });
  for (const a of active ?? []) if (a.patch.face) a.undo.push(a.patch.face(face, options));
}

/** What each patch became at the last install (empty before one). */
export const pdfPatchStatus = (): PatchStatus[] => statuses;
