import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import { LOCALES, type Locale } from '@yardcall/shared';
import en from './en.json';
import es from './es.json';

export const resources = { en: { translation: en }, es: { translation: es } } as const;

declare module 'i18next' {
  interface CustomTypeOptions {
    defaultNS: 'translation';
    resources: (typeof resources)['en'];
  }
}

export const i18n = i18next.createInstance();

// Both languages are bundled (a few KB): switching must work with no signal.
void i18n.use(initReactI18next).init({
  resources,
  lng: 'en',
  fallbackLng: 'en',
  supportedLngs: [...LOCALES],
  interpolation: { escapeValue: false },
  initAsync: false,
});

export function isLocale(value: unknown): value is Locale {
  return (LOCALES as readonly unknown[]).includes(value);
}
