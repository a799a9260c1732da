import { describe, expect, it } from 'vitest';
import { foldText } from './fold-text.js';
import { toWords } from './to-words.js';

describe('folding and reading words', () => {
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
});
