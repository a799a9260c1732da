import { describe, expect, it } from 'vitest';
import { foldText, toWords, withinOneEdit } from './normalize.js';
import { toTerms } from './phrases.js';

describe('narration text normalising', () => {
  it('folds case, accents and apostrophes', () => {
    expect(foldText("Cámara de FRENO, driver's side")).toBe('camara de freno drivers side');
  });

  it('stems English and Spanish plurals to one form', () => {
    expect(toWords('tires chambers', 'en').map((word) => word.stem)).toEqual(
      toWords('tire chamber', 'en').map((word) => word.stem),
    );
    expect(toWords('llantas mangueras', 'es').map((word) => word.stem)).toEqual(
      toWords('llanta manguera', 'es').map((word) => word.stem),
    );
  });

  it('writes spoken numbers as digits', () => {
    expect(toWords('four thirty seconds', 'en').map((word) => word.surface)).toEqual(['4', '32']);
    expect(toWords('cuatro treintaidosavos', 'es').map((word) => word.surface)).toEqual(['4', '32']);
  });

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
