// Each locale's lexicon compiled once into matchers and word sets.
import type { Locale } from '../checklist/index.js';
import { normaliseText } from '../text/index.js';
import type { Unit } from '../units/index.js';
import { EN_LEXICON } from './lexicon/en.js';
import type { AnswerLexicon, SpokenCommand } from './lexicon/lexicon-types.js';
import { PhraseMatcher, type PhraseGroup } from '../text/index.js';

export type WordCategory =
  | { kind: 'filler' }
  | { kind: 'not_applicable' }
  | { kind: 'vague' }
  | { kind: 'hedge' }
  | { kind: 'command'; command: SpokenCommand }
  | { kind: 'language'; locale: Locale }
  | { kind: 'defect' }
  | { kind: 'pass' }
  | { kind: 'contrast' }
  | { kind: 'negator'; reach: 'determiner' | 'verbal' }
  | { kind: 'praise_negator' }
  | { kind: 'post_negator' }
  | { kind: 'conjunction' }
  | { kind: 'part' }
  | { kind: 'neutral' };

export interface CompiledLexicon {
  locale: Locale;
  lexicon: AnswerLexicon;
  words: PhraseMatcher<WordCategory>;
  units: PhraseMatcher<Unit>;
  perMinute: PhraseMatcher<true>;
  noLeak: PhraseMatcher<true>;
  confirmation: PhraseMatcher<'yes' | 'no'>;
  defectMarkers: PhraseMatcher<true>;
  courtesyTokens: ReadonlySet<string>;
  acknowledgementTokens: ReadonlySet<string>;
  determinerGap: ReadonlySet<string>;
  verbalGap: ReadonlySet<string>;
  passGap: ReadonlySet<string>;
  verbalNegatorTokens: ReadonlySet<string>;
  // Tokens after which a misheard number word is taken as a number ("for thirty seconds").
  homophoneTriggers: ReadonlySet<string>;
  corrections: PhraseMatcher<true>;
  fixes: PhraseMatcher<'announce' | 'action'>;
  fixLeadIns: PhraseMatcher<true>;
  readingLeadInTokens: ReadonlySet<string>;
  noGauge: PhraseMatcher<true>;
  articleTokens: ReadonlySet<string>;
  signOffs: PhraseMatcher<true>;
}

// English is always there; another language's words load when a walk-around needs them, so the
// walk-around's first load carries one language.
const LEXICON_LOADERS: Record<Exclude<Locale, 'en'>, () => Promise<AnswerLexicon>> = {
  es: () => import('./lexicon/es.js').then((module) => module.ES_LEXICON),
};
const LEXICONS = new Map<Locale, AnswerLexicon>([['en', EN_LEXICON]]);

export function answerWordsLoaded(locale: Locale): boolean {
  return LEXICONS.has(locale);
}

// Resolves once `locale`'s answer words are there; loading twice loads once.
export async function loadAnswerWords(locale: Locale): Promise<void> {
  if (locale === 'en' || LEXICONS.has(locale)) return;
  LEXICONS.set(locale, await LEXICON_LOADERS[locale]());
}

function stemSet(phrases: readonly string[], locale: Locale): Set<string> {
  const out = new Set<string>();
  for (const phrase of phrases) for (const stem of normaliseText(phrase, locale).stems) out.add(stem);
  return out;
}

function tokenSet(phrases: readonly string[], locale: Locale): Set<string> {
  const out = new Set<string>();
  for (const phrase of phrases) for (const token of normaliseText(phrase, locale).tokens) out.add(token);
  return out;
}

function compile(locale: Locale): CompiledLexicon {
  const lx = LEXICONS.get(locale);
  if (!lx) throw new Error(`The ${locale} answer words are not loaded: await loadAnswerWords('${locale}') first.`);
  const commandGroups: PhraseGroup<WordCategory>[] = (Object.keys(lx.commands) as SpokenCommand[]).map((command) => ({
    category: { kind: 'command', command },
    phrases: lx.commands[command],
  }));
  const languageGroups: PhraseGroup<WordCategory>[] = (Object.keys(lx.languages) as Locale[]).map((target) => ({
    category: { kind: 'language', locale: target },
    phrases: lx.languages[target],
  }));
  // Order settles ties between phrases of one length: a command beats a pass word ("hold").
  const words = new PhraseMatcher<WordCategory>(locale, [
    { category: { kind: 'filler' }, phrases: lx.fillers },
    { category: { kind: 'not_applicable' }, phrases: lx.notApplicable },
    { category: { kind: 'vague' }, phrases: lx.vague },
    { category: { kind: 'hedge' }, phrases: lx.hedges },
    ...commandGroups,
    ...languageGroups,
    { category: { kind: 'defect' }, phrases: lx.defect },
    { category: { kind: 'pass' }, phrases: lx.pass },
    { category: { kind: 'contrast' }, phrases: lx.contrast },
    { category: { kind: 'praise_negator' }, phrases: lx.praiseNegators },
    { category: { kind: 'negator', reach: 'determiner' }, phrases: lx.determinerNegators },
    { category: { kind: 'negator', reach: 'verbal' }, phrases: lx.verbalNegators },
    { category: { kind: 'post_negator' }, phrases: lx.postNegators },
    { category: { kind: 'conjunction' }, phrases: lx.conjunctions },
    { category: { kind: 'part' }, phrases: lx.parts },
    { category: { kind: 'neutral' }, phrases: lx.neutral },
  ]);
  const unitGroups = new Map<Unit, string[]>();
  for (const { phrase, unit } of lx.units) unitGroups.set(unit, [...(unitGroups.get(unit) ?? []), phrase]);
  const units = new PhraseMatcher<Unit>(
    locale,
    [...unitGroups.entries()].map(([unit, phrases]) => ({ category: unit, phrases })),
  );
  const homophoneTriggers = tokenSet(
    [
      ...lx.units.map((u) => u.phrase.split(' ')[0] ?? ''),
      'thirty',
      '32nds',
      '32nd',
      'sixteenths',
      'quarters',
      'quarter',
      'eighths',
      'and',
    ],
    locale,
  );
  return {
    locale,
    lexicon: lx,
    words,
    units,
    perMinute: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.perMinute }]),
    noLeak: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.noLeak }]),
    confirmation: new PhraseMatcher<'yes' | 'no'>(locale, [
      { category: 'no', phrases: lx.no },
      { category: 'yes', phrases: lx.yes },
    ]),
    defectMarkers: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.defectMarkers }]),
    courtesyTokens: tokenSet([...lx.courtesy, ...lx.acknowledgements], locale),
    acknowledgementTokens: tokenSet(lx.acknowledgements, locale),
    determinerGap: stemSet([...lx.determinerGap, ...lx.parts], locale),
    verbalGap: stemSet([...lx.verbalGap, ...lx.parts], locale),
    passGap: stemSet(lx.passGap, locale),
    verbalNegatorTokens: tokenSet([...lx.verbalNegators, ...lx.determinerNegators], locale),
    homophoneTriggers,
    corrections: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.corrections }]),
    fixes: new PhraseMatcher<'announce' | 'action'>(locale, [
      { category: 'announce', phrases: lx.fixAnnouncers },
      { category: 'action', phrases: lx.fixActions },
    ]),
    fixLeadIns: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.fixLeadIns }]),
    readingLeadInTokens: tokenSet(lx.readingLeadIns, locale),
    noGauge: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.noGauge }]),
    articleTokens: tokenSet(lx.articles, locale),
    signOffs: new PhraseMatcher<true>(locale, [{ category: true, phrases: lx.signOffs }]),
  };
}

const CACHE = new Map<Locale, CompiledLexicon>();

export function compiledLexicon(locale: Locale): CompiledLexicon {
  let compiled = CACHE.get(locale);
  if (!compiled) {
    compiled = compile(locale);
    CACHE.set(locale, compiled);
  }
  return compiled;
}
