import type { Locale } from '@yardcall/shared';
import enCore from './en/core.json';
import enDriver from './en/driver.json';
import enFinish from './en/finish.json';
import enScreens from './en/screens.json';
import esCore from './es/core.json';
import esDriver from './es/driver.json';
import esFinish from './es/finish.json';
import esScreens from './es/screens.json';
import { i18n } from './index';

type Words = Record<string, unknown>;
const ALL_WORDS: Record<Locale, Words[]> = {
  en: [enCore, enDriver, enFinish, enScreens],
  es: [esCore, esDriver, esFinish, esScreens],
};

// Every word in both languages at once, for tests; the app loads them with its routes
// (load-words.ts).
export function addScreenWords(): void {
  // Deep: a section may be split across parts; they share no leaf, so nothing is overwritten.
  for (const [locale, parts] of Object.entries(ALL_WORDS)) {
    for (const words of parts) i18n.addResourceBundle(locale, 'translation', words, true, false);
  }
}
