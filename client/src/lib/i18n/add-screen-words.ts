import type { Locale } from '@yardcall/shared';
import en from './en/screens.json';
import es from './es/screens.json';
import { i18n } from './index';

const SCREEN_WORDS: Record<Locale, typeof en> = { en, es };

// The words of every screen but the glove screen, both languages (switching must work with no
// signal), added to the core words before the app renders.
export function addScreenWords(): void {
  // Not deep: the two parts share no section, and a shallow merge leaves the core words untouched.
  for (const [locale, words] of Object.entries(SCREEN_WORDS)) {
    i18n.addResourceBundle(locale, 'translation', words, false, false);
  }
}
