// react-pdf asks its font store to load the font of every node that names a family, twice per
// layout (before and after pagination): some three hundred calls a sheet, each an async function
// that resolves the family again and awaits a load finished long ago. A font whose data is
// already there is answered at once with one settled promise; anything else (a font not loaded
// yet, a family not registered) goes to the store's own load, so errors and first loads are as before.
import { Font } from '@react-pdf/renderer';
import { override } from './override';

interface FontStoreLike {
  load: (descriptor: never) => Promise<void>;
  getFont: (descriptor: never) => { data?: unknown } | null | undefined;
}

const DONE: Promise<void> = Promise.resolve();

/** Makes the font store answer loads of fonts already loaded at once; returns how to undo it. */
export function loadLoadedAtOnce(store: object = Font): () => void {
  const fonts = store as FontStoreLike;
  const load = fonts.load;
  return override(fonts, 'load', (descriptor: never) => {
    let font: { data?: unknown } | null | undefined;
    try {
      font = fonts.getFont(descriptor);
    } catch {
      return load(descriptor);
    }
    return font?.data ? DONE : load(descriptor);
  });
}

interface FamilyLike {
  sources: unknown[];
}

/**
 * Makes the font store answer which face a family, weight and style resolve to from what it
 * answered before (react-pdf asks some seven hundred times a sheet, each a filter over the
 * family's faces), while the family is the same object with the same number of faces; returns
 * how to undo it. A family not registered goes to the store, which throws as before.
 */
export function rememberResolvedFonts(store: object = Font): () => void {
  const fonts = store as FontStoreLike & { fontFamilies: Record<string, FamilyLike | undefined> };
  const getFont = fonts.getFont;
  const kept = new Map<string, { family: FamilyLike; faces: number; byWeight: Map<unknown, Map<unknown, unknown>> }>();
  return override(fonts, 'getFont', (descriptor: { fontFamily: string; fontWeight?: unknown; fontStyle?: unknown }) => {
    const family = fonts.fontFamilies[descriptor.fontFamily];
    if (!family) return getFont.call(fonts, descriptor as never);
    let entry = kept.get(descriptor.fontFamily);
    if (!entry || entry.family !== family || entry.faces !== family.sources.length) {
      entry = { family, faces: family.sources.length, byWeight: new Map() };
      kept.set(descriptor.fontFamily, entry);
    }
    let byStyle = entry.byWeight.get(descriptor.fontWeight);
    if (!byStyle) entry.byWeight.set(descriptor.fontWeight, (byStyle = new Map()));
    if (byStyle.has(descriptor.fontStyle)) return byStyle.get(descriptor.fontStyle);
    const font = getFont.call(fonts, descriptor as never);
    byStyle.set(descriptor.fontStyle, font);
    return font;
  });
}
