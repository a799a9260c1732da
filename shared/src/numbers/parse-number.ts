// Finds numbers said in words or digits: integers, decimals, fractions, mixed numbers, gauge readings.
import type { Locale } from '../checklist/index.js';
import { normaliseText, NUMBER_WORDS, type NumberWords } from '../text/index.js';

export type NumberForm = 'integer' | 'decimal' | 'fraction' | 'mixed' | 'gauge';

export interface NumberSpan {
  // Token positions [start, end) in the normalised tokens.
  start: number;
  end: number;
  value: number;
  form: NumberForm;
  // Set for fractions and mixed numbers: 32 in "five thirty-seconds".
  denominator?: number;
  // "a"/"an"/"un"/"una" alone: one only if a unit follows ("an inch", "una pulgada").
  article?: boolean;
}

export interface NumberOptions {
  // Gauge-style readings where a pressure is expected: "one oh five" = 105, "one twenty five" = 125.
  gauge?: boolean;
  // "five thirty-two" = 5/32 where a length is expected; never with gauge readings.
  bareDenominators?: boolean;
}

interface Parsed {
  value: number;
  end: number;
  // Said in words (not digits) and below 100: can be the tail of a gauge reading.
  wordsBelowHundred?: boolean;
  article?: boolean;
}

const DIGITS = /^\d+$/;
const DECIMAL = /^\d*\.\d+$/;
const SLASH_FRACTION = /^(\d+)\/(\d+)$/;
const BARE_DENOMINATORS = new Set([16, 32, 64]);

class NumberParser {
  private readonly words: NumberWords;

  constructor(
    private readonly tokens: readonly string[],
    locale: Locale,
    private readonly options: NumberOptions,
  ) {
    this.words = NUMBER_WORDS[locale];
  }

  private at(i: number): string {
    return this.tokens[i] ?? '';
  }

  private digitWord(i: number): number | undefined {
    const t = this.at(i);
    const v = this.words.small[t];
    if (v !== undefined && v <= 9 && !this.words.articles.includes(t)) return v;
    if (this.words.zeroDigits.includes(t)) return 0;
    return undefined;
  }

  // 0..99 in words, or any run of digits.
  private belowHundred(i: number): Parsed | undefined {
    const t = this.at(i);
    if (DIGITS.test(t)) return { value: Number(t), end: i + 1 };
    if (this.words.articles.includes(t)) return { value: 1, end: i + 1, wordsBelowHundred: true, article: true };
    const ten = this.words.tens[t];
    if (ten !== undefined) {
      const joiner = this.words.tensJoiner;
      if (joiner !== undefined) {
        const unit = this.at(i + 1) === joiner ? this.words.small[this.at(i + 2)] : undefined;
        // "ochenta y un cuarto" is 80 1/4 and "treinta y tres cuartos" 30 3/4, not 81/4 or 33/4: nobody
        // says an improper fraction, so tens + "y" + a proper fraction is a mixed number.
        // ("treinta y un treintaidosavos", 31/32, is proper and stays one numerator.)
        const fractionAfter = unit !== undefined ? this.denominator(i + 3) : undefined;
        const startsMixed =
          unit !== undefined &&
          fractionAfter !== undefined &&
          ten + unit > fractionAfter.value &&
          unit < fractionAfter.value;
        if (unit !== undefined && unit >= 1 && unit <= 9 && !startsMixed)
          return { value: ten + unit, end: i + 3, wordsBelowHundred: true };
      } else {
        const unit = this.words.small[this.at(i + 1)];
        if (unit !== undefined && unit >= 1 && unit <= 9 && !this.words.articles.includes(this.at(i + 1))) {
          return { value: ten + unit, end: i + 2, wordsBelowHundred: true };
        }
      }
      return { value: ten, end: i + 1, wordsBelowHundred: true };
    }
    const small = this.words.small[t];
    if (small !== undefined) {
      return { value: small, end: i + 1, wordsBelowHundred: true, article: this.words.articles.includes(t) };
    }
    return undefined;
  }

  private belowThousand(i: number): Parsed | undefined {
    const w = this.words;
    const t = this.at(i);
    const hundredsWord = w.hundreds[t];
    if (hundredsWord !== undefined) {
      // "cien" stands alone; "ciento", "doscientos"... take a tail.
      if (t === 'cien') return { value: 100, end: i + 1 };
      const tail = this.belowHundred(i + 1);
      if (tail && !DIGITS.test(this.at(i + 1)) && !tail.article)
        return { value: hundredsWord + tail.value, end: tail.end };
      return { value: hundredsWord, end: i + 1 };
    }
    const hundred = w.hundredWord;
    if (hundred !== undefined) {
      let head: Parsed | undefined;
      if (t === hundred) head = { value: 1, end: i };
      else {
        const h = this.belowHundred(i);
        if (h && h.value >= 1 && h.value <= 99 && !DIGITS.test(t) && this.at(h.end) === hundred) head = h;
      }
      if (head) {
        const next = head.end + 1;
        const value = head.value * 100;
        const afterAnd = w.andWords.includes(this.at(next)) ? next + 1 : next;
        const tail = this.belowHundred(afterAnd);
        if (tail && !DIGITS.test(this.at(afterAnd)) && !tail.article && !this.startsFraction(afterAnd)) {
          return { value: value + tail.value, end: tail.end };
        }
        return { value, end: next };
      }
    }
    return this.belowHundred(i);
  }

  private integer(i: number): Parsed | undefined {
    const w = this.words;
    if (this.at(i) === w.thousandWord) {
      const tail = this.belowThousand(i + 1);
      return tail && !tail.article ? { value: 1000 + tail.value, end: tail.end } : { value: 1000, end: i + 1 };
    }
    const head = this.belowThousand(i);
    if (!head) return undefined;
    if (this.at(head.end) === w.thousandWord && !DIGITS.test(this.at(i))) {
      const next = head.end + 1;
      const afterAnd = w.andWords.includes(this.at(next)) ? next + 1 : next;
      const tail = this.belowThousand(afterAnd);
      if (tail && !tail.article && !this.startsFraction(afterAnd)) {
        return { value: head.value * 1000 + tail.value, end: tail.end };
      }
      return { value: head.value * 1000, end: next };
    }
    return head;
  }

  // A denominator starting at i: "quarters", "thirty seconds", "32nds", "over 32", "treinta y dos avos".
  private denominator(i: number): { value: number; end: number } | undefined {
    const w = this.words;
    const t = this.at(i);
    const single = w.denominators[t];
    if (single !== undefined) return { value: single, end: i + 1 };
    // "thirty seconds", and the recogniser's "30 seconds".
    const ten = w.tens[t] ?? (/^[2-9]0$/.test(t) ? Number(t) : undefined);
    const ordinal = w.ordinalUnits[this.at(i + 1)];
    if (ten !== undefined && ordinal !== undefined) return { value: ten + ordinal, end: i + 2 };
    const overLength = t === 'out' && this.at(i + 1) === 'of' ? 2 : w.overWords.includes(t) ? 1 : 0;
    if (overLength > 0) {
      const d = this.integer(i + overLength);
      if (d && d.value >= 2 && !d.article) return { value: d.value, end: d.end };
    }
    const asNumber = this.integer(i);
    if (asNumber && w.denominatorSuffixes.includes(this.at(asNumber.end)) && asNumber.value >= 2) {
      return { value: asNumber.value, end: asNumber.end + 1 };
    }
    return undefined;
  }

  // A proper fraction starting at i: "three quarters", "a half", "5/32", "media".
  private fraction(i: number): (Parsed & { denominator: number }) | undefined {
    const t = this.at(i);
    const slash = SLASH_FRACTION.exec(t);
    if (slash) {
      const d = Number(slash[2]);
      if (d === 0) return undefined;
      return { value: Number(slash[1]) / d, end: i + 1, denominator: d };
    }
    const bare = this.words.bareFractions[t];
    if (bare !== undefined) return { value: bare, end: i + 1, denominator: Math.round(1 / bare) };
    const numerator = this.belowThousand(i);
    if (!numerator) return undefined;
    const d = this.denominator(numerator.end);
    if (!d) return undefined;
    return { value: numerator.value / d.value, end: d.end, denominator: d.value };
  }

  private startsFraction(i: number): boolean {
    const f = this.fraction(i);
    return f !== undefined && f.value < 1;
  }

  private decimalDigits(i: number): { digits: string; end: number } | undefined {
    const t = this.at(i);
    if (DIGITS.test(t)) return { digits: t, end: i + 1 };
    let digits = '';
    let j = i;
    for (;;) {
      const d = this.digitWord(j);
      if (d === undefined) break;
      digits += String(d);
      j += 1;
    }
    if (digits.length > 1 || (digits.length === 1 && this.words.tens[this.at(j)] === undefined)) {
      return { digits, end: j };
    }
    // "point twenty five", "coma veinticinco".
    const group = this.belowHundred(i);
    if (group && !group.article) return { digits: String(group.value), end: group.end };
    return digits.length === 1 ? { digits, end: j } : undefined;
  }

  private gauge(i: number): Parsed | undefined {
    const first = this.digitWord(i);
    if (first === undefined || first === 0 || DIGITS.test(this.at(i))) return undefined;
    const second = this.at(i + 1);
    if (second === this.words.hundredWord || this.words.hundreds[second] !== undefined) return undefined;
    if (this.words.zeroDigits.includes(second)) {
      const third = this.digitWord(i + 2);
      if (third !== undefined) return { value: first * 100 + third, end: i + 3 };
    }
    const d2 = this.digitWord(i + 1);
    const d3 = this.digitWord(i + 2);
    if (d2 !== undefined && d3 !== undefined) return { value: first * 100 + d2 * 10 + d3, end: i + 3 };
    const tail = this.belowHundred(i + 1);
    if (tail?.wordsBelowHundred && tail.value >= 10) return { value: first * 100 + tail.value, end: tail.end };
    return undefined;
  }

  // The longest number expression that starts at i.
  parseAt(i: number): NumberSpan | undefined {
    const t = this.at(i);
    if (DECIMAL.test(t)) return { start: i, end: i + 1, value: Number(t), form: 'decimal' };
    if (this.options.gauge) {
      const g = this.gauge(i);
      if (g) return { start: i, end: g.end, value: g.value, form: 'gauge' };
    }
    const lead = this.fraction(i);
    if (lead) return { start: i, end: lead.end, value: lead.value, form: 'fraction', denominator: lead.denominator };
    const decimalPointHere = this.words.decimalPoints.includes(t);
    const whole: Parsed | undefined = decimalPointHere ? { value: 0, end: i } : this.integer(i);
    if (!whole) return undefined;
    const next = whole.end;
    if (this.words.decimalPoints.includes(this.at(next)) && !whole.article) {
      const digits = this.decimalDigits(next + 1);
      if (digits) {
        const value = Number(`${whole.value}.${digits.digits}`);
        // "four point five thirty-seconds".
        const d = this.denominator(digits.end);
        if (d) return { start: i, end: d.end, value: value / d.value, form: 'fraction', denominator: d.value };
        return { start: i, end: digits.end, value, form: 'decimal' };
      }
    }
    if (decimalPointHere) return undefined;
    const afterAnd = this.words.andWords.includes(this.at(next)) ? next + 1 : next;
    const part = this.fraction(afterAnd);
    if (part && part.value < 1 && (afterAnd > next || !whole.article)) {
      // "four and a half thirty-seconds".
      const d = this.denominator(part.end);
      if (d && part.denominator !== d.value) {
        const value = (whole.value + part.value) / d.value;
        return { start: i, end: d.end, value, form: 'fraction', denominator: d.value };
      }
      return { start: i, end: part.end, value: whole.value + part.value, form: 'mixed', denominator: part.denominator };
    }
    if (this.options.bareDenominators && !whole.article && whole.value >= 1) {
      const d = this.integer(next);
      if (d && !d.article && BARE_DENOMINATORS.has(d.value) && whole.value < d.value) {
        return { start: i, end: d.end, value: whole.value / d.value, form: 'fraction', denominator: d.value };
      }
    }
    const span: NumberSpan = { start: i, end: next, value: whole.value, form: 'integer' };
    if (whole.article) span.article = true;
    return span;
  }
}

// The words a number can start with (with any token holding a digit): every other word is passed over
// without parsing, which is most of what is said.
function startWordsOf(w: NumberWords): Set<string> {
  const words = [w.small, w.tens, w.hundreds, w.bareFractions].flatMap((table) => Object.keys(table));
  words.push(...w.articles, ...w.zeroDigits, ...w.decimalPoints, w.thousandWord);
  if (w.hundredWord !== undefined) words.push(w.hundredWord);
  return new Set(words);
}

const START_WORDS: Record<Locale, Set<string>> = {
  en: startWordsOf(NUMBER_WORDS.en),
  es: startWordsOf(NUMBER_WORDS.es),
};

export function findNumbers(tokens: readonly string[], locale: Locale, options: NumberOptions = {}): NumberSpan[] {
  const parser = new NumberParser(tokens, locale, options);
  const startWords = START_WORDS[locale];
  const spans: NumberSpan[] = [];
  let i = 0;
  while (i < tokens.length) {
    const token = tokens[i]!;
    const span = startWords.has(token) || /\d/.test(token) ? parser.parseAt(i) : undefined;
    if (span && span.end > i) {
      spans.push(span);
      i = span.end;
    } else {
      i += 1;
    }
  }
  return spans;
}

// The number a whole phrase says ("one and three quarters", "ciento cinco"), or undefined.
export function parseSpokenNumber(text: string, locale: Locale, options: NumberOptions = {}): number | undefined {
  const { tokens } = normaliseText(text, locale);
  if (tokens.length === 0) return undefined;
  const span = new NumberParser(tokens, locale, options).parseAt(0);
  if (!span || span.end !== tokens.length || span.article) return undefined;
  return span.value;
}
