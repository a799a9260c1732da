import { describe, expect, it, vi } from 'vitest';

// A fresh copy of the module: the test set-up has already loaded every language into the shared one.
async function freshLexicons(): Promise<typeof import('./compiled-lexicon.js')> {
  vi.resetModules();
  return import('./compiled-lexicon.js');
}

describe('answer words by language', () => {
  it('has English from the start and Spanish only once it is loaded', async () => {
    const lexicons = await freshLexicons();
    expect(lexicons.compiledLexicon('en').locale).toBe('en');
    expect(lexicons.answerWordsLoaded('es')).toBe(false);
    expect(() => lexicons.compiledLexicon('es')).toThrow("await loadAnswerWords('es') first");

    await Promise.all([lexicons.loadAnswerWords('es'), lexicons.loadAnswerWords('es')]);
    expect(lexicons.answerWordsLoaded('es')).toBe(true);
    expect(lexicons.compiledLexicon('es').lexicon.pass).toContain('bien');
  });
});
