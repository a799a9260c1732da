// Recognisers, typed input and lexicons disagree on accents, case and apostrophes: all are folded alike.
const COMBINING_MARKS = /\p{M}/gu;

export function foldAccents(text: string): string {
  return text.normalize('NFD').replace(COMBINING_MARKS, '').normalize('NFC');
}

// Lower case, no accents, no apostrophes, words separated by single spaces.
export function foldText(text: string): string {
  // Recognisers mostly give plain lower-case words already.
  if (/^[a-z0-9 ]*$/.test(text)) return text.trim().replace(/ {2,}/g, ' ');
  return foldAccents(text)
    .toLowerCase()
    .replace(/['’`]/g, '')
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();
}
