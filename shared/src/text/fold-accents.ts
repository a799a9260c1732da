// Recognisers, typed input and lexicons disagree on accents: the normaliser and the number tables fold
// them alike.
const COMBINING_MARKS = /\p{M}/gu;

export function foldAccents(text: string): string {
  return text.normalize('NFD').replace(COMBINING_MARKS, '').normalize('NFC');
}
