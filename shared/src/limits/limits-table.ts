// The one table of the limits Yardcall judges measurements against, each row with its source.
import type { AirCheck, BrakeShoe, ChamberCode, MeasurementContext } from '../checklist/types.js';
import type { Quantity } from '../units/index.js';
import type { AxlePosition, BrakeType, SteeringType } from '../vehicle/index.js';

// published: a regulation or manual text; common_practice: a trade rule of thumb; from_memory: text not seen.
export type LimitBasis = 'published' | 'common_practice' | 'from_memory';

// at_least / not_greater_than: the limit itself passes. more_than / less_than: the limit itself fails.
export type BoundKind = 'at_least' | 'more_than' | 'not_greater_than' | 'less_than';

export type LimitValue =
  | number
  // The vehicle's own figure, e.g. the tire's cold-inflation spec.
  | { fromContext: 'specPsi' | 'sidewallMaxPsi' }
  // Rim travel for a rotation of the steering wheel: pi x diameter x degrees / 360 (393.209(b)(2)).
  | { rimTravelDegrees: number };

export interface LimitBound {
  kind: BoundKind;
  value: LimitValue;
}

// Which measurements a row applies to; every condition given must hold.
export interface LimitCondition {
  axle?: readonly AxlePosition[];
  brake?: readonly BrakeType[];
  chamber?: readonly ChamberCode[];
  steering?: readonly SteeringType[];
  vehicle?: readonly ('single' | 'combination')[];
  brakesApplied?: boolean;
  check?: readonly AirCheck[];
  shoe?: readonly BrakeShoe[];
  wheelDiameterIn?: { atMost?: number; equals?: number };
  // Context keys that must be present for the row to apply.
  present?: readonly (keyof MeasurementContext)[];
}

export interface LimitRow {
  id: string;
  quantity: Quantity;
  // Rows of one group are alternatives: the first that matches applies. Every group that matches is judged.
  group: string;
  // What the bound is compared with: the value itself, or its difference from the other tire of a dual pair.
  compares?: 'value' | 'dual_difference';
  when: LimitCondition;
  bounds: readonly LimitBound[];
  // Our own practice: a passing value this close to a bound is "near_limit" (canonical units).
  nearMargin: number;
  // A target the driver fills to rather than a floor: short of it by no more than this is
  // "near_limit" (top it up when you can), further short is out of limit; at or past it is ok.
  tolerance?: number;
  basis: LimitBasis;
  source: string;
}

// near_limit is our own practice, not a published rule: a value that passes but is within the margin
// of its limit, so the driver knows it will not pass for long. The margins, in canonical units:
export const NEAR_MARGINS = {
  // One 32nd of tread.
  tread_depth: 1,
  // Tire pressure has none: its spec is a target (see TIRE_PRESSURE_TOLERANCE_PSI), and any
  // pressure from the spec up to the sidewall maximum is fine.
  tire_pressure: 0,
  air_pressure: 2,
  // One 32nd of an inch of lining.
  lining_thickness: 1 / 32,
  // One eighth of an inch of push-rod stroke.
  pushrod_stroke: 1 / 8,
  // A quarter inch of steering-wheel rim travel.
  steering_lash: 1 / 4,
  // Five degrees of slack adjuster angle.
  slack_angle: 5,
  // Half a psi per minute of air loss.
  leak_rate: 0.5,
  // One psi of difference between the tires of a dual pair.
  dual_difference: 1,
} as const;

const OTHER_AXLES: readonly AxlePosition[] = ['drive', 'tag', 'trailer'];

const atLeast = (value: LimitValue): LimitBound => ({ kind: 'at_least', value });
const notGreaterThan = (value: LimitValue): LimitBound => ({ kind: 'not_greater_than', value });

// A row of a published text; its near margin is its quantity's own.
function publishedRow(
  id: string,
  quantity: Quantity & keyof typeof NEAR_MARGINS,
  group: string,
  when: LimitCondition,
  bounds: readonly LimitBound[],
  source: string,
): LimitRow {
  return { id, quantity, group, when, bounds, nearMargin: NEAR_MARGINS[quantity], basis: 'published', source };
}

// Lining or pad thickness, inches, 49 CFR 393.47(d); `where` completes the source.
function liningRow(
  axles: 'steer' | 'other',
  brake: BrakeType,
  bound: LimitBound,
  where: string,
  shoe?: BrakeShoe,
): LimitRow {
  const when: LimitCondition = { axle: axles === 'steer' ? ['steer'] : OTHER_AXLES, brake: [brake] };
  if (shoe) when.shoe = [shoe];
  const id = ['lining', axles, brake, ...(shoe ? [shoe] : [])].join('.');
  return publishedRow(id, 'lining_thickness', 'lining', when, [bound], `49 CFR 393.47(d), ${where}`);
}

function strokeRow(chamber: ChamberCode, limitIn: number, source = '49 CFR 393.47(e)'): LimitRow {
  return publishedRow(
    `stroke.${chamber}`,
    'pushrod_stroke',
    'stroke',
    { chamber: [chamber] },
    [notGreaterThan(limitIn)],
    source,
  );
}

function lashRow(
  steering: SteeringType,
  diameter: { atMost?: number; equals?: number },
  limitIn: number,
  source = '49 CFR 393.209(b)',
): LimitRow {
  const at = diameter.equals !== undefined ? `${diameter.equals}` : `le${diameter.atMost}`;
  const when = { steering: [steering], wheelDiameterIn: diameter };
  return publishedRow(`lash.${steering}.${at}`, 'steering_lash', 'lash', when, [notGreaterThan(limitIn)], source);
}

// Any other wheel diameter: the rim travel of the rotation 393.209(b)(2) allows.
function lashFormulaRow(steering: SteeringType, degrees: number): LimitRow {
  const source = `49 CFR 393.209(b)(2): ${degrees} degrees of rotation, ${steering} steering`;
  const bound = notGreaterThan({ rimTravelDegrees: degrees });
  return publishedRow(`lash.${steering}.formula`, 'steering_lash', 'lash', { steering: [steering] }, [bound], source);
}

// Air pressure on the dash gauge for one air-brake check, psi: [at least, at most].
function airRow(check: AirCheck, [least, most]: [number, number?], source: string): LimitRow {
  const bounds = most === undefined ? [atLeast(least)] : [atLeast(least), notGreaterThan(most)];
  return publishedRow(`air.${check}`, 'air_pressure', 'air', { check: [check] }, bounds, source);
}

// Air loss over one minute, psi, engine off, from the CDL manual, section 5.
function leakRow(brakes: 'released' | 'applied', vehicle: 'single' | 'combination', limit: number): LimitRow {
  // Released: "under" the figure, so the figure itself fails. Applied: "more than" the figure is too
  // much, so the figure itself passes.
  const bound: LimitBound = { kind: brakes === 'released' ? 'less_than' : 'not_greater_than', value: limit };
  const when: LimitCondition = { brakesApplied: brakes === 'applied', vehicle: [vehicle] };
  const source = `CDL manual, section 5: brakes ${brakes}, ${vehicle === 'single' ? 'single vehicle' : 'combination'}`;
  return publishedRow(`leak.${brakes}.${vehicle}`, 'leak_rate', 'leak', when, [bound], source);
}

// Type 36: the 2012 text of 393.47(e) says 2-1/4 in, the 2021 text 2-1/2 in. We use 2-1/4 in: it is the
// stricter reading, so a brake we pass is within both texts; a brake between the two is flagged for a mechanic.
export const TYPE_36_STROKE_LIMIT_IN = 2.25;
export const TYPE_36_STROKE_OTHER_TEXT_IN = 2.5;

// Power steering, wheel 16 in or less: 393.209(b) says 4-1/4 in, the Part 396 appendix 4-1/2 in. We use
// 4-1/4 in: it is the regulation's own table, the stricter figure, and agrees with its 30-degree formula.
export const POWER_LASH_16_LIMIT_IN = 4.25;
export const POWER_LASH_16_OTHER_TEXT_IN = 4.5;

// Low-air warning: FMVSS 121 S5.1.5 and the classic CDL manual say on before 60 psi; the modernised CDL test
// says 55 psi. We use 60 psi: it is the vehicle standard itself and the stricter figure.
export const LOW_AIR_WARNING_LIMIT_PSI = 60;
export const LOW_AIR_WARNING_OTHER_TEXT_PSI = 55;

// How far under its cold-inflation spec a tire may read and still only want topping up: about the
// reading error of a hand-held gauge plus the drop of a cool morning. Common practice, not a published figure.
export const TIRE_PRESSURE_TOLERANCE_PSI = 3;

export const LIMITS: readonly LimitRow[] = [
  // Tread depth, 32nds of an inch, in a major groove.
  publishedRow('tread.steer', 'tread_depth', 'tread', { axle: ['steer'] }, [atLeast(4)], '49 CFR 393.75(b)'),
  publishedRow('tread.other', 'tread_depth', 'tread', { axle: OTHER_AXLES }, [atLeast(2)], '49 CFR 393.75(c)'),

  // Lining or pad thickness, inches: 393.47(d) says when it fails ("less than"), so the figure itself passes,
  // except hydraulic steer brakes, which fail at 1/16 in "or less".
  liningRow('steer', 'air_drum', atLeast(3 / 16), 'steering axle, continuous-strip shoe', 'continuous_strip'),
  // A vehicle record does not say the shoe type: without it we use the stricter two-pad figure.
  liningRow('steer', 'air_drum', atLeast(1 / 4), 'steering axle, two-pad shoe'),
  liningRow('steer', 'air_disc', atLeast(1 / 8), 'steering axle, disc'),
  liningRow('steer', 'hydraulic', { kind: 'more_than', value: 1 / 16 }, 'steering axle, hydraulic brake'),
  liningRow('other', 'air_drum', atLeast(1 / 4), 'other axles, drum (or worn to the indicator)'),
  liningRow('other', 'air_disc', atLeast(1 / 8), 'other axles, disc'),
  liningRow('other', 'hydraulic', atLeast(1 / 16), 'other axles, hydraulic brake'),

  // Push-rod stroke readjustment limits, clamp-type chambers, inches, "not greater than".
  strokeRow('type-6', 1.25),
  strokeRow('type-9', 1.375),
  strokeRow('type-12', 1.375),
  strokeRow('type-12-long', 1.75),
  strokeRow('type-16', 1.75),
  strokeRow('type-16-long', 2),
  strokeRow('type-20', 1.75),
  strokeRow('type-20-long', 2),
  strokeRow('type-20-long-3in', 2.5),
  strokeRow('type-24', 1.75),
  strokeRow('type-24-long', 2),
  strokeRow('type-24-long-3in', 2.5),
  strokeRow('type-30', 2),
  strokeRow('type-30-long', 2.5),
  strokeRow('type-36', TYPE_36_STROKE_LIMIT_IN, '49 CFR 393.47(e), 2012 text (the 2021 text says 2-1/2 in)'),

  // Steering-wheel lash, inches at the rim, "shall not exceed". Exact diameters first, then the formula.
  lashRow('manual', { atMost: 16 }, 2),
  lashRow('manual', { equals: 18 }, 2.25),
  lashRow('manual', { equals: 19 }, 2.375),
  lashRow('manual', { equals: 20 }, 2.5),
  lashRow('manual', { equals: 21 }, 2.625),
  lashRow('manual', { equals: 22 }, 2.75),
  lashRow('power', { atMost: 16 }, POWER_LASH_16_LIMIT_IN, '49 CFR 393.209(b) (the Part 396 appendix says 4-1/2 in)'),
  lashRow('power', { equals: 18 }, 4.75),
  lashRow('power', { equals: 19 }, 5),
  lashRow('power', { equals: 20 }, 5.25),
  lashRow('power', { equals: 21 }, 5.5),
  lashRow('power', { equals: 22 }, 5.75),
  lashFormulaRow('manual', 14),
  lashFormulaRow('power', 30),

  // Tire pressure, psi, cold. The spec is the target the driver fills to: a few psi under it is
  // topped up when convenient, further under is a defect the driver may fix at the air line.
  {
    id: 'tire_pressure.spec',
    quantity: 'tire_pressure',
    group: 'tire_spec',
    when: {},
    bounds: [{ kind: 'at_least', value: { fromContext: 'specPsi' } }],
    nearMargin: NEAR_MARGINS.tire_pressure,
    tolerance: TIRE_PRESSURE_TOLERANCE_PSI,
    basis: 'published',
    source: "49 CFR 393.75(i): not below the vehicle's cold-inflation spec",
  },
  {
    id: 'tire_pressure.sidewall_max',
    quantity: 'tire_pressure',
    group: 'tire_sidewall',
    when: { present: ['sidewallMaxPsi'] },
    bounds: [{ kind: 'not_greater_than', value: { fromContext: 'sidewallMaxPsi' } }],
    nearMargin: NEAR_MARGINS.tire_pressure,
    basis: 'published',
    source: "The tire's sidewall maximum (the tire maker's marking)",
  },
  {
    id: 'tire_pressure.dual_difference',
    quantity: 'tire_pressure',
    group: 'tire_dual',
    compares: 'dual_difference',
    when: { present: ['dualMatePsi'] },
    bounds: [{ kind: 'not_greater_than', value: 5 }],
    nearMargin: NEAR_MARGINS.dual_difference,
    basis: 'common_practice',
    source: 'Common practice (used by a 2003 federal roadside survey): a dual pair within 5 psi',
  },

  // Slack adjuster angle, degrees, brakes applied.
  {
    id: 'slack_angle',
    quantity: 'slack_angle',
    group: 'slack',
    when: {},
    bounds: [
      { kind: 'at_least', value: 80 },
      { kind: 'not_greater_than', value: 100 },
    ],
    nearMargin: NEAR_MARGINS.slack_angle,
    basis: 'common_practice',
    source: 'Common practice: about 90 degrees with the brakes applied, taken as 80 to 100 (CDL manual, section 5)',
  },

  // Air system, psi on the dash gauge.
  airRow(
    'low_air_warning',
    [LOW_AIR_WARNING_LIMIT_PSI],
    'FMVSS 121 S5.1.5 (49 CFR 571.121); the modernised CDL test says 55 psi',
  ),
  airRow('governor_cut_in', [100], 'FMVSS 121 S5.1.1.1 (49 CFR 571.121), trucks'),
  airRow('governor_cut_out', [120, 140], "CDL manual, section 5: about 120 to 140 psi; the maker's spec governs"),
  airRow('spring_brake', [20, 45], "CDL manual, section 5: usually between 20 and 45 psi; the maker's spec governs"),

  // Air loss over one minute, engine off.
  leakRow('released', 'single', 2),
  leakRow('released', 'combination', 3),
  leakRow('applied', 'single', 3),
  leakRow('applied', 'combination', 4),
];

// Air checks with no measured quantity of their own: the checklist names them, a person judges them.
export const AIR_BUILD_UP = {
  fromPsi: 85,
  toPsi: 100,
  withinSeconds: 45,
  source: 'CDL manual, section 5: dual air system, engine at operating rpm',
} as const;

// From memory: the CDL manual's figure, text not seen.
export const SAFETY_RELIEF_VALVE = {
  opensAtPsi: 150,
  basis: 'from_memory',
  source: 'CDL manual (from memory)',
} as const;
