import { describe, expect, it } from 'vitest';
import { toTerms } from './phrases.js';
import { withinOneEdit } from './word-match.js';

describe('narration word matching', () => {
  it('tells words one edit apart from words further apart', () => {
    expect(withinOneEdit('ajustador', 'ajustadr')).toBe(true);
    expect(withinOneEdit('gladhand', 'gladhund')).toBe(true);
    expect(withinOneEdit('chamber', 'chambers')).toBe(true);
    expect(withinOneEdit('ajustador', 'ajustadro')).toBe(true);
    expect(withinOneEdit('chamber', 'camper')).toBe(false);
    expect(withinOneEdit('abcd', 'badc')).toBe(false);
  });

  it('turns trade phrases into one term, longest first', () => {
    expect(toTerms('the brake chamber and brake lights', 'en').terms.map((term) => term.term)).toEqual([
      '#brake_chamber',
      '#brake_light',
    ]);
    expect(toTerms('glad hands gladhands couplers', 'en').terms.map((term) => term.term)).toEqual([
      '#glad_hands',
      '#glad_hands',
      '#glad_hands',
    ]);
    expect(toTerms('u-bolts', 'en').terms.map((term) => term.term)).toEqual(['#u_bolts']);
  });

  it('reads position words as cues, not parts', () => {
    const [side, tire] = toTerms('drivers side tire', 'en').terms;
    expect(side?.cue).toEqual({ type: 'side', side: 'left' });
    expect(tire?.term).toBe('#tire');
  });
});
