import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import { LOCALES, type Locale } from '@yardcall/shared';
import en from './en/core.json';
import es from './es/core.json';
import type enScreens from './en/screens.json';

// Two parts per language in one namespace: the core words every page needs (the glove screen's
// own page loads only these) and the words of every other screen, which the app adds at start
// (add-screen-words.ts).
declare module 'i18next' {
  interface CustomTypeOptions {
    defaultNS: 'translation';
    resources: { translation: typeof en & typeof enScreens };
  }
}

export const i18n = i18next.createInstance();

// Both languages are bundled (a few KB): switching must work with no signal.
void i18n.use(initReactI18next).init({
  resources: { en: { translation: en }, es: { translation: es } },
  lng: 'en',
  fallbackLng: 'en',
  supportedLngs: [...LOCALES],
  interpolation: { escapeValue: false },
  initAsync: false,
});

export function isLocale(value: unknown): value is Locale {
  return (LOCALES as readonly unknown[]).includes(value);
}
