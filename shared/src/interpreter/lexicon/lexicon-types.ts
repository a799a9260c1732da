// The shape of one locale's answer lexicon. Phrases are written as a driver says them; the matcher
// normalises and stems them like what is heard. A word written "=word" must match exactly (no stem);
// a phrase ending in " $" only counts at the end of the utterance.
import type { Locale } from '../../checklist/index.js';
import type { Unit } from '../../units/index.js';
import type { Command } from '../types.js';

export interface UnitPhrase {
  phrase: string;
  unit: Unit;
}

export type SpokenCommand = Exclude<Command, 'language'>;

export interface AnswerLexicon {
  // Hesitations and noise words: dropped, and alone they are unclear.
  fillers: readonly string[];
  // Words of assent that may lead a command ("okay, repeat") without making it an answer.
  acknowledgements: readonly string[];
  // Words around a command that do not change it ("can you", "please").
  courtesy: readonly string[];
  pass: readonly string[];
  // A problem said plainly or only described ("cracked lens", "tiene una fuga").
  defect: readonly string[];
  // Words that only announce a defect; left out of the detail.
  defectMarkers: readonly string[];
  vague: readonly string[];
  hedges: readonly string[];
  contrast: readonly string[];
  notApplicable: readonly string[];
  // "no leaks", "sin fugas": a negator before a problem word can make it a pass.
  determinerNegators: readonly string[];
  // "not leaking", "isn't good", "no está bien": reaches further, and also turns a pass word negative.
  verbalNegators: readonly string[];
  // "leak free".
  postNegators: readonly string[];
  conjunctions: readonly string[];
  // Words that may stand between a determiner negator and the problem ("no visible cracks").
  determinerGap: readonly string[];
  // Words that may stand between a verbal negator and the problem ("don't see any leaks").
  verbalGap: readonly string[];
  // Words that may stand between a negator and a pass word ("not looking good").
  passGap: readonly string[];
  // Vehicle parts: known, carry no answer, and may stand after a negator ("no air leaks").
  parts: readonly string[];
  // Known words with no answer in them (positions, function words).
  neutral: readonly string[];
  commands: Readonly<Record<SpokenCommand, readonly string[]>>;
  // Asking for a language by voice, in either language.
  languages: Readonly<Record<Locale, readonly string[]>>;
  // For the out-of-limit confirmation step.
  yes: readonly string[];
  no: readonly string[];
  units: readonly UnitPhrase[];
  // "per minute" after a pressure makes it a leak rate.
  perMinute: readonly string[];
  // A leak rate of zero said in words ("holding steady", "sin fugas").
  noLeak: readonly string[];
  // Misheard number words, replaced only before a fraction word or a unit ("for thirty seconds").
  homophones: Readonly<Record<string, string>>;
  // "I wouldn't say", "no diría": whatever praise follows them is not a pass.
  praiseNegators: readonly string[];
  // Words that take back a value just said: "one ten, no, one twelve", "seis, digo siete".
  corrections: readonly string[];
  // Words that announce a fix and are left out of what was done ("fixed", "corregido").
  fixAnnouncers: readonly string[];
  // Words that say what was done and so start the fix's action ("added air", "cambié el foco").
  fixActions: readonly string[];
  // May lead a fix's announcer or action ("I fixed it", "ya lo arreglé").
  fixLeadIns: readonly string[];
  // Words between a fix's action and its new reading ("now", "ahora quedó en"), left out of both.
  readingLeadIns: readonly string[];
  // A required reading the driver could not take ("no gauge", "no tengo manómetro").
  noGauge: readonly string[];
  // Articles left off the front of a defect's words ("the hub is leaking" is "hub is leaking").
  articles: readonly string[];
  // Words that may follow "end note" without making it mid-sentence ("please", "gracias").
  signOffs: readonly string[];
}

// The units table written as each unit with the phrases that name it, read as one row a phrase.
export function unitPhrases(byUnit: Readonly<Partial<Record<Unit, readonly string[]>>>): UnitPhrase[] {
  return Object.entries(byUnit).flatMap(([unit, phrases]) =>
    (phrases ?? []).map((phrase) => ({ phrase, unit: unit as Unit })),
  );
}
