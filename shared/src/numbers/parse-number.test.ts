import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { findNumbers, parseSpokenNumber } from './parse-number.js';
import { numberToWords } from './number-to-words.js';
import { normaliseText } from '../text/index.js';
import type { Locale } from '../checklist/index.js';

describe('parseSpokenNumber', () => {
  it.each([
    ['seven', 7, 'en'],
    ['twenty-five', 25, 'en'],
    ['one hundred and ten', 110, 'en'],
    ['a hundred ten', 110, 'en'],
    ['two thousand five hundred', 2500, 'en'],
    ['one point five', 1.5, 'en'],
    ['point two five', 0.25, 'en'],
    ['1.75', 1.75, 'en'],
    ['five thirty-seconds', 5 / 32, 'en'],
    ['five thirty seconds', 5 / 32, 'en'],
    ['5/32', 5 / 32, 'en'],
    ['5 32nds', 5 / 32, 'en'],
    ['one thirty-second', 1 / 32, 'en'],
    ['five over thirty two', 5 / 32, 'en'],
    ['three sixteenths', 3 / 16, 'en'],
    ['a quarter', 0.25, 'en'],
    ['one and three quarters', 1.75, 'en'],
    ['one three quarters', 1.75, 'en'],
    ['1-3/4', 1.75, 'en'],
    ['1 3/4', 1.75, 'en'],
    ['two and a half', 2.5, 'en'],
    ['one and an eighth', 1.125, 'en'],
    ['siete', 7, 'es'],
    ['treinta y dos', 32, 'es'],
    ['ciento cinco', 105, 'es'],
    ['ciento veinticinco', 125, 'es'],
    ['cien', 100, 'es'],
    ['dos mil quinientos', 2500, 'es'],
    ['uno coma cinco', 1.5, 'es'],
    ['1,5', 1.5, 'es'],
    ['uno coma veinticinco', 1.25, 'es'],
    ['cinco treintaidosavos', 5 / 32, 'es'],
    ['cinco treinta y dos avos', 5 / 32, 'es'],
    ['cinco de 32', 5 / 32, 'es'],
    ['cinco de treinta y dos', 5 / 32, 'es'],
    ['tres dieciseisavos', 3 / 16, 'es'],
    ['un cuarto', 0.25, 'es'],
    ['tres cuartos', 0.75, 'es'],
    ['una y tres cuartos', 1.75, 'es'],
    ['dos y media', 2.5, 'es'],
    ['uno y medio', 1.5, 'es'],
  ] as const)('reads "%s" as %d (%s)', (text, value, locale) => {
    expect(parseSpokenNumber(text, locale)).toBeCloseTo(value, 9);
  });

  it.each([
    ['one oh five', 105, 'en'],
    ['one o five', 105, 'en'],
    ['one twenty five', 125, 'en'],
    ['one ten', 110, 'en'],
    ['one two zero', 120, 'en'],
    ['uno cero cinco', 105, 'es'],
    ['uno veinticinco', 125, 'es'],
  ] as const)('reads the gauge-style "%s" as %d where a pressure is expected', (text, value, locale) => {
    expect(parseSpokenNumber(text, locale, { gauge: true })).toBe(value);
  });

  it('does not read "one twenty five" as one number without gauge readings', () => {
    expect(parseSpokenNumber('one twenty five', 'en')).toBeUndefined();
  });

  it('reads "five thirty two" as a fraction only where a length is expected', () => {
    expect(parseSpokenNumber('five thirty two', 'en', { bareDenominators: true })).toBeCloseTo(5 / 32);
    expect(parseSpokenNumber('five thirty two', 'en')).toBeUndefined();
  });

  it('refuses words that are not a number', () => {
    expect(parseSpokenNumber('looks good', 'en')).toBeUndefined();
    expect(parseSpokenNumber('a', 'en')).toBeUndefined();
    expect(parseSpokenNumber('una fuga', 'es')).toBeUndefined();
  });
});

describe('findNumbers', () => {
  it('finds a number inside a sentence and where it ends', () => {
    const { tokens } = normaliseText('tread is at six thirty seconds on the left', 'en');
    const spans = findNumbers(tokens, 'en');
    expect(spans).toHaveLength(1);
    expect(spans[0]).toMatchObject({ start: 3, end: 6, form: 'fraction', denominator: 32 });
  });

  it('marks a lone article so a caller can require a unit after it', () => {
    const { tokens } = normaliseText('an inch and a half', 'en');
    const spans = findNumbers(tokens, 'en');
    expect(spans[0]).toMatchObject({ value: 1, article: true });
    expect(spans[1]).toMatchObject({ value: 0.5, form: 'fraction' });
  });
});

const locales: Locale[] = ['en', 'es'];

describe('numberToWords round trip', () => {
  for (const locale of locales) {
    it(`reads back every integer 0-1000 it says in ${locale}`, () => {
      fc.assert(
        fc.property(fc.integer({ min: 0, max: 1000 }), (n) => {
          expect(parseSpokenNumber(numberToWords(n, locale), locale)).toBe(n);
        }),
        { numRuns: 1001 },
      );
    });

    it(`reads back common fractions and mixed numbers it says in ${locale}`, () => {
      const denominators = fc.constantFrom(2, 3, 4, 8, 16, 32, 64);
      fc.assert(
        fc.property(fc.integer({ min: 0, max: 20 }), denominators, fc.integer({ min: 1, max: 63 }), (whole, d, k) => {
          const numerator = (k % (d - 1)) + 1;
          const value = whole + numerator / d;
          expect(parseSpokenNumber(numberToWords(value, locale), locale)).toBeCloseTo(value, 9);
        }),
      );
    });

    it(`reads back decimals it says in ${locale}`, () => {
      fc.assert(
        fc.property(fc.integer({ min: 0, max: 99999 }), (hundredths) => {
          const value = hundredths / 100;
          expect(parseSpokenNumber(numberToWords(value, locale), locale)).toBeCloseTo(value, 9);
        }),
      );
    });
  }

  it('reads "y un" before a singular fraction word as a whole number and a part', () => {
    expect(parseSpokenNumber('ochenta y un cuarto', 'es')).toBe(80.25);
    expect(parseSpokenNumber('ochenta y un medio', 'es')).toBe(80.5);
    expect(parseSpokenNumber('treinta y un treintaidosavos', 'es')).toBe(31 / 32);
    expect(parseSpokenNumber('ochenta y uno', 'es')).toBe(81);
  });

  it('refuses negative and non-finite numbers', () => {
    expect(() => numberToWords(-1, 'en')).toThrow(RangeError);
    expect(() => numberToWords(Number.NaN, 'es')).toThrow(RangeError);
  });

  it('says the forms read-backs use', () => {
    expect(numberToWords(105, 'en')).toBe('one hundred five');
    expect(numberToWords(105, 'es')).toBe('ciento cinco');
    expect(numberToWords(5 / 32, 'en')).toBe('five thirty-seconds');
    expect(numberToWords(5 / 32, 'es')).toBe('cinco treintaidosavos');
    expect(numberToWords(1.75, 'en')).toBe('one and three quarters');
    expect(numberToWords(1.75, 'es')).toBe('uno y tres cuartos');
  });
});
