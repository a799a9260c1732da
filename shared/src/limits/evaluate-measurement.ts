// Judges a measurement against the limits table and says the verdict in the driver's language.
import {
  AIR_CHECKS,
  BRAKE_SHOES,
  CHAMBER_CODES,
  LOCALES,
  SAFETY_CATEGORIES,
  type ItemCategory,
  type Locale,
  type MeasurementContext,
  type Verdict,
} from '../checklist/types.js';
import { fillTemplate, formatMeasure, verdictWords } from '../checklist/measure-words.js';
import { canonicalUnitOf, isQuantity, parseUnit, toCanonical, unitFits, type Quantity } from '../units/index.js';
import { AXLE_POSITIONS, BRAKE_TYPES, STEERING_TYPES } from '../vehicle/index.js';
import {
  LIMITS,
  type BoundKind,
  type LimitBasis,
  type LimitBound,
  type LimitCondition,
  type LimitRow,
} from './limits-table.js';

export type LimitErrorCode =
  | 'unknown_quantity'
  | 'unknown_unit'
  | 'wrong_unit'
  | 'invalid_value'
  | 'missing_context'
  | 'invalid_context'
  | 'no_limit';

// A measurement that cannot be judged, with a message a person can act on.
export class LimitError extends Error {
  readonly code: LimitErrorCode;

  constructor(code: LimitErrorCode, message: string) {
    super(message);
    this.name = 'LimitError';
    this.code = code;
  }
}

export interface MeasurementVerdict {
  verdict: Verdict;
  // The bound that decided the verdict, in the canonical unit.
  limit: number;
  unit: string;
  // The measured value in the canonical unit (the dual difference when that decided).
  value: number;
  source: string;
  basis: LimitBasis;
  rowId: string;
  say: string;
  // Present for safety items: the app supports and does not replace judgement.
  caution?: string;
}

// One bound of the table, resolved to a number for this measurement.
export interface AppliedLimit {
  row: LimitRow;
  kind: BoundKind;
  limit: number;
}

const CATEGORY_OF: Record<Quantity, ItemCategory> = {
  tread_depth: 'tires',
  tire_pressure: 'tires',
  lining_thickness: 'brakes',
  pushrod_stroke: 'brakes',
  slack_angle: 'brakes',
  steering_lash: 'steering',
  air_pressure: 'air_system',
  leak_rate: 'air_system',
};

// What each quantity needs to know about where it was measured.
const REQUIRED_CONTEXT: Record<Quantity, readonly (keyof MeasurementContext)[]> = {
  tread_depth: ['axle'],
  tire_pressure: ['specPsi'],
  lining_thickness: ['axle', 'brake'],
  pushrod_stroke: ['chamber'],
  steering_lash: ['wheelDiameterIn', 'steering'],
  slack_angle: [],
  air_pressure: ['check'],
  leak_rate: ['brakesApplied', 'vehicle'],
};

// Upper bounds of a plausible reading, to catch a misheard or mistyped number.
const MAX_PLAUSIBLE: Record<Quantity, number> = {
  tread_depth: 64,
  tire_pressure: 300,
  lining_thickness: 3,
  pushrod_stroke: 6,
  steering_lash: 30,
  slack_angle: 180,
  air_pressure: 300,
  leak_rate: 100,
};

// Readings converted from mm or kPa land a hair off the limit; that hair must not change the verdict.
const EPSILON = 1e-6;

function oneOf<T>(allowed: readonly T[], value: unknown): value is T {
  return (allowed as readonly unknown[]).includes(value);
}

function isPositiveNumber(value: unknown): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value > 0;
}

// The context arrives from the network or a CLI: check every value given, whatever its static type.
function validateContext(context: unknown): MeasurementContext {
  if (context === undefined || context === null) {
    return {};
  }
  if (typeof context !== 'object' || Array.isArray(context)) {
    throw new LimitError('invalid_context', 'The context must be an object, e.g. {"axle": "steer"}.');
  }
  const c = context as Record<string, unknown>;
  const bad = (key: string, expected: string): never => {
    throw new LimitError('invalid_context', `Context "${key}" is ${JSON.stringify(c[key])}; use ${expected}.`);
  };
  const enumKey = (key: keyof MeasurementContext, allowed: readonly unknown[]) => {
    if (c[key] !== undefined && !oneOf(allowed, c[key])) bad(key, `one of ${allowed.join(', ')}`);
  };
  enumKey('axle', AXLE_POSITIONS);
  enumKey('brake', BRAKE_TYPES);
  enumKey('chamber', CHAMBER_CODES);
  enumKey('steering', STEERING_TYPES);
  enumKey('vehicle', ['single', 'combination']);
  enumKey('check', AIR_CHECKS);
  enumKey('shoe', BRAKE_SHOES);
  if (c.brakesApplied !== undefined && typeof c.brakesApplied !== 'boolean') bad('brakesApplied', 'true or false');
  for (const key of ['wheelDiameterIn', 'specPsi', 'sidewallMaxPsi'] as const) {
    if (c[key] !== undefined && !isPositiveNumber(c[key])) bad(key, 'a positive number');
  }
  if (
    c.dualMatePsi !== undefined &&
    !(typeof c.dualMatePsi === 'number' && Number.isFinite(c.dualMatePsi) && c.dualMatePsi >= 0)
  ) {
    bad('dualMatePsi', 'a number of psi, 0 or more');
  }
  return c;
}

function listed<T>(allowed: readonly T[] | undefined, value: T | undefined): boolean {
  return allowed === undefined || (value !== undefined && allowed.includes(value));
}

function matches(when: LimitCondition, context: MeasurementContext): boolean {
  if (!listed(when.axle, context.axle)) return false;
  if (!listed(when.brake, context.brake)) return false;
  if (!listed(when.chamber, context.chamber)) return false;
  if (!listed(when.steering, context.steering)) return false;
  if (!listed(when.vehicle, context.vehicle)) return false;
  if (!listed(when.check, context.check)) return false;
  if (!listed(when.shoe, context.shoe)) return false;
  if (when.brakesApplied !== undefined && when.brakesApplied !== context.brakesApplied) return false;
  if (when.wheelDiameterIn) {
    const d = context.wheelDiameterIn;
    if (d === undefined) return false;
    if (when.wheelDiameterIn.equals !== undefined && Math.abs(d - when.wheelDiameterIn.equals) > EPSILON) return false;
    if (when.wheelDiameterIn.atMost !== undefined && d > when.wheelDiameterIn.atMost + EPSILON) return false;
  }
  if (when.present && when.present.some((key) => context[key] === undefined)) return false;
  return true;
}

function resolveBound(bound: LimitBound, context: MeasurementContext): number {
  const { value } = bound;
  if (typeof value === 'number') return value;
  if ('fromContext' in value) {
    const figure = context[value.fromContext];
    if (figure === undefined) {
      throw new LimitError('missing_context', `This limit needs "${value.fromContext}" in the context.`);
    }
    return figure;
  }
  const diameter = context.wheelDiameterIn;
  if (diameter === undefined) {
    throw new LimitError('missing_context', 'Steering lash needs "wheelDiameterIn" in the context.');
  }
  // 393.209(b)(2): rim travel for the allowed rotation, rounded to a ten-thousandth of an inch.
  return Math.round(((Math.PI * diameter * value.rimTravelDegrees) / 360) * 1e4) / 1e4;
}

function checkRequired(quantity: Quantity, context: MeasurementContext): void {
  const missing = REQUIRED_CONTEXT[quantity].filter((key) => context[key] === undefined);
  if (missing.length > 0) {
    throw new LimitError(
      'missing_context',
      `A ${quantity.replace(/_/g, ' ')} needs ${missing.map((key) => `"${key}"`).join(' and ')} in the context.`,
    );
  }
  if (quantity === 'pushrod_stroke' && context.brake === 'hydraulic') {
    throw new LimitError(
      'invalid_context',
      'A hydraulic brake has no push rod: push-rod stroke applies to air brakes.',
    );
  }
}

// The limits that apply to a measurement taken in this context, one per bound; throws when none does.
export function applicableLimits(quantity: Quantity, contextInput: MeasurementContext): AppliedLimit[] {
  if (!isQuantity(quantity)) {
    throw new LimitError(
      'unknown_quantity',
      `Unknown quantity "${String(quantity)}". Use one of: ${Object.keys(REQUIRED_CONTEXT).join(', ')}.`,
    );
  }
  const context = validateContext(contextInput);
  checkRequired(quantity, context);
  const applied: AppliedLimit[] = [];
  const decidedGroups: string[] = [];
  for (const row of LIMITS) {
    if (row.quantity !== quantity || decidedGroups.includes(row.group) || !matches(row.when, context)) continue;
    decidedGroups.push(row.group);
    for (const bound of row.bounds) {
      applied.push({ row, kind: bound.kind, limit: resolveBound(bound, context) });
    }
  }
  if (applied.length === 0) {
    throw new LimitError('no_limit', `No published limit for a ${quantity.replace(/_/g, ' ')} in this context.`);
  }
  return applied;
}

interface Judged {
  applied: AppliedLimit;
  verdict: Verdict;
  value: number;
  distance: number;
}

const VERDICT_RANK: Record<Verdict, number> = { ok: 0, near_limit: 1, out_of_limit: 2 };

function judge(applied: AppliedLimit, value: number): Judged {
  const { kind, limit, row } = applied;
  const minimum = kind === 'at_least' || kind === 'more_than';
  // Distance on the passing side; negative means the value is past the limit.
  const distance = minimum ? value - limit : limit - value;
  const strict = kind === 'more_than' || kind === 'less_than';
  const passes = strict ? distance > EPSILON : distance >= -EPSILON;
  let verdict: Verdict = 'ok';
  if (!passes) {
    // A target (a tire's spec) missed by no more than its tolerance only wants topping up.
    verdict = row.tolerance !== undefined && -distance <= row.tolerance + EPSILON ? 'near_limit' : 'out_of_limit';
  } else if (row.nearMargin > 0 && distance <= row.nearMargin + EPSILON) {
    // A zero margin has nothing to warn near, not even the limit itself.
    verdict = 'near_limit';
  }
  return { applied, verdict, value, distance };
}

function sayVerdict(judged: Judged, quantity: Quantity, context: MeasurementContext, locale: Locale): string {
  const words = verdictWords(locale).verdicts;
  const { kind, limit, row } = judged.applied;
  const unit = canonicalUnitOf(quantity);
  const minimum = kind === 'at_least' || kind === 'more_than';
  let template: string;
  if (row.tolerance !== undefined) {
    template =
      judged.verdict === 'ok'
        ? words.say.ok_target
        : judged.verdict === 'near_limit'
          ? words.say.near_target
          : words.say.out_target;
  } else if (judged.verdict === 'out_of_limit') {
    template =
      Math.abs(judged.distance) <= EPSILON ? words.say.out_at : minimum ? words.say.out_min : words.say.out_max;
  } else if (judged.verdict === 'near_limit') {
    template = minimum ? words.say.near_min : words.say.near_max;
  } else {
    template = minimum ? words.say.ok_min : words.say.ok_max;
  }
  const name =
    row.compares === 'dual_difference'
      ? words.quantities.dual_difference
      : quantity === 'air_pressure' && context.check
        ? words.quantities[context.check]
        : words.quantities[quantity];
  return fillTemplate(template, {
    quantity: name,
    value: formatMeasure(judged.value, unit, locale),
    limit: formatMeasure(limit, unit, locale),
  });
}

// The caution every safety verdict carries, in the locale.
export function safetyCaution(locale: Locale = 'en'): string {
  return verdictWords(locale).verdicts.caution;
}

export function evaluateMeasurement(
  quantity: Quantity,
  value: number,
  unit: string,
  context: MeasurementContext,
  locale: Locale = 'en',
): MeasurementVerdict {
  if (!isQuantity(quantity)) {
    throw new LimitError(
      'unknown_quantity',
      `Unknown quantity "${String(quantity)}". Use one of: ${Object.keys(REQUIRED_CONTEXT).join(', ')}.`,
    );
  }
  if (!oneOf(LOCALES, locale)) {
    throw new LimitError('invalid_context', `Unknown locale "${String(locale)}". Use one of: ${LOCALES.join(', ')}.`);
  }
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new LimitError(
      'invalid_value',
      `The value must be a finite number; got ${JSON.stringify(value) ?? String(value)}.`,
    );
  }
  const parsed = typeof unit === 'string' ? parseUnit(unit) : undefined;
  if (!parsed) {
    throw new LimitError(
      'unknown_unit',
      `Unknown unit "${String(unit)}" for ${quantity.replace(/_/g, ' ')}; use ${canonicalUnitOf(quantity)}.`,
    );
  }
  if (!unitFits(quantity, parsed)) {
    throw new LimitError(
      'wrong_unit',
      `${parsed} is not a unit of ${quantity.replace(/_/g, ' ')}; use ${canonicalUnitOf(quantity)}.`,
    );
  }
  const canonical: number = toCanonical(quantity, value, parsed);
  if (canonical < 0 || canonical > MAX_PLAUSIBLE[quantity]) {
    throw new LimitError(
      'invalid_value',
      `${value} ${parsed} is not a plausible ${quantity.replace(/_/g, ' ')}; say it again or check the unit.`,
    );
  }
  const checked = validateContext(context);
  const applied = applicableLimits(quantity, checked);

  let worst: Judged | undefined;
  for (const limit of applied) {
    const compared =
      limit.row.compares === 'dual_difference' ? Math.abs(canonical - (checked.dualMatePsi ?? canonical)) : canonical;
    const judged = judge(limit, compared);
    // The worst verdict decides; among equals, the bound the value is closest to.
    if (
      !worst ||
      VERDICT_RANK[judged.verdict] > VERDICT_RANK[worst.verdict] ||
      (judged.verdict === worst.verdict && judged.distance < worst.distance)
    ) {
      worst = judged;
    }
  }
  // applicableLimits never returns an empty list.
  const decided = worst as Judged;
  const result: MeasurementVerdict = {
    verdict: decided.verdict,
    limit: decided.applied.limit,
    unit: canonicalUnitOf(quantity),
    value: Math.round(decided.value * 1e6) / 1e6,
    source: decided.applied.row.source,
    basis: decided.applied.row.basis,
    rowId: decided.applied.row.id,
    say: sayVerdict(decided, quantity, checked, locale),
  };
  if (SAFETY_CATEGORIES.includes(CATEGORY_OF[quantity])) {
    result.caution = safetyCaution(locale);
  }
  return result;
}
