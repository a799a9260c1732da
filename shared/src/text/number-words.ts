// Number words per locale, as data: what the normaliser splits and the number reader reads.
import type { Locale } from '../checklist/types.js';

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
  small: {
    zero: 0,
    one: 1,
    two: 2,
    three: 3,
    four: 4,
    five: 5,
    six: 6,
    seven: 7,
    eight: 8,
    nine: 9,
    ten: 10,
    eleven: 11,
    twelve: 12,
    thirteen: 13,
    fourteen: 14,
    fifteen: 15,
    sixteen: 16,
    seventeen: 17,
    eighteen: 18,
    nineteen: 19,
  },
  tens: { twenty: 20, thirty: 30, forty: 40, fourty: 40, fifty: 50, sixty: 60, seventy: 70, eighty: 80, ninety: 90 },
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

const ES_SMALL: Record<string, number> = {
  cero: 0,
  uno: 1,
  un: 1,
  una: 1,
  dos: 2,
  tres: 3,
  cuatro: 4,
  cinco: 5,
  seis: 6,
  siete: 7,
  ocho: 8,
  nueve: 9,
  diez: 10,
  once: 11,
  doce: 12,
  trece: 13,
  catorce: 14,
  quince: 15,
  dieciseis: 16,
  diecisiete: 17,
  dieciocho: 18,
  diecinueve: 19,
  veinte: 20,
  veintiuno: 21,
  veintiun: 21,
  veintiuna: 21,
  veintidos: 22,
  veintitres: 23,
  veinticuatro: 24,
  veinticinco: 25,
  veintiseis: 26,
  veintisiete: 27,
  veintiocho: 28,
  veintinueve: 29,
};

const ES_TENS: Record<string, number> = {
  treinta: 30,
  cuarenta: 40,
  cincuenta: 50,
  sesenta: 60,
  setenta: 70,
  ochenta: 80,
  noventa: 90,
};

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
  hundreds: {
    cien: 100,
    ciento: 100,
    doscientos: 200,
    doscientas: 200,
    trescientos: 300,
    trescientas: 300,
    cuatrocientos: 400,
    cuatrocientas: 400,
    quinientos: 500,
    quinientas: 500,
    seiscientos: 600,
    seiscientas: 600,
    setecientos: 700,
    setecientas: 700,
    ochocientos: 800,
    ochocientas: 800,
    novecientos: 900,
    novecientas: 900,
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
