import { describe, expect, it } from 'vitest';
import { originalWords } from './original-words.js';

describe('originalWords', () => {
  it('gives the words as said for a run of tokens, without the pause marks at its edges', () => {
    expect(originalWords("All good, but the hub's leaking.", 'en', 4, 6)).toBe("hub's leaking");
    expect(originalWords('La mica está rota, fin de nota', 'es', 0, 4)).toBe('La mica está rota');
  });

  it('is undefined when a token boundary falls inside a spoken word', () => {
    expect(originalWords('about 110psi', 'en', 1, 2)).toBeUndefined();
    expect(originalWords('about 110psi', 'en', 1, 3)).toBe('110psi');
  });
});
