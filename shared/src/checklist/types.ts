// The shapes a checklist and its answers take: the contract between the engine, the server and the client.
import type { Quantity } from '../units/index.js';
import type { AxlePosition, BrakeType, SteeringType, VehicleConfig, VehicleKind } from '../vehicle/index.js';

export const LOCALES = ['en', 'es'] as const;
export type Locale = (typeof LOCALES)[number];

export const INSPECTION_KINDS = ['pre_trip', 'post_trip', 'en_route', 'practice'] as const;
export type InspectionKind = (typeof INSPECTION_KINDS)[number];

// What an item expects the driver to say. A measured check may still be answered "good": a pass
// checked without a reading, unless the organisation requires the reading (see READING_RULES).
export type Expectation = { type: 'check' } | { type: 'measure'; quantity: Quantity };

// Readings an organisation may require on every walk-around; by default none. Elsewhere a measured
// check answered "good" is a pass checked by eye, by hand or by a thumper, recorded as such.
export const READING_RULES = [
  'steer_tread_depth',
  'tread_depth',
  'tire_pressure',
  'pushrod_stroke',
  'lining_thickness',
  'steering_lash',
  'air_brake_test',
] as const;
export type ReadingRule = (typeof READING_RULES)[number];

export const CHAMBER_CODES = [
  'type-6',
  'type-9',
  'type-12',
  'type-12-long',
  'type-16',
  'type-16-long',
  'type-20',
  'type-20-long',
  'type-20-long-3in',
  'type-24',
  'type-24-long',
  'type-24-long-3in',
  'type-30',
  'type-30-long',
  'type-36',
] as const;
export type ChamberCode = (typeof CHAMBER_CODES)[number];

export const AIR_CHECKS = ['governor_cut_in', 'governor_cut_out', 'low_air_warning', 'spring_brake'] as const;
export type AirCheck = (typeof AIR_CHECKS)[number];

// What a limit needs to know about where a measurement was taken.
export interface MeasurementContext {
  axle?: AxlePosition;
  brake?: BrakeType;
  chamber?: ChamberCode;
  wheelDiameterIn?: number;
  steering?: SteeringType;
  specPsi?: number;
  sidewallMaxPsi?: number;
  vehicle?: 'single' | 'combination';
  brakesApplied?: boolean;
  check?: AirCheck;
  // Steer-axle drum shoes: continuous-strip shoes have a lower lining limit than two-pad shoes (393.47(d)).
  shoe?: BrakeShoe;
  // The other tire of a dual pair, to judge the pressure difference between them.
  dualMatePsi?: number;
}

export const BRAKE_SHOES = ['continuous_strip', 'two_pad'] as const;
export type BrakeShoe = (typeof BRAKE_SHOES)[number];

// One vehicle of the combination a checklist is built for: power unit first, then trailer(s).
export interface ChecklistVehicle {
  unitNumber: string;
  kind: VehicleKind;
  config: VehicleConfig;
}

// Zones in walk-around route order.
export const ZONE_KEYS = [
  'front',
  'cab',
  'air_brakes',
  'left_side',
  'rear',
  'right_side',
  'coupling',
  'trailer',
] as const;
export type ZoneKey = (typeof ZONE_KEYS)[number];

export const ITEM_CATEGORIES = [
  'brakes',
  'air_system',
  'tires',
  'wheels',
  'steering',
  'suspension',
  'coupling',
  'lights',
  'mirrors',
  'windshield',
  'horn',
  'emergency',
  'frame',
  'fuel',
  'exhaust',
  'engine',
  'cab',
  'body',
] as const;
export type ItemCategory = (typeof ITEM_CATEGORIES)[number];

// Categories where a wrong verdict can hurt someone: their verdicts carry the caution.
export const SAFETY_CATEGORIES: readonly ItemCategory[] = [
  'brakes',
  'air_system',
  'tires',
  'wheels',
  'steering',
  'coupling',
];

export interface WheelPosition {
  unitIndex: number;
  axleIndex: number;
  side: 'left' | 'right';
  dual?: 'inner' | 'outer';
}

export interface ChecklistItem {
  // Stable, unique, locale-independent, e.g. "u1.axle2.right.outer.tire.tread".
  key: string;
  zone: string;
  // The stop the item is checked at, with the others the trade checks together there.
  stopKey: string;
  // What the stop's prompt calls it ("hub", "outer tire inflation").
  name: string;
  // Words a driver may use to point at it inside its stop ("hub", "hub seal", "hubcap"): the
  // interpreter finds which item "good except the hub is leaking" is about.
  names: string[];
  // Which vehicle of the combination, 0 for the first.
  unitIndex: number;
  unitKind: VehicleKind;
  category: ItemCategory;
  safety: boolean;
  title: string;
  // Where the item is, said and shown: "Trailer, axle 2, right outer tire".
  positionLabel: string;
  prompt: string;
  shortPrompt: string;
  expects: Expectation;
  position?: WheelPosition;
  // Present for measurements: what the limit is judged against.
  limitContext?: MeasurementContext;
  // What an examiner expects a student to say for this item (narration scoring).
  points: string[];
}

export interface ChecklistZone {
  key: string;
  title: string;
}

// One place the driver stops at and checks several items together (a wheel end, a brake, the
// lamps at the rear). One answer covers the stop; every item still gets its own result.
export interface ChecklistStop {
  // Stable and locale-independent, e.g. "u1.axle1.left.wheel".
  key: string;
  zone: string;
  unitIndex: number;
  // Shown on the screen: "Tractor, axle 1, left wheel".
  label: string;
  // Said at the stop, position once: "Axle 1, left wheel: tire inflation, condition and tread, rim, lug nuts, hub."
  prompt: string;
  // Said again after a silence or once the driver knows the drill: "Axle 1, left wheel?"
  shortPrompt: string;
  // The stop's items in the order the stop names them; contiguous in Checklist.items.
  itemKeys: string[];
}

export interface Checklist {
  kind: InspectionKind;
  locale: Locale;
  // Zones in walk-around route order; items are in the same order.
  zones: ChecklistZone[];
  // Stops in walk-around order; every item belongs to exactly one.
  stops: ChecklistStop[];
  items: ChecklistItem[];
}

export const ANSWERS = ['pass', 'defect', 'not_applicable'] as const;
export type Answer = (typeof ANSWERS)[number];

export const VERDICTS = ['ok', 'near_limit', 'out_of_limit'] as const;
export type Verdict = (typeof VERDICTS)[number];

export interface MeasurementValue {
  quantity: Quantity;
  value: number;
  // Any unit `parseUnit` knows; evaluation converts to the quantity's canonical unit.
  unit: string;
}

// A measured check answered without a value: 'visual' when the reading was not required (checked by
// eye, by hand or by a thumper); 'no_gauge' when the organisation requires it and there was no gauge.
export const NO_READING_REASONS = ['visual', 'no_gauge'] as const;
export type NoReadingReason = (typeof NO_READING_REASONS)[number];

// A defect the driver corrected during the inspection (air added, bulb replaced). It stays on the
// report, opens no shop defect and does not put the unit out of service.
export interface SpotFix {
  // What was done, in the driver's words ("added air").
  action: string;
  // The new reading where one applies; it must be within its limit for the fix to count.
  measurement?: MeasurementValue;
  verdict?: Verdict;
  heard?: string;
  at: string;
}

// One answered item, as the client records it and the server stores it.
export interface ItemResult {
  itemKey: string;
  answer: Answer;
  measurement?: MeasurementValue;
  verdict?: Verdict;
  // Only on a measured check passed without a value.
  noReading?: NoReadingReason;
  // Only on a defect corrected on the spot.
  fixed?: SpotFix;
  // What the driver said about a defect.
  detail?: string;
  heard?: string;
  confidence?: number;
  answeredAt: string;
}
