// The shapes a checklist and its answers take: the contract between the engine, the server and the client.
import type { Quantity } from '../units/index.js';
import type { AxlePosition, BrakeType, SteeringType, VehicleConfig, VehicleKind } from '../vehicle/index.js';

export const LOCALES = ['en', 'es'] as const;
export type Locale = (typeof LOCALES)[number];

export const INSPECTION_KINDS = ['pre_trip', 'post_trip', 'en_route', 'practice'] as const;
export type InspectionKind = (typeof INSPECTION_KINDS)[number];

// What an item expects the driver to say.
export type Expectation = { type: 'check' } | { type: 'measure'; quantity: Quantity };

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

export interface Checklist {
  kind: InspectionKind;
  locale: Locale;
  // Zones in walk-around route order; items are in the same order.
  zones: ChecklistZone[];
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

// One answered item, as the client records it and the server stores it.
export interface ItemResult {
  itemKey: string;
  answer: Answer;
  measurement?: MeasurementValue;
  verdict?: Verdict;
  // What the driver said about a defect.
  detail?: string;
  heard?: string;
  confidence?: number;
  answeredAt: string;
}
