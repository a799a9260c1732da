import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach } from 'vitest';
import { i18n } from '@/lib/i18n';
import { addScreenWords } from '@/lib/i18n/add-screen-words';

addScreenWords();

beforeEach(async () => {
  localStorage.clear();
  document.documentElement.className = '';
  document.documentElement.removeAttribute('style');
  await i18n.changeLanguage('en');
});

afterEach(() => {
  cleanup();
});
