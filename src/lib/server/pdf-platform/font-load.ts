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
