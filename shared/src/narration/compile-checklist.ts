// What the scorer needs to know about a checklist, worked out once per checklist object.
import type { Checklist, ChecklistItem, Locale } from '../checklist/index.js';
import { BROAD_CONCEPTS, GENERIC_TITLE_WORDS } from './lexicon.js';
import { toTerms, type Term } from './phrases.js';
import { stemWord } from '../text/index.js';

export type AxleKind = 'steer' | 'drive' | 'tag' | 'trailer';
export type Side = 'left' | 'right';
export type Dual = 'inner' | 'outer';
export type End = 'front' | 'rear';

export interface CompiledAxle {
  axleIndex: number;
  kind: AxleKind;
}

export interface CompiledPoint {
  text: string;
  terms: string[];
  // How many of its terms must be heard: half, rounded up.
  need: number;
}

export interface CompiledItem {
  index: number;
  item: ChecklistItem;
  zoneIndex: number;
  unitIndex: number;
  axleIndex?: number;
  axleKind?: AxleKind;
  side?: Side;
  dual?: Dual;
  // For parts that are not at a wheel: "Front turn signals", "Trailer, rear".
  end?: End;
  points: CompiledPoint[];
}

// Items that are named by the same words: the scorer tells them apart by position and zone.
export interface SubjectGroup {
  terms: string[];
  members: number[];
}

export interface CompiledChecklist {
  locale: Locale;
  items: CompiledItem[];
  groups: SubjectGroup[];
  axlesByUnit: Map<number, CompiledAxle[]>;
  powerUnit?: number;
  trailerUnit?: number;
  // A term used by items of one unit only tells which unit the student is at ("kingpin").
  unitOfTerm: Map<string, number>;
  // Words of a zone's title ("in the cab"): saying them puts the student in that zone.
  zoneCues: { zoneIndex: number; terms: string[] }[];
}

const compiled = new WeakMap<Checklist, CompiledChecklist>();

// "Slack adjuster and push rod": naming either part names the item. A comma qualifies instead
// ("Air loss, brakes applied"): both sides must be said.
const TITLE_ALTERNATIVES = /\s+(?:and|y|e|&)\s+|\//;

function contentTerms(terms: readonly Term[]): string[] {
  return [...new Set(terms.filter((term) => !term.cue && term.term !== '').map((term) => term.term))].sort();
}

// What must be said to name a part: its trade concepts when it has any (other words may be left
// out: "oil level" names "Engine oil level"), else its words, without how-it-is-checked words.
function requiredTerms(content: readonly string[], generic: ReadonlySet<string>): string[] {
  const concepts = content.filter((term) => term.startsWith('#'));
  if (concepts.length > 0) {
    const specific = concepts.filter((term) => !BROAD_CONCEPTS.has(term));
    return specific.length > 0 ? specific : concepts;
  }
  const specific = content.filter((term) => !generic.has(term));
  return specific.length > 0 ? specific : [...content];
}

function subjectTerms(part: string, locale: Locale, generic: ReadonlySet<string>): { terms: string[]; cues: Term[] } {
  const { terms } = toTerms(part, locale);
  const cues = terms.filter((term) => term.cue);
  const required = requiredTerms(contentTerms(terms), generic);
  if (required.length > 0) return { terms: required, cues };
  // A title made only of position words: its cues are what must be said.
  return { terms: cues.map((term) => `~${JSON.stringify(term.cue)}`), cues };
}

function isConcept(term: string): boolean {
  return term.startsWith('#');
}

function endFromCues(terms: readonly Term[]): End | undefined {
  for (const term of terms) {
    if (term.cue?.type === 'ordinal' && term.cue.ordinal === 1) return 'front';
    if (term.cue?.type === 'ordinal' && term.cue.ordinal === 'last') return 'rear';
  }
  return undefined;
}

function sideFromCues(terms: readonly Term[]): Side | undefined {
  for (const term of terms) {
    if (term.cue?.type === 'side') return term.cue.side;
  }
  return undefined;
}

function axleKindOf(item: ChecklistItem, axleIndex: number, lowestAxle: number): AxleKind {
  const fromLimit = item.limitContext?.axle;
  if (fromLimit) return fromLimit;
  if (item.unitKind === 'trailer') return 'trailer';
  return axleIndex === lowestAxle ? 'steer' : 'drive';
}

function compile(checklist: Checklist): CompiledChecklist {
  const locale = checklist.locale;
  const generic = new Set(GENERIC_TITLE_WORDS[locale].map((word) => stemWord(word, locale)));
  const zoneIndex = new Map(checklist.zones.map((zone, index) => [zone.key, index]));

  const lowestAxle = new Map<number, number>();
  for (const item of checklist.items) {
    if (!item.position) continue;
    const current = lowestAxle.get(item.unitIndex);
    if (current === undefined || item.position.axleIndex < current)
      lowestAxle.set(item.unitIndex, item.position.axleIndex);
  }

  const axles = new Map<number, Map<number, AxleKind>>();
  const unitKinds = new Map<number, ChecklistItem['unitKind']>();
  const items: CompiledItem[] = [];
  const groupsByKey = new Map<string, SubjectGroup>();
  const unitsOfTerm = new Map<string, Set<number>>();

  const titleSubjects = checklist.items.map((item) =>
    item.title
      .split(TITLE_ALTERNATIVES)
      .map((part) => part.trim())
      .filter((part) => part !== '')
      .map((part) => subjectTerms(part, locale, generic))
      // "Hoses and leaks": a part without a trade word ("leaks") names nothing when another part has one.
      .filter((subject, _, all) => subject.terms.some(isConcept) || !all.some((other) => other.terms.some(isConcept))),
  );
  const titleConcepts = new Set(titleSubjects.flat().flatMap((subject) => subject.terms));

  const addToGroup = (terms: string[], index: number, unitIndex: number): void => {
    const key = terms.join(' ');
    const group = groupsByKey.get(key) ?? { terms, members: [] };
    if (!group.members.includes(index)) group.members.push(index);
    groupsByKey.set(key, group);
    // Only a part named on its own says where the student is ("kingpin"); a qualifier does not
    // ("brakes applied" is said at every wheel end too).
    if (terms.length !== 1) return;
    for (const term of terms) {
      const units = unitsOfTerm.get(term) ?? new Set<number>();
      units.add(unitIndex);
      unitsOfTerm.set(term, units);
    }
  };

  checklist.items.forEach((item, index) => {
    if (!unitKinds.has(item.unitIndex)) unitKinds.set(item.unitIndex, item.unitKind);
    const subjects = titleSubjects[index]!;
    const pointTerms = item.points.map((point) => toTerms(point, locale).terms);
    const compiledItem: CompiledItem = {
      index,
      item,
      zoneIndex: zoneIndex.get(item.zone) ?? checklist.zones.length,
      unitIndex: item.unitIndex,
      points: item.points.map((point, k) => {
        const terms = contentTerms(pointTerms[k]!);
        return { text: point, terms, need: Math.max(1, Math.ceil(terms.length / 2)) };
      }),
    };
    const titleCues = subjects.flatMap((subject) => subject.cues);
    if (item.position) {
      const kind = axleKindOf(item, item.position.axleIndex, lowestAxle.get(item.unitIndex) ?? 0);
      compiledItem.axleIndex = item.position.axleIndex;
      compiledItem.axleKind = kind;
      compiledItem.side = item.position.side;
      if (item.position.dual) compiledItem.dual = item.position.dual;
      const unitAxles = axles.get(item.unitIndex) ?? new Map<number, AxleKind>();
      unitAxles.set(item.position.axleIndex, kind);
      axles.set(item.unitIndex, unitAxles);
    } else {
      // "Left mirror", "Tractor, rear": a side or an end said in the title or the label counts.
      const labelCues = toTerms(item.positionLabel, locale).terms;
      const side = sideFromCues(titleCues) ?? sideFromCues(labelCues);
      const end = endFromCues(titleCues) ?? endFromCues(labelCues);
      if (side) compiledItem.side = side;
      if (end) compiledItem.end = end;
    }
    items.push(compiledItem);

    for (const subject of subjects) addToGroup(subject.terms, index, item.unitIndex);
    // A trade part named only in the points ("glad hands" for the trailer air lines) names the
    // item too, unless it is what another item is about.
    for (const terms of pointTerms) {
      for (const term of terms) {
        if (!term.cue && term.term.startsWith('#') && !BROAD_CONCEPTS.has(term.term) && !titleConcepts.has(term.term)) {
          addToGroup([term.term], index, item.unitIndex);
        }
      }
    }
  });

  const axlesByUnit = new Map<number, CompiledAxle[]>();
  for (const [unit, unitAxles] of axles) {
    axlesByUnit.set(
      unit,
      [...unitAxles.entries()]
        .map(([axleIndex, kind]) => ({ axleIndex, kind }))
        .sort((a, b) => a.axleIndex - b.axleIndex),
    );
  }
  const unitOfTerm = new Map<string, number>();
  if (unitKinds.size > 1) {
    for (const [term, units] of unitsOfTerm) {
      if (units.size === 1) unitOfTerm.set(term, [...units][0]!);
    }
  }
  const sortedUnits = [...unitKinds.entries()].sort((a, b) => a[0] - b[0]);
  const zoneCues = checklist.zones
    .flatMap((zone, index) =>
      zone.title
        .split(TITLE_ALTERNATIVES)
        .map((part) => ({ zoneIndex: index, terms: contentTerms(toTerms(part, locale).terms) })),
    )
    .filter((cue) => cue.terms.length > 0)
    // The longest title wins over a shorter one it contains.
    .sort((a, b) => b.terms.length - a.terms.length || a.zoneIndex - b.zoneIndex);
  const result: CompiledChecklist = {
    locale,
    items,
    groups: [...groupsByKey.values()],
    axlesByUnit,
    unitOfTerm,
    zoneCues,
  };
  const power = sortedUnits.find(([, kind]) => kind !== 'trailer');
  const trailer = sortedUnits.find(([, kind]) => kind === 'trailer');
  if (power) result.powerUnit = power[0];
  if (trailer) result.trailerUnit = trailer[0];
  return result;
}

export function compileChecklist(checklist: Checklist): CompiledChecklist {
  let result = compiled.get(checklist);
  if (!result) {
    result = compile(checklist);
    compiled.set(checklist, result);
  }
  return result;
}
