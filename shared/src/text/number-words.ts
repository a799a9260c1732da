// Number words per locale, as data: what the normaliser splits, the number reader reads and the
// read-backs say. The words are written once, as said (SAID_NUMBERS); the reading tables fold them.
import type { Locale } from '../checklist/types.js';
import { foldAccents } from './fold-accents.js';

export interface SaidNumbers {
  // By value: 0..19 in English, 0..29 in Spanish (which runs 21..29 together).
  small: readonly string[];
  // By their digit: "twenty" at 2; empty where no tens word is said.
  tens: readonly string[];
  // By their digit: Spanish "ciento", "doscientos"; English says "hundred" instead.
  hundreds: readonly string[];
}

function said(...lines: string[]): string[] {
  return lines.join(' ').split(' ');
}

export const SAID_NUMBERS: Readonly<Record<Locale, SaidNumbers>> = {
  en: {
    small: said(
      'zero one two three four five six seven eight nine ten',
      'eleven twelve thirteen fourteen fifteen sixteen seventeen eighteen nineteen',
    ),
    tens: ['', '', ...said('twenty thirty forty fifty sixty seventy eighty ninety')],
    hundreds: [],
  },
  es: {
    small: said(
      'cero uno dos tres cuatro cinco seis siete ocho nueve diez',
      'once doce trece catorce quince dieciséis diecisiete dieciocho diecinueve veinte',
      'veintiuno veintidós veintitrés veinticuatro veinticinco veintiséis veintisiete veintiocho veintinueve',
    ),
    tens: ['', '', '', ...said('treinta cuarenta cincuenta sesenta setenta ochenta noventa')],
    hundreds: [
      '',
      ...said('ciento doscientos trescientos cuatrocientos quinientos seiscientos setecientos ochocientos novecientos'),
    ],
  },
};

// The reading side: each word said (accents folded) with its value times `scale`.
function valuesOf(words: readonly string[], scale = 1): Record<string, number> {
  const values: Record<string, number> = {};
  words.forEach((word, index) => {
    if (word !== '') values[foldAccents(word)] = index * scale;
  });
  return values;
}

export interface NumberWords {
  // Single tokens worth 0..29 (Spanish runs 21..29 together; English stops at 19).
  small: Readonly<Record<string, number>>;
  // Tens that can take a unit after them: "twenty five", "treinta y dos".
  tens: Readonly<Record<string, number>>;
  // The word between tens and unit ("y"), if the language uses one.
  tensJoiner?: string;
  // Spanish hundreds are words of their own ("ciento", "doscientos"); English multiplies ("two hundred").
  hundreds: Readonly<Record<string, number>>;
  hundredWord?: string;
  thousandWord: string;
  // "a", "an", "un", "una": one only when a unit, a fraction or "hundred" follows.
  articles: readonly string[];
  // Words that stand for zero inside a gauge reading or after the decimal point ("one oh five").
  zeroDigits: readonly string[];
  decimalPoints: readonly string[];
  andWords: readonly string[];
  // "five over thirty-two", "cinco de treinta y dos".
  overWords: readonly string[];
  // Denominator words: "quarters" 4, "sixteenths" 16, "octavos" 8.
  denominators: Readonly<Record<string, number>>;
  // Ordinal units that finish a two-word denominator: "thirty" + "seconds" = 32.
  ordinalUnits: Readonly<Record<string, number>>;
  // A word after a number that makes it a denominator: "treinta y dos avos".
  denominatorSuffixes: readonly string[];
  // A fraction said without a numerator: "half an inch", "pulgada y media".
  bareFractions: Readonly<Record<string, number>>;
}

const EN: NumberWords = {
  small: valuesOf(SAID_NUMBERS.en.small),
  tens: { ...valuesOf(SAID_NUMBERS.en.tens, 10), fourty: 40 },
  hundreds: {},
  hundredWord: 'hundred',
  thousandWord: 'thousand',
  articles: ['a', 'an'],
  zeroDigits: ['oh', 'o', 'zero'],
  decimalPoints: ['point', 'dot'],
  andWords: ['and', 'n'],
  overWords: ['over', 'outof'],
  denominators: {
    half: 2,
    halves: 2,
    halfs: 2,
    third: 3,
    thirds: 3,
    quarter: 4,
    quarters: 4,
    fourth: 4,
    fourths: 4,
    eighth: 8,
    eighths: 8,
    eights: 8,
    sixteenth: 16,
    sixteenths: 16,
    '16th': 16,
    '16ths': 16,
    '8th': 8,
    '8ths': 8,
    '32nd': 32,
    '32nds': 32,
    '32s': 32,
    '64th': 64,
    '64ths': 64,
    thirtyseconds: 32,
    thirtysecond: 32,
  },
  ordinalUnits: { second: 2, seconds: 2, twos: 2, fourth: 4, fourths: 4 },
  denominatorSuffixes: [],
  bareFractions: { half: 0.5, quarter: 0.25 },
};

// "un", "una" and "veintiún" are said before a noun (and an article as often as a number).
const ES_SMALL: Record<string, number> = {
  ...valuesOf(SAID_NUMBERS.es.small),
  un: 1,
  una: 1,
  veintiun: 21,
  veintiuna: 21,
};
const ES_TENS: Record<string, number> = valuesOf(SAID_NUMBERS.es.tens, 10);

// Recognisers sometimes run "treinta y dos" together as "treintaidos" or "treintaydos".
for (const [tensWord, tensValue] of Object.entries(ES_TENS)) {
  for (const [unitWord, unitValue] of Object.entries(ES_SMALL)) {
    if (unitValue < 1 || unitValue > 9 || unitWord === 'un' || unitWord === 'una') continue;
    ES_SMALL[`${tensWord}i${unitWord}`] = tensValue + unitValue;
    ES_SMALL[`${tensWord}y${unitWord}`] = tensValue + unitValue;
  }
}

const ES: NumberWords = {
  small: ES_SMALL,
  tens: ES_TENS,
  tensJoiner: 'y',
  // "cien" alone; the feminine forms count feminine nouns ("doscientas libras").
  hundreds: {
    cien: 100,
    ...valuesOf(SAID_NUMBERS.es.hundreds, 100),
    ...valuesOf(
      SAID_NUMBERS.es.hundreds.map((word) => word.replace(/os$/, 'as')),
      100,
    ),
  },
  thousandWord: 'mil',
  articles: ['un', 'una'],
  zeroDigits: ['cero'],
  decimalPoints: ['coma', 'punto'],
  andWords: ['y', 'e'],
  overWords: ['de', 'sobre', 'entre'],
  denominators: {
    medio: 2,
    medios: 2,
    media: 2,
    medias: 2,
    tercio: 3,
    tercios: 3,
    cuarto: 4,
    cuartos: 4,
    octavo: 8,
    octavos: 8,
    dieciseisavo: 16,
    dieciseisavos: 16,
  },
  ordinalUnits: {},
  denominatorSuffixes: ['avos', 'avo'],
  bareFractions: { media: 0.5, medio: 0.5 },
};

export const NUMBER_WORDS: Readonly<Record<Locale, NumberWords>> = { en: EN, es: ES };
