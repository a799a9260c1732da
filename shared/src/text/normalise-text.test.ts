import { describe, expect, it } from 'vitest';
import { normaliseText } from './normalise-text.js';

describe('normaliseText', () => {
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
