// Reads a spoken measurement: the number, the unit said or implied by the item, and whether it is plausible.
import type { Locale } from '../checklist/index.js';
import { findNumbers, type NumberForm, type NumberOptions, type NumberSpan } from '../numbers/index.js';
import { stemWord, type NormalisedText } from '../text/index.js';
import { canonicalUnitOf, toCanonical, UNITS, unitFits, type Quantity, type Unit } from '../units/index.js';
import type { CompiledLexicon } from './compiled-lexicon.js';
import type { SpokenMeasurement, UnclearReason } from './types.js';

// Values outside these are misheard, not measured. Deliberately wide: the limits judge, this only
// catches nonsense such as a 90/32 tread. All are common practice, from memory, not published limits.
export const PLAUSIBLE_RANGES: Readonly<Record<Quantity, { min: number; max: number }>> = {
  tread_depth: { min: 0, max: 32 }, // in/32; new truck drive tires are about 26-32/32 (from memory)
  tire_pressure: { min: 0, max: 175 }, // psi; truck tires run about 100-120, sidewall maxima rarely pass 130
  air_pressure: { min: 0, max: 200 }, // psi; relief valves open about 150 (CDL manual, from memory)
  lining_thickness: { min: 0, max: 1.5 }, // in; new drum linings are about 3/4 in (from memory)
  pushrod_stroke: { min: 0, max: 4 }, // in; long-stroke chambers are rated to 3 in (49 CFR 393.47(e))
  steering_lash: { min: 0, max: 10 }, // in; limits run 2-5-3/4 in (49 CFR 393.209)
  slack_angle: { min: 0, max: 180 }, // degrees; about 90 when applied (common practice)
  leak_rate: { min: 0, max: 30 }, // psi/min; limits are 2-4 psi/min (CDL manual section 5)
};

const LENGTHS: ReadonlySet<Quantity> = new Set(['tread_depth', 'lining_thickness', 'pushrod_stroke', 'steering_lash']);
const PRESSURES: ReadonlySet<Quantity> = new Set(['tire_pressure', 'air_pressure']);

export function numberOptionsFor(quantity: Quantity): NumberOptions {
  return { gauge: PRESSURES.has(quantity), bareDenominators: LENGTHS.has(quantity) };
}

function saysNumber(tokens: readonly string[], quantity: Quantity, lx: CompiledLexicon): boolean {
  return findNumbers(applyHomophones(tokens, lx), lx.locale, numberOptionsFor(quantity)).some((span) => !span.article);
}

// Where the value to read starts: after the last word that takes back a value said before it
// ("one ten, no, one twelve", "seis, digo siete"); 0 when nothing was taken back.
export function correctedFrom(text: NormalisedText, quantity: Quantity, lx: CompiledLexicon): number {
  let from = 0;
  for (let i = 0; i < text.tokens.length; i += 1) {
    const match = lx.corrections.matchAt(text, i);
    if (!match) continue;
    if (
      saysNumber(text.tokens.slice(from, match.start), quantity, lx) &&
      saysNumber(text.tokens.slice(match.end), quantity, lx)
    ) {
      from = match.end;
    }
    i = match.end - 1;
  }
  return from;
}
const PER_MINUTE: Partial<Record<Unit, Unit>> = { psi: 'psi/min', bar: 'bar/min', kPa: 'kPa/min' };

export type MeasurementReading =
  // `unitSaid`: the driver named the unit, so the value cannot belong to another quantity.
  | { kind: 'measurement'; measurement: SpokenMeasurement; unitSaid: boolean; form: NumberForm }
  | { kind: 'unclear'; reason: UnclearReason }
  | { kind: 'none' };

interface Reading {
  value: number;
  form: NumberSpan['form'];
  denominator?: number;
  unit?: Unit;
  perMinute: boolean;
}

function rebuild(tokens: string[], locale: Locale): NormalisedText {
  return {
    tokens,
    surface: tokens,
    stems: tokens.map((t) => stemWord(t, locale)),
    pauseAfter: tokens.map(() => false),
  };
}

// Replaces misheard number words only where a fraction word or unit follows: "for thirty seconds".
export function applyHomophones(tokens: readonly string[], lx: CompiledLexicon): string[] {
  return tokens.map((token, i) => {
    const replacement = lx.lexicon.homophones[token];
    const next = tokens[i + 1];
    return replacement !== undefined && next !== undefined && lx.homophoneTriggers.has(next) ? replacement : token;
  });
}

function unitAfter(
  text: NormalisedText,
  at: number,
  lx: CompiledLexicon,
): { unit?: Unit; end: number; perMinute: boolean } {
  let i = at;
  let unit: Unit | undefined;
  const match = lx.units.matchAt(text, i);
  if (match) {
    unit = match.category;
    i = match.end;
  }
  const rate = lx.perMinute.matchAt(text, i);
  return unit === undefined
    ? { end: rate ? rate.end : at, perMinute: rate !== undefined }
    : { unit, end: rate ? rate.end : i, perMinute: rate !== undefined };
}

const AND_WORDS: ReadonlySet<string> = new Set(['and', 'y', 'n']);

// A unit phrase that ends just before `end` (exclusive of it): "inch" in "inch and a half".
function unitEndingAt(
  text: NormalisedText,
  endIndex: number,
  lx: CompiledLexicon,
): { unit: Unit; start: number } | undefined {
  for (let start = Math.max(0, endIndex - 3); start < endIndex; start += 1) {
    const match = lx.units.matchAt(text, start);
    if (match && match.end === endIndex) return { unit: match.category, start };
  }
  return undefined;
}

function impliedUnit(quantity: Quantity, reading: Reading): Unit | UnclearReason {
  const fractional = reading.form === 'fraction' || reading.form === 'mixed';
  switch (quantity) {
    case 'tread_depth':
      // A bare number is thirty-seconds ("tread's at six"); a fraction of an inch is inches ("a quarter").
      if (reading.form === 'fraction' || (reading.form === 'decimal' && reading.value < 1)) return 'in';
      return 'in/32';
    case 'lining_thickness':
      if (fractional || reading.form === 'decimal') return 'in';
      return 'unit_needed';
    case 'pushrod_stroke':
    case 'steering_lash':
      return 'in';
    case 'tire_pressure':
    case 'air_pressure':
      return 'psi';
    case 'slack_angle':
      return 'deg';
    case 'leak_rate':
      return 'psi/min';
  }
}

function isUnit(value: string): value is Unit {
  return (UNITS as readonly string[]).includes(value);
}

function round4(value: number): number {
  return Math.round(value * 10_000) / 10_000;
}

export function readMeasurement(
  tokens: readonly string[],
  quantity: Quantity,
  locale: Locale,
  lx: CompiledLexicon,
): MeasurementReading {
  const text = rebuild(applyHomophones(tokens, lx), locale);
  const spans = findNumbers(text.tokens, locale, numberOptionsFor(quantity));
  const readings: Reading[] = [];
  let consumedUntil = 0;
  for (let s = 0; s < spans.length; s += 1) {
    const span = spans[s];
    if (!span || span.start < consumedUntil) continue;
    const after = unitAfter(text, span.end, lx);
    consumedUntil = after.end;
    // "inch and a half", "pulgada y media": the one is left unsaid.
    const unitBefore = unitEndingAt(text, span.start - 1, lx);
    const andBefore = text.tokens[span.start - 1];
    if (
      span.form === 'fraction' &&
      span.value < 1 &&
      andBefore !== undefined &&
      AND_WORDS.has(andBefore) &&
      unitBefore &&
      !spans.some((other) => other.end === unitBefore.start)
    ) {
      readings.push({ value: 1 + span.value, form: 'mixed', unit: unitBefore.unit, perMinute: after.perMinute });
      continue;
    }
    // "an inch and a half", "dos pulgadas y media".
    const next = spans[s + 1];
    const and = text.tokens[after.end];
    if (
      after.unit !== undefined &&
      next &&
      and !== undefined &&
      AND_WORDS.has(and) &&
      next.start === after.end + 1 &&
      next.form === 'fraction' &&
      next.value < 1 &&
      (span.form === 'integer' || span.article)
    ) {
      readings.push({ value: span.value + next.value, form: 'mixed', unit: after.unit, perMinute: after.perMinute });
      s += 1;
      consumedUntil = next.end;
      continue;
    }
    if (span.article && after.unit === undefined) continue;
    const reading: Reading = { value: span.value, form: span.form, perMinute: after.perMinute };
    if (span.denominator !== undefined) reading.denominator = span.denominator;
    if (after.unit !== undefined) reading.unit = after.unit;
    readings.push(reading);
  }
  if (readings.length === 0) return { kind: 'none' };
  const explicitUnits = new Set(readings.map((r) => r.unit).filter((u) => u !== undefined));
  const measurements: SpokenMeasurement[] = [];
  for (const reading of readings) {
    let unit: Unit | UnclearReason | undefined = reading.unit;
    // A unit said once covers the whole answer ("six, six millimetres").
    if (unit === undefined && explicitUnits.size === 1) unit = [...explicitUnits][0];
    if (unit === undefined) unit = impliedUnit(quantity, reading);
    if (quantity === 'leak_rate' && isUnit(unit)) unit = PER_MINUTE[unit] ?? unit;
    if (!isUnit(unit)) return { kind: 'unclear', reason: unit };
    const saidUnit = unit;
    if (!unitFits(quantity, saidUnit)) return { kind: 'unclear', reason: 'unit_mismatch' };
    const value = round4(toCanonical(quantity, reading.value, saidUnit));
    const range = PLAUSIBLE_RANGES[quantity];
    if (!(value >= range.min && value <= range.max)) return { kind: 'unclear', reason: 'implausible' };
    measurements.push({
      quantity,
      value,
      unit: canonicalUnitOf(quantity),
      // Thirty-seconds are read back as thirty-seconds, not as a decimal inch.
      said:
        reading.denominator === 32 && saidUnit === 'in'
          ? { value: round4(reading.value * 32), unit: 'in/32' }
          : { value: reading.value, unit: saidUnit },
    });
  }
  const first = measurements[0];
  const firstReading = readings[0];
  if (!first || !firstReading) return { kind: 'none' };
  if (measurements.some((m) => Math.abs(m.value - first.value) > 1e-6))
    return { kind: 'unclear', reason: 'several_values' };
  return { kind: 'measurement', measurement: first, unitSaid: explicitUnits.size > 0, form: firstReading.form };
}
