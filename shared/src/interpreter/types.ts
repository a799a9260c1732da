// What the interpreter hears and what it decides the driver meant.
import type { Expectation, Locale } from '../checklist/index.js';
import type { CanonicalUnit, Quantity, Unit } from '../units/index.js';

// One hypothesis of the recogniser, best first unless confidences say otherwise.
export interface Alternative {
  transcript: string;
  confidence?: number;
}

export const COMMANDS = [
  'repeat',
  'back',
  'skip',
  'pause',
  'resume',
  'note',
  'end_note',
  'help',
  'where',
  'finish',
  // Walk the current stop item by item.
  'one_by_one',
  'language',
] as const;
export type Command = (typeof COMMANDS)[number];

export const UNCLEAR_REASONS = [
  // Nothing was heard, or only hesitation.
  'empty',
  'filler',
  // Words that carry no answer the interpreter knows.
  'not_understood',
  // "maybe", "not sure", "más o menos".
  'hedged',
  // "not bad": neither a pass nor a problem.
  'vague',
  // "good but...": a contrast with nothing after it.
  'incomplete',
  // A lone "no": no problem, or not good?
  'ambiguous',
  // The hypotheses disagree between a pass and a problem, or between values.
  'disagreement',
  // A measure item answered "good" without a value.
  'value_needed',
  // A check item answered with a bare number.
  'number_for_check',
  // Two different values in one answer.
  'several_values',
  // A value with no unit where the item cannot imply one.
  'unit_needed',
  // A unit that does not measure this quantity (degrees for steering lash).
  'unit_mismatch',
  // A value far outside any sensible range for the quantity.
  'implausible',
  // At a stop: a value or "n/a" that could belong to more than one item, or to none named.
  'item_needed',
] as const;
export type UnclearReason = (typeof UNCLEAR_REASONS)[number];

export interface SpokenMeasurement<Q extends Quantity = Quantity> {
  quantity: Q;
  // In the quantity's canonical unit, rounded to 4 decimals.
  value: number;
  unit: CanonicalUnit<Q>;
  // As the driver said it, so the read-back repeats their words ("four millimetres").
  said: { value: number; unit: Unit };
}

interface Heard {
  // The hypothesis the interpretation came from.
  heard: string;
  confidence?: number;
}

// "Fixed", "corrected, added air, now one ten": the last defect was corrected on the spot.
export interface SpokenFix {
  // What was done, in the driver's words, without the word that announced the fix ("added air").
  action: string;
  measurement?: SpokenMeasurement;
}

export type Interpretation =
  // A pass on a measured check without a value is a pass checked without a reading.
  | ({ kind: 'answer'; answer: 'pass' | 'not_applicable' } & Heard)
  | ({ kind: 'answer'; answer: 'defect'; detail?: string } & Heard)
  | ({ kind: 'measurement'; measurement: SpokenMeasurement } & Heard)
  | ({ kind: 'command'; command: Exclude<Command, 'language'> } & Heard)
  | ({ kind: 'command'; command: 'language'; locale: Locale } & Heard)
  | ({ kind: 'fixed' } & SpokenFix & Heard)
  // "No gauge": a required reading the driver could not take.
  | ({ kind: 'no_gauge' } & Heard)
  | ({ kind: 'unclear'; reason: UnclearReason } & Partial<Heard>);

// An item of a stop as the interpreter needs it: its key, the words that point at it, what it expects.
export interface StopItemRef {
  key: string;
  names: readonly string[];
  expects: Expectation;
}

// What one answer at a stop says of each of its items. Items not marked pass ("good", "good except
// the hub is leaking", "defect, chafed air line" all pass the items they do not name).
export type StopMark =
  | { itemKey: string; answer: 'defect'; detail: string }
  | { itemKey: string; answer: 'not_applicable' }
  | { itemKey: string; answer: 'measurement'; measurement: SpokenMeasurement };

export type StopInterpretation =
  | ({ kind: 'stop'; marks: StopMark[] } & Heard)
  // A problem the answer does not tie to one item: candidates are the items it might be (none, or several).
  | ({ kind: 'which'; detail: string; candidates: string[] } & Heard)
  | ({ kind: 'fixed' } & SpokenFix & Heard)
  | ({ kind: 'command'; command: Exclude<Command, 'language'> } & Heard)
  | ({ kind: 'command'; command: 'language'; locale: Locale } & Heard)
  | ({ kind: 'unclear'; reason: UnclearReason } & Partial<Heard>);

export type ConfirmationResult =
  | ({ kind: 'confirm' } & Heard)
  // A correction, with the new value when the driver said one ("no, six").
  | ({ kind: 'correct'; measurement?: SpokenMeasurement } & Heard)
  | ({ kind: 'command'; command: Exclude<Command, 'language'> } & Heard)
  | ({ kind: 'unclear'; reason: UnclearReason } & Partial<Heard>);
