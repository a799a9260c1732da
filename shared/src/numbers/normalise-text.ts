// One normaliser for everything that reads what a recogniser heard: case, accents, punctuation, stems.
import type { Locale } from '../checklist/index.js';

export interface NormalisedText {
  // Lower case, accents folded, punctuation gone: what lexicons and the number parser match.
  tokens: string[];
  // The same words with their accents kept, for repeating back what the driver said.
  surface: string[];
  // Light stems of `tokens`, so "leaks", "leaking" and "leaked" meet one lexicon entry.
  stems: string[];
  // True where the recogniser put a pause mark (comma, full stop...) after the token.
  pauseAfter: boolean[];
}

const COMBINING_MARKS = /[\u0300-\u036f]/g;

export function foldAccents(text: string): string {
  return text.normalize('NFD').replace(COMBINING_MARKS, '').normalize('NFC');
}

// Spanish fraction words are often run together with their number ("treintaidosavos", "32avos").
const SPANISH_AVOS = /^(.+?)(avos?)$/;
const SPANISH_AVO_PREFIXES = new Set([
  'dos',
  'doce',
  'dieciseis',
  'treintaidos',
  'treintaydos',
  'sesentaicuatro',
  'sesentaycuatro',
  'veinticuatro',
]);

function splitSpanishAvos(token: string): string[] {
  const match = SPANISH_AVOS.exec(token);
  if (!match) return [token];
  const prefix = match[1] ?? '';
  if (/^\d+$/.test(prefix) || SPANISH_AVO_PREFIXES.has(prefix)) return [prefix, 'avos'];
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

export function normaliseText(text: string, locale: Locale): NormalisedText {
  const prepared = prepare(text, locale).replace(PAUSE_MARK, ' \u0001 ');
  const tokens: string[] = [];
  const surface: string[] = [];
  const pauseAfter: boolean[] = [];
  for (const raw of prepared.split(/\s+/)) {
    if (raw === '\u0001') {
      if (pauseAfter.length > 0) pauseAfter[pauseAfter.length - 1] = true;
      continue;
    }
    // Letters, digits, the decimal point, the fraction slash and the n/a marker survive.
    const kept = raw.replace(/[^\p{L}\p{N}./_]/gu, '').replace(/^[./]+|[./]+$/g, '');
    if (kept === '') continue;
    const folded = foldAccents(kept);
    const parts = locale === 'es' ? splitSpanishAvos(folded) : [folded];
    for (const part of parts) {
      tokens.push(part);
      surface.push(parts.length > 1 ? part : kept);
      pauseAfter.push(false);
    }
  }
  return { tokens, surface, stems: tokens.map((token) => stemWord(token, locale)), pauseAfter };
}

const EN_IRREGULAR: Record<string, string> = {
  lens: 'lens',
  lenses: 'lens',
  broken: 'broke',
  broke: 'broke',
  yes: 'yes',
  tires: 'tire',
  tyres: 'tire',
  tyre: 'tire',
  tire: 'tire',
  ok: 'ok',
  okay: 'ok',
  okey: 'ok',
  kay: 'ok',
  leaky: 'leak',
  // "note" must not fold into "not".
  note: 'note',
  notes: 'note',
};

// A light suffix folding, deliberately small: it only has to make the lexicon meet common inflections.
function stemEnglish(word: string): string {
  const irregular = EN_IRREGULAR[word];
  if (irregular) return irregular;
  if (word.length <= 3 || /\d/.test(word)) return word;
  let w = word;
  if (w.endsWith('ies') && w.length > 4) w = `${w.slice(0, -3)}y`;
  else if (w.endsWith('sses')) w = w.slice(0, -2);
  else if (w.endsWith('s') && !/(ss|us|is)$/.test(w)) w = w.slice(0, -1);
  if (w.endsWith('ing') && w.length - 3 >= 3) w = w.slice(0, -3);
  else if (w.endsWith('ed') && w.length - 2 >= 3) w = w.slice(0, -2);
  if (w.endsWith('e') && w.length - 1 >= 3) w = w.slice(0, -1);
  if (/[^aeiou]y$/.test(w) && w.length - 1 >= 4) w = w.slice(0, -1);
  if (/([^aeioulsz])\1$/.test(w)) w = w.slice(0, -1);
  return w;
}

function stemSpanish(word: string): string {
  if (word.length <= 3 || /\d/.test(word)) return word;
  let w = word;
  if (w.endsWith('es') && w.length - 2 >= 3 && !/[aeiou]es$/.test(w)) w = w.slice(0, -2);
  else if (w.endsWith('s') && w.length - 1 >= 3) w = w.slice(0, -1);
  const verbal = /(ando|iendo|ado|ada|ido|ida)$/.exec(w);
  if (verbal && w.length - verbal[0].length >= 3) w = w.slice(0, -verbal[0].length);
  else if (/[aoe]$/.test(w) && w.length - 1 >= 3) w = w.slice(0, -1);
  return w;
}

export function stemWord(word: string, locale: Locale): string {
  return locale === 'en' ? stemEnglish(word) : stemSpanish(word);
}
