// The words of measures and verdicts, per locale, kept apart from the checklist's item words so that
// speaking a verdict (on the driver's run screen) does not load every item's text.
import en from '@yardcall/prompts/en/verdicts.json' with { type: 'json' };
import es from '@yardcall/prompts/es/verdicts.json' with { type: 'json' };
import type { Locale } from './types.js';

export type VerdictWords = typeof en;

// Assigning through the English shape makes the compiler refuse a Spanish file that lacks a key.
const spanish: VerdictWords = es;

const WORDS: Record<Locale, VerdictWords> = { en, es: spanish };

export function verdictWords(locale: Locale): VerdictWords {
  return WORDS[locale];
}

const PLACEHOLDER = /\{(\w+)\}/g;

// A template split once into literal text (even indexes) and placeholder names (odd indexes): filling is a join.
const compiled = new Map<string, string[]>();

function compile(template: string): string[] {
  let parts = compiled.get(template);
  if (!parts) {
    parts = template.split(PLACEHOLDER);
    compiled.set(template, parts);
  }
  return parts;
}

// Fills "{name}" placeholders; a placeholder without a value is a bug in the words, so it throws.
export function fillTemplate(template: string, values: Readonly<Record<string, string | number | undefined>>): string {
  const parts = compile(template);
  let filled = parts[0] ?? '';
  let hasEmpty = false;
  for (let i = 1; i < parts.length; i += 2) {
    const name = parts[i] as string;
    const value = values[name];
    if (value === undefined) {
      throw new Error(`No value for "{${name}}" in "${template}".`);
    }
    const text = String(value);
    if (text === '') hasEmpty = true;
    filled += text + (parts[i + 1] ?? '');
  }
  // An empty placeholder (a single tire has no inner/outer) must not leave a double space.
  return hasEmpty
    ? filled
        .replace(/\s{2,}/g, ' ')
        .replace(/\s+([,.?:])/g, '$1')
        .trim()
    : filled;
}

// Places after the decimal point worth saying for each canonical unit.
const DECIMALS: Record<string, number> = { 'in/32': 1, in: 4, psi: 1, deg: 1, 'psi/min': 2 };

export function formatNumber(value: number, locale: Locale, decimals = 2): string {
  const factor = 10 ** decimals;
  const rounded = Math.round(value * factor) / factor;
  const text = String(rounded);
  return verdictWords(locale).decimal === '.' ? text : text.replace('.', verdictWords(locale).decimal);
}

type UnitWordKey = keyof VerdictWords['verdicts']['unitWords'];

function isUnitWordKey(unit: string): unit is UnitWordKey {
  return unit in en.verdicts.unitWords;
}

// "4 thirty-seconds", "1.75 inches", "0,25 pulgadas": a measure as it is said.
export function formatMeasure(value: number, unit: string, locale: Locale): string {
  const number = formatNumber(value, locale, DECIMALS[unit] ?? 2);
  if (!isUnitWordKey(unit)) {
    return `${number} ${unit}`;
  }
  const words = verdictWords(locale).verdicts.unitWords[unit];
  return `${number} ${Math.abs(value) === 1 ? words.one : words.many}`;
}
