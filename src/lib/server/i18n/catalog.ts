// The one message catalog: every sentence the screens and the cut sheet show, by key, in each
// language, as ICU MessageFormat (intl-messageformat). Messages are compiled to their syntax trees
// at build time (scripts/vite-icu-catalog.mjs). Importing this module registers every language
// (server, sheet, tests); an island gets only its page's part of one language (messagesFor).
import en from '../../shared/i18n/messages/en.json';
import fr from '../../shared/i18n/messages/fr.json';
import { registerMessages, type Messages } from '../../shared/i18n/format';
import type { Language } from '../../shared/i18n/languages';

export {
  partsTranslator,
  registerMessages,
  translator,
  type MessageKey,
  type MessageValues,
  type Translate,
  type TranslateParts,
} from '../../shared/i18n/format';

const CATALOGS: Record<Language, Messages> = { en, fr };
for (const [language, messages] of Object.entries(CATALOGS)) registerMessages(language as Language, messages);

/** Every key of one language's catalog (for the catalog's own tests). */
export function catalogKeys(language: Language): string[] {
  return Object.keys(CATALOGS[language]);
}

/** The messages of one language whose keys start with one of `prefixes`, as JSON for an island's props. */
export function messagesFor(language: Language, prefixes: readonly string[]): string {
  const all = CATALOGS[language];
  return JSON.stringify(Object.fromEntries(Object.entries(all).filter(([k]) => prefixes.some((p) => k.startsWith(p)))));
}

/** The catalog's parts an island of the calculator renders (its page sends only these). */
export const CALCULATOR_MESSAGES = ['warning.', 'refusal', 'check.', 'crease.', 'calc.', 'line.', 'lines.', 'cloth.', 'nofit.', 'taper.', 'cut.'] as const;

/** The parts the bench's garment page renders (its fitting form shows the calculator's plan too). */
export const BENCH_MESSAGES = [
  ...CALCULATOR_MESSAGES,
  'field.',
  'fieldHint.',
  'fitting.',
  'waist.',
  'shrink.',
  'garment.',
  'print.',
  'summary.',
  'step.',
  'existing.',
  'due.',
  'move.',
  // Jeans kept on their factory hem: the plan's words and notes, and "… above/below" the pin mark.
  'original',
  'sheet.above',
  'sheet.below',
  // Garments fitted once (a skirt): the kind's names, its form and plan, and the engine's notes.
  'kind.',
  'kindFitting.',
  'kindHistory.',
  'skirt.',
  'skirtNote.',
  'levelNote.',
  // Jacket or coat sleeves: the form's words (sleeves.), the plan's (sleeve.) and the engine's notes (sleeveNote.).
  'sleeve',
] as const;

/** The parts the queue renders: its own words, the steps, due dates and the Mark buttons. */
export const QUEUE_MESSAGES = ['queue.', 'step.', 'due.', 'move.', 'kind.'] as const;
