import type { Locale } from '@yardcall/shared';
import { i18n, isLocale } from './index';

// The words per part: the core (every page; English comes with the page itself), the shell's and
// the driver's home and start, the finish and report, and every other screen's. Each part of each
// language is its own chunk, loaded with the first route that needs it; the service worker
// precaches them all, so switching language works with no signal.
export type WordPart = 'core' | 'driver' | 'finish' | 'screens';

type Words = Record<string, unknown>;
const PARTS: Record<Locale, Record<WordPart, (() => Promise<{ default: Words }>) | null>> = {
  en: {
    core: null,
    driver: () => import('./en/driver.json'),
    finish: () => import('./en/finish.json'),
    screens: () => import('./en/screens.json'),
  },
  es: {
    core: () => import('./es/core.json'),
    driver: () => import('./es/driver.json'),
    finish: () => import('./es/finish.json'),
    screens: () => import('./es/screens.json'),
  },
};

const loading = new Map<string, Promise<void>>();
// The core is needed in whatever language the driver switches to.
const wanted = new Set<WordPart>(['core']);

function loadPart(locale: Locale, part: WordPart): Promise<void> {
  const key = `${locale}:${part}`;
  const load = PARTS[locale][part];
  if (!load) return Promise.resolve();
  let pending = loading.get(key);
  if (!pending) {
    pending = load().then(({ default: words }) => {
      // Deep: a section may be split across parts; they share no leaf, so nothing is overwritten.
      i18n.addResourceBundle(locale, 'translation', words, true, false);
    });
    // A failed load (a chunk missing mid-deploy) is tried again next time.
    pending.catch(() => loading.delete(key));
    loading.set(key, pending);
  }
  return pending;
}

const currentLocale = (): Locale => (isLocale(i18n.language) ? i18n.language : 'en');

// Resolves once the parts are there in the current language (and follows a change of language).
export async function loadWords(...parts: WordPart[]): Promise<void> {
  for (const part of parts) wanted.add(part);
  await Promise.all(parts.map((part) => loadPart(currentLocale(), part)));
}

i18n.on('languageChanged', (language) => {
  if (!isLocale(language)) return;
  for (const part of wanted) void loadPart(language, part).catch(() => undefined);
});
