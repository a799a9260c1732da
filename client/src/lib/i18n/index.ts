import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import { LOCALES, type Locale } from '@yardcall/shared';
import en from './en/core.json';
import type enDriver from './en/driver.json';
import type enFinish from './en/finish.json';
import type enScreens from './en/screens.json';

// Four parts per language in one namespace: the core words every page needs (the glove screen's
// own page loads only these), the driver's home and start, the finish and report, and every other
// screen's words; the app loads each with the routes that need it (load-words.ts). A section may
// be split across parts (walkaround, vehicles): the parts are merged deep and share no leaf.
declare module 'i18next' {
  interface CustomTypeOptions {
    defaultNS: 'translation';
    resources: { translation: typeof en & typeof enDriver & typeof enFinish & typeof enScreens };
  }
}

export const i18n = i18next.createInstance();

// English core words come with the page; every other part and language is loaded when needed
// (load-words.ts) from chunks the service worker precaches, so switching works with no signal.
void i18n.use(initReactI18next).init({
  // A copy: the other parts are merged into the store deep, which must not change the module's object.
  resources: { en: { translation: structuredClone(en) } },
  lng: 'en',
  fallbackLng: 'en',
  supportedLngs: [...LOCALES],
  interpolation: { escapeValue: false },
  initAsync: false,
  // Words loaded with a route re-render what is on screen.
  react: { bindI18nStore: 'added' },
});

export function isLocale(value: unknown): value is Locale {
  return (LOCALES as readonly unknown[]).includes(value);
}
