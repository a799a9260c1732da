// Tokens of what a recogniser heard, for the interpreter and the number parser: case, accents,
// punctuation, number formats and pause marks, with the shared stems.
import type { Locale } from '../checklist/types.js';
import { foldAccents } from './fold-accents.js';
import { NUMBER_WORDS } from './number-words.js';
import { stemWord } from './stem-word.js';

export interface NormalisedText {
  // Lower case, accents folded, punctuation gone: what lexicons and the number parser match.
  tokens: string[];
  // The same words with their accents kept, for repeating back what the driver said.
  surface: string[];
  // Stems of `tokens`, so "leaks", "leaking" and "leaked" meet one lexicon entry.
  stems: string[];
  // True where the recogniser put a pause mark (comma, full stop...) after the token.
  pauseAfter: boolean[];
}

// Spanish fraction words are often run together with their number ("treintaidosavos", "32avos").
const SPANISH_AVOS = /^(.+?)(avos?)$/;

function splitSpanishAvos(token: string): string[] {
  const match = SPANISH_AVOS.exec(token);
  if (!match) return [token];
  const prefix = match[1] ?? '';
  if (/^\d+$/.test(prefix) || NUMBER_WORDS.es.small[prefix] !== undefined) return [prefix, 'avos'];
  return [token];
}

function prepare(text: string, locale: Locale): string {
  let s = text.toLowerCase().replace(/[\u2018\u2019\u02bc`´]/g, "'");
  s = s.replace(/\bn\s*\/\s*a\b|\bn\.\s*a\./g, ' n_a ');
  s = s.replace(/°/g, ' deg ');
  // Thousands separators in English, decimal commas in Spanish.
  s =
    locale === 'en'
      ? s.replace(/(\d),(\d{3})(?!\d)/g, '$1$2').replace(/(\d),(\d)/g, '$1.$2')
      : s.replace(/(\d)\.(\d{3})(?!\d)/g, '$1$2').replace(/(\d),(\d)/g, '$1.$2');
  // "1-3/4" is one and three quarters; other hyphens only join words.
  s = s.replace(/(\d)\s*-\s*(\d+\/\d+)/g, '$1 $2');
  s = s.replace(/(\d)\s*-\s*(\d)/g, '$1 $2');
  s = s.replace(/-/g, ' ');
  s = s.replace(/(\d)\s*\/\s*(\d)/g, '$1/$2');
  // Keep "32nds" and "16ths" whole; split "110psi" and "4mm".
  s = s.replace(/(\d)(?!(?:st|nd|rd|th)s?\b|s\b|avos?\b)(\p{L})/gu, '$1 $2');
  s = s.replace(/(\p{L})(\d)/gu, '$1 $2');
  s = s.replace(/'/g, '');
  return s;
}

// Pause marks become their own marker so the tokeniser can note them.
const PAUSE_MARK = /[,;:!?.…]+(?=\s|$)|[¡¿]/g;

// Recognisers mostly give plain lower-case words, which need no preparing, and plain tokens no folding.
const PLAIN_TEXT = /^[a-z ]*$/;
const PLAIN_TOKEN = /^[a-z0-9]+$/;

export function normaliseText(text: string, locale: Locale): NormalisedText {
  const prepared = PLAIN_TEXT.test(text) ? text : prepare(text, locale).replace(PAUSE_MARK, ' \u0001 ');
  const tokens: string[] = [];
  const surface: string[] = [];
  const pauseAfter: boolean[] = [];
  for (const raw of prepared.split(/\s+/)) {
    if (raw === '\u0001') {
      if (pauseAfter.length > 0) pauseAfter[pauseAfter.length - 1] = true;
      continue;
    }
    // Letters, digits, the decimal point, the fraction slash and the n/a marker survive.
    const plain = PLAIN_TOKEN.test(raw);
    const kept = plain ? raw : raw.replace(/[^\p{L}\p{N}./_]/gu, '').replace(/^[./]+|[./]+$/g, '');
    if (kept === '') continue;
    const folded = plain ? kept : foldAccents(kept);
    const parts = locale === 'es' ? splitSpanishAvos(folded) : [folded];
    for (const part of parts) {
      tokens.push(part);
      surface.push(parts.length > 1 ? part : kept);
      pauseAfter.push(false);
    }
  }
  return { tokens, surface, stems: tokens.map((token) => stemWord(token, locale)), pauseAfter };
}

// The tokens [start, end) of a normalised text, as a text of their own.
export function sliceText(text: NormalisedText, start: number, end: number): NormalisedText {
  return {
    tokens: text.tokens.slice(start, end),
    surface: text.surface.slice(start, end),
    stems: text.stems.slice(start, end),
    pauseAfter: text.pauseAfter.slice(start, end),
  };
}
