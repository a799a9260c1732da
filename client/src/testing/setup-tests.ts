import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach } from 'vitest';
import { LOCALES, loadAnswerWords } from '@yardcall/shared';
import { i18n } from '@/lib/i18n';
import { addScreenWords } from '@/lib/i18n/add-screen-words';

addScreenWords();
// The app loads a language's answer words when a walk-around needs them; tests start with all.
await Promise.all(LOCALES.map(loadAnswerWords));

beforeEach(async () => {
  localStorage.clear();
  document.documentElement.className = '';
  document.documentElement.removeAttribute('style');
  await i18n.changeLanguage('en');
});

afterEach(() => {
  cleanup();
});
