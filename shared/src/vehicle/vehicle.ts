// The vehicle and its axle configuration: what checklists are built from and what forms edit.

export const VEHICLE_KINDS = ['tractor', 'trailer', 'straight_truck', 'bus'] as const;
export type VehicleKind = (typeof VEHICLE_KINDS)[number];

export const VEHICLE_STATUSES = ['in_service', 'out_of_service'] as const;
export type VehicleStatus = (typeof VEHICLE_STATUSES)[number];

export const AXLE_POSITIONS = ['steer', 'drive', 'tag', 'trailer'] as const;
export type AxlePosition = (typeof AXLE_POSITIONS)[number];

export const TIRE_ARRANGEMENTS = ['single', 'dual'] as const;
export type TireArrangement = (typeof TIRE_ARRANGEMENTS)[number];

export const BRAKE_TYPES = ['air_drum', 'air_disc', 'hydraulic'] as const;
export type BrakeType = (typeof BRAKE_TYPES)[number];

// Clamp-type chamber sizes a vehicle form offers (49 CFR 393.47(e) table lists these and type 6).
export const CHAMBER_SIZES = [9, 12, 16, 20, 24, 30, 36] as const;
export type ChamberSize = (typeof CHAMBER_SIZES)[number];

export const CHAMBER_STROKES = ['standard', 'long'] as const;
export type ChamberStroke = (typeof CHAMBER_STROKES)[number];

export const STEERING_TYPES = ['power', 'manual'] as const;
export type SteeringType = (typeof STEERING_TYPES)[number];

export interface BrakeChamber {
  size: ChamberSize;
  stroke: ChamberStroke;
  // Long-stroke type 20 and 24 chambers with a 3 in rated stroke have their own limit (393.47(e)).
  ratedStroke3In?: boolean;
}

export interface TireSpec {
  // Sidewall size designation, e.g. "11R22.5".
  size: string;
  coldInflationPsi: number;
  sidewallMaxPsi: number;
}

export interface AxleConfig {
  position: AxlePosition;
  tires: TireArrangement;
  brake: BrakeType;
  // Present exactly when the brake is air-operated.
  chamber?: BrakeChamber;
  tire: TireSpec;
}

export interface SteeringConfig {
  wheelDiameterIn: number;
  type: SteeringType;
}

export interface VehicleConfig {
  // Axles front to back.
  axles: AxleConfig[];
  // Present exactly for power units (everything but trailers).
  steering?: SteeringConfig;
}

export function isPowerUnit(kind: VehicleKind): boolean {
  return kind !== 'trailer';
}

export function isAirBraked(brake: BrakeType): boolean {
  return brake === 'air_drum' || brake === 'air_disc';
}
