// Scores a practice walk-around that a student narrated freely against the checklist's items.
// The rules are written out in README.md beside this file.
import type { Checklist } from '../checklist/index.js';
import type { CueKind } from './lexicon.js';
import {
  compileChecklist,
  type AxleKind,
  type CompiledChecklist,
  type CompiledItem,
  type Dual,
  type Side,
  type SubjectGroup,
} from './compile-checklist.js';
import { toTerms } from './phrases.js';
import type {
  CoverageCounts,
  NarratedItem,
  NarrationScore,
  NarrationSegment,
  NarrationStatus,
  OutOfOrderItem,
  ZoneCoverage,
} from './types.js';

interface StreamToken {
  term: string;
  cue?: CueKind;
  plural: boolean;
  segment: number;
  timeMs: number;
}

// A cue placed in the stream; unit cues implied by a part ("kingpin") are weaker than said ones.
interface PlacedCue {
  position: number;
  cue: ResolvedCue;
  implied: boolean;
}

type ResolvedCue =
  | { type: 'side'; side: Side }
  | { type: 'unit'; unit: number }
  | { type: 'axle_kind'; axle: 'steer' | 'drive' | 'trailer' }
  | { type: 'ordinal'; ordinal: number | 'last' }
  | { type: 'axle_number'; axleNumber: number }
  | { type: 'dual'; dual: Dual };

interface PositionState {
  unit?: number;
  axleKind?: 'steer' | 'drive' | 'trailer';
  ordinal?: number | 'last';
  axleNumber?: number;
  side?: Side;
  dual?: Dual;
}

type Attribute = keyof PositionState;

interface Segment {
  source: NarrationSegment;
  firstToken: number;
  endToken: number;
  cues: PlacedCue[];
  // Said "both", "all", "duals": a mention may cover both sides or both tires of a dual.
  both: boolean;
  terms: Set<string>;
  // A zone the student named ("in the cab", "coupling").
  zone?: number;
}

interface Occurrence {
  group: number;
  start: number;
  end: number;
}

interface PartCredit {
  status: NarrationStatus;
  timeMs: number;
  segment: number;
}

// Terms of one subject must lie within this many terms of each other (and at most one segment apart).
const SUBJECT_SPAN_TERMS = 8;
// The student has moved on to a zone once this many of its items are named: one stray mention of
// a later part ("secure to the frame" at the coupling) does not move them.
const ITEMS_TO_ENTER_ZONE = 2;
// A point counts when said in the mention's segment or the next one.
const POINT_SEGMENTS_AFTER = 1;

function resolveCue(cue: CueKind, compiled: CompiledChecklist): ResolvedCue | null {
  switch (cue.type) {
    case 'side':
      return { type: 'side', side: cue.side };
    case 'unit': {
      const unit = cue.unit === 'power' ? compiled.powerUnit : compiled.trailerUnit;
      return unit === undefined ? null : { type: 'unit', unit };
    }
    case 'axle_kind':
      return { type: 'axle_kind', axle: cue.axle };
    case 'ordinal':
      return { type: 'ordinal', ordinal: cue.ordinal };
    case 'dual':
      return { type: 'dual', dual: cue.dual };
    case 'both':
    case 'axle_word':
    case 'filler':
      return null;
  }
}

function buildStream(
  segments: readonly NarrationSegment[],
  compiled: CompiledChecklist,
): { tokens: StreamToken[]; segments: Segment[] } {
  const ordered = segments
    .map((segment, index) => ({ segment, index }))
    .sort((a, b) => a.segment.startMs - b.segment.startMs || a.index - b.index)
    .map(({ segment }) => segment);
  const tokens: StreamToken[] = [];
  const built: Segment[] = [];
  ordered.forEach((source, segmentIndex) => {
    const { terms, wordCount } = toTerms(source.text, compiled.locale);
    const durationMs = Math.max(0, source.endMs - source.startMs);
    const segment: Segment = {
      source,
      firstToken: tokens.length,
      endToken: tokens.length,
      cues: [],
      both: false,
      terms: new Set(),
    };
    terms.forEach((term, k) => {
      const position = tokens.length;
      const timeMs = source.startMs + (wordCount > 0 ? (durationMs * term.wordIndex) / wordCount : 0);
      const token: StreamToken = { term: term.term, plural: term.plural, segment: segmentIndex, timeMs };
      if (term.cue) {
        token.cue = term.cue;
        if (term.cue.type === 'both') segment.both = true;
        const next = terms[k + 1];
        // "axle two", "eje 2": a number right after the axle word counts the unit's axles from the front.
        if (term.cue.type === 'axle_word' && next && !next.cue && /^\d+$/.test(next.term)) {
          segment.cues.push({ position, cue: { type: 'axle_number', axleNumber: Number(next.term) }, implied: false });
        }
        // "trailer axle 2", "drive axle 1": counted among the axles of that kind.
        const resolvedKind = term.cue.type === 'axle_kind' ? resolveCue(term.cue, compiled) : null;
        if (resolvedKind && next && !next.cue && /^\d+$/.test(next.term)) {
          segment.cues.push({ position, cue: resolvedKind, implied: false });
          segment.cues.push({ position, cue: { type: 'ordinal', ordinal: Number(next.term) }, implied: false });
          tokens.push(token);
          return;
        }
        const resolved = resolveCue(term.cue, compiled);
        if (resolved) segment.cues.push({ position, cue: resolved, implied: false });
      } else {
        segment.terms.add(term.term);
        const unit = compiled.unitOfTerm.get(term.term);
        if (unit !== undefined) segment.cues.push({ position, cue: { type: 'unit', unit }, implied: true });
      }
      tokens.push(token);
    });
    segment.endToken = tokens.length;
    // "outer and inner tires" in one breath covers both tires of the dual.
    const duals = new Set(segment.cues.flatMap((placed) => (placed.cue.type === 'dual' ? [placed.cue.dual] : [])));
    if (duals.size > 1) {
      segment.both = true;
      segment.cues = segment.cues.filter((placed) => placed.cue.type !== 'dual');
    }
    const namedZone = compiled.zoneCues.find((cue) => cue.terms.every((term) => segment.terms.has(term)));
    if (namedZone) segment.zone = namedZone.zoneIndex;
    // A part that belongs to one unit says where the student is only when no unit was said.
    if (segment.cues.some((cue) => (cue.cue.type === 'unit' || cue.cue.type === 'axle_kind') && !cue.implied)) {
      segment.cues = segment.cues.filter((cue) => !cue.implied);
    }
    built.push(segment);
  });
  return { tokens, segments: built };
}

function unitOfAxleKind(kind: 'steer' | 'drive' | 'trailer', compiled: CompiledChecklist): number | undefined {
  return kind === 'trailer' ? compiled.trailerUnit : compiled.powerUnit;
}

// Applies one cue. What was said earlier in the same segment is never cleared by a later cue
// ("front tire on the right" keeps "front"); what was carried from before is.
function clear(state: PositionState, setHere: ReadonlySet<Attribute>, attributes: readonly Attribute[]): void {
  for (const attribute of attributes) if (!setHere.has(attribute)) delete state[attribute];
}

const BELOW_SIDE: readonly Attribute[] = ['axleKind', 'ordinal', 'axleNumber', 'dual'];
const BELOW_AXLE_KIND: readonly Attribute[] = ['ordinal', 'axleNumber', 'dual'];
const BELOW_ORDINAL: readonly Attribute[] = ['axleKind', 'axleNumber', 'dual'];
const BELOW_AXLE_NUMBER: readonly Attribute[] = ['axleKind', 'ordinal', 'dual'];

function applyCue(state: PositionState, setHere: Set<Attribute>, cue: ResolvedCue, compiled: CompiledChecklist): void {
  switch (cue.type) {
    case 'side':
      // Walking to the other side means a new wheel end.
      if (state.side !== cue.side) clear(state, setHere, BELOW_SIDE);
      state.side = cue.side;
      setHere.add('side');
      return;
    case 'unit':
      if (state.unit !== cue.unit) clear(state, setHere, BELOW_SIDE);
      state.unit = cue.unit;
      setHere.add('unit');
      return;
    case 'axle_kind': {
      clear(state, setHere, BELOW_AXLE_KIND);
      state.axleKind = cue.axle;
      setHere.add('axleKind');
      const unit = unitOfAxleKind(cue.axle, compiled);
      if (unit !== undefined && !setHere.has('unit')) {
        state.unit = unit;
        setHere.add('unit');
      }
      return;
    }
    case 'ordinal':
      clear(state, setHere, BELOW_ORDINAL);
      state.ordinal = cue.ordinal;
      setHere.add('ordinal');
      return;
    case 'axle_number':
      clear(state, setHere, BELOW_AXLE_NUMBER);
      state.axleNumber = cue.axleNumber;
      setHere.add('axleNumber');
      return;
    case 'dual':
      state.dual = cue.dual;
      setHere.add('dual');
      return;
  }
}

const CUE_ATTRIBUTE: Record<ResolvedCue['type'], Attribute> = {
  side: 'side',
  unit: 'unit',
  axle_kind: 'axleKind',
  ordinal: 'ordinal',
  axle_number: 'axleNumber',
  dual: 'dual',
};

// The position a mention ending at `position` refers to: the carried position, then this segment's
// cues before the mention, then its cues after the mention for what is still unsaid in the segment.
interface MentionPosition {
  state: PositionState;
  // What of it was said in this segment rather than carried from before.
  saidHere: ReadonlySet<Attribute>;
}

function stateAt(
  carried: PositionState,
  segment: Segment,
  position: number,
  compiled: CompiledChecklist,
): MentionPosition {
  const state: PositionState = { ...carried };
  const setHere = new Set<Attribute>();
  for (const placed of segment.cues) {
    if (placed.position <= position) applyCue(state, setHere, placed.cue, compiled);
  }
  const saidBefore = new Set(setHere);
  for (const placed of segment.cues) {
    if (placed.position > position && !saidBefore.has(CUE_ATTRIBUTE[placed.cue.type]))
      applyCue(state, setHere, placed.cue, compiled);
  }
  return { state, saidHere: setHere };
}

function stateAfter(carried: PositionState, segment: Segment, compiled: CompiledChecklist): PositionState {
  const state: PositionState = { ...carried };
  const setHere = new Set<Attribute>();
  for (const placed of segment.cues) applyCue(state, setHere, placed.cue, compiled);
  return state;
}

function kindMatches(wanted: 'steer' | 'drive' | 'trailer', kind: AxleKind): boolean {
  return wanted === kind || (wanted === 'drive' && kind === 'tag');
}

// The axles of a unit the state points at, or null when it says nothing about the axle.
function selectAxles(state: PositionState, unit: number, compiled: CompiledChecklist): number[] | null {
  const axles = compiled.axlesByUnit.get(unit) ?? [];
  if (state.axleNumber !== undefined) {
    const axle = axles[state.axleNumber - 1];
    return axle ? [axle.axleIndex] : [];
  }
  if (state.axleKind === undefined && state.ordinal === undefined) return null;
  const wanted = state.axleKind;
  const ofKind = wanted === undefined ? axles : axles.filter((axle) => kindMatches(wanted, axle.kind));
  if (state.ordinal === undefined) return ofKind.map((axle) => axle.axleIndex);
  const picked = state.ordinal === 'last' ? ofKind[ofKind.length - 1] : ofKind[state.ordinal - 1];
  return picked ? [picked.axleIndex] : [];
}

function endOf(state: PositionState): 'front' | 'rear' | undefined {
  if (state.ordinal === 1) return 'front';
  if (state.ordinal === 'last') return 'rear';
  return undefined;
}

// How well an item fits the position: null when it contradicts it, else how many of the
// attributes said right here it matches (the most specific fit wins: "left steer air lines" is the
// brake's, not the engine's hoses). A carried position only rules items out.
function fit(item: CompiledItem, position: MentionPosition, compiled: CompiledChecklist): number | null {
  const { state, saidHere } = position;
  let score = 0;
  if (state.unit !== undefined) {
    if (state.unit !== item.unitIndex) return null;
    score += saidHere.has('unit') ? 1 : 0;
  }
  if (item.axleIndex !== undefined) {
    // "Front tire" with no unit said is the power unit's steer tire, not the trailer's first axle.
    const frontOnly =
      state.unit === undefined && state.axleKind === undefined && state.axleNumber === undefined && state.ordinal === 1;
    if (frontOnly && compiled.powerUnit !== undefined && item.unitIndex !== compiled.powerUnit) return null;
    const selected = selectAxles(state, item.unitIndex, compiled);
    if (selected !== null) {
      if (!selected.includes(item.axleIndex)) return null;
      score += saidHere.has('axleKind') || saidHere.has('ordinal') || saidHere.has('axleNumber') ? 1 : 0;
    }
  }
  if (item.side !== undefined && state.side !== undefined) {
    if (state.side !== item.side) return null;
    score += saidHere.has('side') ? 1 : 0;
  }
  if (item.dual !== undefined && state.dual !== undefined) {
    if (state.dual !== item.dual) return null;
    score += saidHere.has('dual') ? 1 : 0;
  }
  // "Front" carried from "right front tire" is about an axle; only a front or rear said right here
  // tells the vehicle's ends apart ("rear turn signals").
  const end = endOf(state);
  if (item.end !== undefined && end !== undefined && item.axleIndex === undefined && saidHere.has('ordinal')) {
    if (end !== item.end) return null;
    score++;
  }
  return score;
}

function bestFits(members: readonly number[], state: MentionPosition, compiled: CompiledChecklist): number[] {
  let best = -1;
  let result: number[] = [];
  for (const member of members) {
    const score = fit(compiled.items[member]!, state, compiled);
    if (score === null || score < best) continue;
    if (score > best) {
      best = score;
      result = [];
    }
    result.push(member);
  }
  return result;
}

function allShare<T>(values: readonly T[]): boolean {
  return values.every((value) => value === values[0]);
}

// One mention covers several items when the student said so: "left drive tires" (plural, one
// side, one axle kind) or "both steer tires" (one axle kind).
function coversAll(items: readonly CompiledItem[], plural: boolean, both: boolean): boolean {
  const sameUnitAndAxleKind =
    allShare(items.map((item) => item.unitIndex)) && allShare(items.map((item) => item.axleKind));
  const sameSide = allShare(items.map((item) => item.side));
  return sameUnitAndAxleKind && ((plural && sameSide) || both);
}

// Which items a mention names outright, and which it only partly credits.
function judgeMention(
  group: SubjectGroup,
  state: MentionPosition,
  // The position from this segment's words alone, worked out only when needed.
  localState: () => MentionPosition,
  saidHere: boolean,
  plural: boolean,
  both: boolean,
  currentZone: number | null,
  compiled: CompiledChecklist,
): { named: number[]; partly: number[] } {
  const itemOf = (member: number): CompiledItem => compiled.items[member]!;
  let candidates = bestFits(group.members, state, compiled);
  let stale = false;
  if (candidates.length === 0) {
    // What the student carried from before disagrees: a mention is never lost to stale context,
    // but without a position said here it can only partly credit.
    candidates = bestFits(group.members, localState(), compiled);
    stale = true;
  }
  if (candidates.length === 0) return { named: [], partly: [] };
  // Covering several at once needs the position said right there, not only carried from before.
  if (!stale && (candidates.length === 1 || (saidHere && coversAll(candidates.map(itemOf), plural, both)))) {
    return { named: candidates, partly: [] };
  }
  if (currentZone === null) return { named: [], partly: candidates };
  // Zone context: the student is in the zone of what they last named, or moving on to the next.
  const near = candidates.filter((member) => {
    const zone = itemOf(member).zoneIndex;
    return zone === currentZone || zone === currentZone + 1;
  });
  if (near.length === 0) return { named: [], partly: [] };
  // Unique where the student stands, and not a wheel end left unsaid: "hoses" at the engine.
  const onlyOne = near.length === 1 && itemOf(near[0]!).axleIndex === undefined;
  if (!stale && onlyOne) return { named: near, partly: [] };
  return { named: [], partly: near };
}

function lowerBound(values: readonly number[], target: number): number {
  let low = 0;
  let high = values.length;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (values[middle]! < target) low = middle + 1;
    else high = middle;
  }
  return low;
}

function findOccurrences(compiled: CompiledChecklist, tokens: readonly StreamToken[]): Occurrence[] {
  const positions = new Map<string, number[]>();
  tokens.forEach((token, position) => {
    if (token.cue) return;
    const list = positions.get(token.term);
    if (list) list.push(position);
    else positions.set(token.term, [position]);
  });
  const occurrences: Occurrence[] = [];
  compiled.groups.forEach((group, groupIndex) => {
    const lists = group.terms.map((term) => positions.get(term) ?? []);
    if (lists.some((list) => list.length === 0)) return;
    const anchorIndex = lists.reduce((best, list, index) => (list.length < lists[best]!.length ? index : best), 0);
    let lastEnd = -1;
    for (const anchor of lists[anchorIndex]!) {
      let start = anchor;
      let end = anchor;
      let complete = true;
      for (const list of lists) {
        // The nearest use of each other term around the anchor.
        const at = lowerBound(list, anchor);
        const after = list[at];
        const before = list[at - 1];
        const nearest =
          after === undefined
            ? before
            : before === undefined
              ? after
              : anchor - before <= after - anchor
                ? before
                : after;
        if (
          nearest === undefined ||
          Math.abs(nearest - anchor) > SUBJECT_SPAN_TERMS ||
          Math.abs(tokens[nearest]!.segment - tokens[anchor]!.segment) > 1
        ) {
          complete = false;
          break;
        }
        start = Math.min(start, nearest);
        end = Math.max(end, nearest);
      }
      if (complete && end !== lastEnd) {
        occurrences.push({ group: groupIndex, start, end });
        lastEnd = end;
      }
    }
  });
  return occurrences.sort((a, b) => a.end - b.end || a.start - b.start || a.group - b.group);
}

function coverage(statuses: readonly NarrationStatus[]): CoverageCounts {
  const named = statuses.filter((status) => status === 'named').length;
  const partly = statuses.filter((status) => status === 'partly').length;
  const itemCount = statuses.length;
  return {
    itemCount,
    named,
    partly,
    missed: itemCount - named - partly,
    namedFraction: itemCount === 0 ? 0 : named / itemCount,
    creditFraction: itemCount === 0 ? 0 : (named + partly / 2) / itemCount,
  };
}

function pointsHeard(item: CompiledItem, mentionSegments: ReadonlySet<number>, segments: readonly Segment[]): string[] {
  const heard: string[] = [];
  for (const point of item.points) {
    if (point.terms.length === 0) continue;
    for (const first of mentionSegments) {
      let count = 0;
      for (const term of point.terms) {
        for (let s = first; s <= first + POINT_SEGMENTS_AFTER && s < segments.length; s++) {
          if (segments[s]!.terms.has(term)) {
            count++;
            break;
          }
        }
      }
      if (count >= point.need) {
        heard.push(point.text);
        break;
      }
    }
  }
  return heard;
}

// Out of route order: named while the student had already moved on to a later zone.
function findOutOfOrder(
  items: readonly NarratedItem[],
  compiled: CompiledChecklist,
  checklist: Checklist,
): OutOfOrderItem[] {
  const named = items
    .map((item, index) => ({ item, index, zoneIndex: compiled.items[index]!.zoneIndex }))
    .filter((entry) => entry.item.status === 'named' && entry.item.firstNamedMs !== null)
    .sort((a, b) => a.item.firstNamedMs! - b.item.firstNamedMs! || a.index - b.index);
  const namedInZone = new Map<number, string[]>();
  const result: OutOfOrderItem[] = [];
  let reachedZone = -1;
  for (const { item, zoneIndex } of named) {
    if (zoneIndex < reachedZone) {
      result.push({
        itemKey: item.itemKey,
        zone: item.zone,
        firstNamedMs: item.firstNamedMs!,
        afterZone: checklist.zones[reachedZone]?.key ?? '',
        afterItemKey: namedInZone.get(reachedZone)?.[0] ?? '',
      });
    }
    const keys = namedInZone.get(zoneIndex) ?? [];
    keys.push(item.itemKey);
    namedInZone.set(zoneIndex, keys);
    if (keys.length >= ITEMS_TO_ENTER_ZONE) reachedZone = Math.max(reachedZone, zoneIndex);
  }
  return result;
}

export function scoreNarration(segments: readonly NarrationSegment[], checklist: Checklist): NarrationScore {
  const compiled = compileChecklist(checklist);
  const { tokens, segments: stream } = buildStream(segments, compiled);
  const occurrences = findOccurrences(compiled, tokens);

  const credits = new Array<PartCredit | undefined>(compiled.items.length).fill(undefined);
  const mentionSegments = compiled.items.map(() => new Set<number>());
  let carried: PositionState = {};
  let currentZone: number | null = null;
  let next = 0;
  stream.forEach((segment, segmentIndex) => {
    // Mentions ending on the same word share the position.
    const states = new Map<number, MentionPosition>();
    const saidHere = segment.cues.some((placed) => !placed.implied);
    if (segment.zone !== undefined) currentZone = segment.zone;
    while (next < occurrences.length && occurrences[next]!.end < segment.endToken) {
      const occurrence = occurrences[next++]!;
      const group = compiled.groups[occurrence.group]!;
      let state: MentionPosition | undefined = states.get(occurrence.end);
      if (!state) {
        state = stateAt(carried, segment, occurrence.end, compiled);
        states.set(occurrence.end, state);
      }
      const end = occurrence.end;
      const localState = (): MentionPosition => stateAt({}, segment, end, compiled);
      let plural = false;
      for (let p = occurrence.start; p <= occurrence.end; p++) {
        const token = tokens[p]!;
        plural ||= token.plural && group.terms.includes(token.term);
      }
      const { named, partly } = judgeMention(
        group,
        state,
        localState,
        saidHere,
        plural,
        segment.both,
        currentZone,
        compiled,
      );
      const timeMs = tokens[occurrence.start]!.timeMs;
      const mentionSegment = tokens[occurrence.start]!.segment;
      for (const [members, status] of [
        [named, 'named'],
        [partly, 'partly'],
      ] as const) {
        for (const member of members) {
          const previous = credits[member];
          if (!previous || (previous.status === 'partly' && status === 'named')) {
            credits[member] = { status, timeMs, segment: segmentIndex };
          }
          mentionSegments[member]!.add(mentionSegment);
        }
      }
      const firstNamed = [...named].sort((a, b) => a - b)[0];
      if (firstNamed !== undefined) currentZone = compiled.items[firstNamed]!.zoneIndex;
    }
    carried = stateAfter(carried, segment, compiled);
  });

  const items: NarratedItem[] = compiled.items.map((item, index) => {
    // The first mention that earned the item its final status.
    const earning = credits[index];
    const status: NarrationStatus = earning?.status ?? 'missed';
    const heard = pointsHeard(item, mentionSegments[index]!, stream);
    return {
      itemKey: item.item.key,
      zone: item.item.zone,
      status,
      firstNamedMs: earning ? earning.timeMs : null,
      heardIn: earning ? stream[earning.segment]!.source.text : null,
      pointsHeard: heard,
      pointsMissed: item.points.map((point) => point.text).filter((text) => !heard.includes(text)),
    };
  });

  const zones: ZoneCoverage[] = checklist.zones.map((zone) => ({
    zone: zone.key,
    title: zone.title,
    ...coverage(items.filter((item) => item.zone === zone.key).map((item) => item.status)),
  }));
  return {
    locale: checklist.locale,
    items,
    zones,
    overall: coverage(items.map((item) => item.status)),
    outOfOrder: findOutOfOrder(items, compiled, checklist),
  };
}
