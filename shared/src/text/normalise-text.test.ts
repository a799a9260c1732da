import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { normaliseText } from './normalise-text.js';

describe('normaliseText', () => {
  it('folds case, accents and apostrophes', () => {
    const { tokens } = normaliseText("Cámara de FRENO, driver's side", 'es');
    expect(tokens.join(' ')).toBe('camara de freno drivers side');
  });

  it('reads plain lower-case words as it reads the same words in capitals', () => {
    const plain = fc.stringMatching(/^[a-z0-9 ]{0,40}$/);
    fc.assert(
      fc.property(plain, fc.constantFrom('en' as const, 'es' as const), (text, locale) => {
        expect(normaliseText(text, locale)).toEqual(normaliseText(text.toUpperCase(), locale));
      }),
    );
    expect(normaliseText('cuatro treintaidosavos', 'es').tokens).toEqual(['cuatro', 'treintaidos', 'avos']);
  });

  it('folds case, accents and punctuation and keeps accents for repeating back', () => {
    const n = normaliseText('¿Está BIEN?  Sí.', 'es');
    expect(n.tokens).toEqual(['esta', 'bien', 'si']);
    expect(n.surface).toEqual(['está', 'bien', 'sí']);
    expect(n.pauseAfter).toEqual([false, true, true]);
  });

  it('splits units from digits and keeps fractions whole', () => {
    expect(normaliseText('110psi, 4mm, 1-3/4", 5 32nds', 'en').tokens).toEqual([
      '110',
      'psi',
      '4',
      'mm',
      '1',
      '3/4',
      '5',
      '32nds',
    ]);
  });

  it('stems inflections to one form', () => {
    const { stems } = normaliseText('leaks leaking leaked leak', 'en');
    expect(new Set(stems).size).toBe(1);
    const es = normaliseText('fugas fuga rotos rota', 'es').stems;
    expect(es[0]).toBe(es[1]);
    expect(es[2]).toBe(es[3]);
  });
});
